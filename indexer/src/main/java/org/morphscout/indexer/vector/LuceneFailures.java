package org.morphscout.indexer.vector;

import java.io.EOFException;
import java.io.IOException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.index.IndexFormatTooNewException;
import org.apache.lucene.index.IndexFormatTooOldException;

/**
 * Turns Lucene's failures on opening an index into messages a user can act on. Failures the user can fix (a damaged
 * or incompatible index folder) become {@link UnusableIndexException}; other I/O failures stay {@link IOException}.
 */
final class LuceneFailures {
  private LuceneFailures() {}

  /** Returns the exception to throw for {@code e}, or rethrows it when it is a plain I/O failure. */
  static RuntimeException translate(Exception e, Path dir) throws IOException {
    if (e instanceof IndexFormatTooOldException || e instanceof IndexFormatTooNewException) {
      return new UnusableIndexException(dir, "was written by an incompatible version", e);
    }
    // Garbage in a segment file shows as a damaged index, a file ending early, a file the commit names but that is
    // not there, or a codec name that does not exist: all mean the folder's content cannot be used.
    if (e instanceof CorruptIndexException || e instanceof EOFException || e instanceof NoSuchFileException
        || e instanceof java.io.FileNotFoundException || e instanceof IllegalArgumentException
        || e instanceof IllegalStateException) {
      return new UnusableIndexException(dir, "is damaged", e);
    }
    if (e instanceof IOException io) {
      throw io;
    }
    return (RuntimeException) e;
  }
}
