package org.morphscout.app.gui.service;

import java.util.List;
import java.util.OptionalLong;
import org.morphscout.indexer.progress.CancellationToken;

/** Suggests morph-friendly pairs, for the whole library or around one image. */
public interface PairsBackend {
  /**
   * Up to {@code limit} pairs, best first.
   *
   * @param image when present, only pairs containing this image
   */
  List<PairSuggestion> suggest(OptionalLong image, int limit, CancellationToken token);
}
