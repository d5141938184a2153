package org.morphscout.indexer.vector;

import java.nio.file.Path;
import org.morphscout.indexer.MorphscoutException;

/**
 * The vector index folder holds something that cannot be opened as an index: damaged or garbage files, or a format of
 * another version. The catalog database keeps every vector, so callers that may write rebuild the index from it.
 */
public final class UnusableIndexException extends MorphscoutException {
  private static final long serialVersionUID = 1L;

  private final transient Path dir;

  UnusableIndexException(Path dir, String what, Throwable cause) {
    super("the vector index at " + dir + " " + what + "; run morphscout index --rebuild-vectors to rebuild it from "
        + "the catalog", cause);
    this.dir = dir;
  }

  /** The index folder. */
  public Path dir() {
    return dir;
  }
}
