package org.morphscout.app.gui.service;

import java.util.List;
import java.util.OptionalLong;
import org.morphscout.indexer.progress.CancellationToken;

/** Suggests morph-friendly pairs, for the whole library or around one image. */
public interface PairsBackend {
  /**
   * Up to {@code limit} pairs, best first, with the library's notes on how they were found (for example: scored
   * live because the catalog's stored pairs are not up to date).
   *
   * @param image when present, only pairs containing this image
   */
  Suggestions suggest(OptionalLong image, int limit, CancellationToken token);

  /** Pairs, best first, and notes for the user (one line each; empty when there is nothing to say). */
  record Suggestions(List<PairSuggestion> pairs, List<String> notes) {
    public Suggestions {
      pairs = List.copyOf(pairs);
      notes = List.copyOf(notes);
    }
  }
}
