package org.morphscout.schema;

/** The catalog's schema cannot be used by this build; the message is for the user. */
public class SchemaException extends Exception {
  private static final long serialVersionUID = 1L;

  public SchemaException(String message) {
    super(message);
  }

  public SchemaException(String message, Throwable cause) {
    super(message, cause);
  }
}
