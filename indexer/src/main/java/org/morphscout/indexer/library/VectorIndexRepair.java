package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.morphscout.indexer.Folders;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.morphscout.indexer.vector.UnusableIndexException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Opens the vector index for writing, starting a new, empty one when the folder's content is unusable (damaged or
 * garbage files, another version's format). Nothing is lost: the catalog database keeps every vector, and the caller
 * fills the new index from it ({@link VectorSync}). The caller holds the catalog's writer lock.
 */
final class VectorIndexRepair {
  private static final Logger LOG = LoggerFactory.getLogger(VectorIndexRepair.class);

  private VectorIndexRepair() {}

  /** An open index and whether it was started afresh (so it must be filled from the catalog). */
  record Opened(LuceneVectorIndex index, boolean fresh) {}

  static Opened open(Path dir, LuceneIndexOptions options) throws IOException {
    try {
      return new Opened(LuceneVectorIndex.open(dir, options), false);
    } catch (UnusableIndexException e) {
      LOG.warn("{}: starting a new vector index and filling it from the catalog", e.getMessage());
      Path aside = dir.resolveSibling(dir.getFileName() + ".unusable");
      Folders.deleteTree(aside);
      Files.move(dir, aside);
      LuceneVectorIndex fresh = LuceneVectorIndex.open(dir, options);
      Folders.deleteTree(aside);
      return new Opened(fresh, true);
    }
  }

}
