package org.morphscout.indexer;

/**
 * The one exception type for domain failures: its message is written for the person using the tool
 * (what went wrong, which file or image, what to do), so callers can show it as it is.
 *
 * <p>I/O failures stay {@link java.io.IOException}; this type is for everything that is the user's input
 * or the catalog's state rather than the machine.
 */
public class MorphscoutException extends RuntimeException {
  private static final long serialVersionUID = 1L;

  public MorphscoutException(String userMessage) {
    super(userMessage);
  }

  public MorphscoutException(String userMessage, Throwable cause) {
    super(userMessage, cause);
  }
}
