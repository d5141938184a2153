package org.morphscout.app.gui.service;

import java.nio.file.Path;
import java.util.List;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;

/** Finds images that look like, or have the shape of, a given catalog image. */
public interface SimilarityBackend {
  /** Up to {@code limit} nearest images to {@code id}, nearest first, {@code id} itself excluded. */
  List<Match> similar(long id, SimilarityMode mode, int limit, CancellationToken token);

  /**
   * Up to {@code limit} catalog images nearest to an image file, which need not be in the catalog (it is analysed
   * on the fly); a catalog image with the same bytes is left out.
   */
  default List<Match> similarToFile(Path file, SimilarityMode mode, int limit, CancellationToken token) {
    throw new MorphscoutException("searching by a file outside the catalog needs the catalog's vector index: "
        + "index a folder first");
  }
}
