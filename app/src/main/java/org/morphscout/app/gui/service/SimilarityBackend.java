package org.morphscout.app.gui.service;

import java.util.List;
import org.morphscout.indexer.progress.CancellationToken;

/** Finds images that look like, or have the shape of, a given catalog image. */
public interface SimilarityBackend {
  /** Up to {@code limit} nearest images to {@code id}, nearest first, {@code id} itself excluded. */
  List<Match> similar(long id, SimilarityMode mode, int limit, CancellationToken token);
}
