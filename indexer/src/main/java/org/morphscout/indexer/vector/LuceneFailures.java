package org.morphscout.indexer.vector;

import java.io.IOException;
import java.nio.file.Path;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.index.IndexFormatTooNewException;
import org.apache.lucene.index.IndexFormatTooOldException;
import org.morphscout.indexer.MorphscoutException;

/**
 * Turns Lucene's failures on opening an index into messages a user can act on. Failures the user can fix (a damaged
 * or incompatible index folder) become {@link MorphscoutException}; other I/O failures stay {@link IOException}.
 */
final class LuceneFailures {
  private LuceneFailures() {}

  /** Returns the exception to throw for {@code e}, or rethrows it when it is a plain I/O failure. */
  static RuntimeException translate(Exception e, Path dir) throws IOException {
    if (e instanceof CorruptIndexException) {
      return new MorphscoutException(
          "The vector index at " + dir + " is damaged: delete that folder and re-index the catalog.", e);
    }
    if (e instanceof IndexFormatTooOldException || e instanceof IndexFormatTooNewException) {
      return new MorphscoutException(
          "The vector index at " + dir + " was written by an incompatible Morphscout version: "
              + "delete that folder and re-index the catalog.", e);
    }
    if (e instanceof IOException io) {
      throw io;
    }
    return (RuntimeException) e;
  }
}
