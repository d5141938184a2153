package org.morphscout.app.gui.common;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;
import org.morphscout.indexer.MorphscoutException;

/** Turns a failure into one sentence a person understands, for the message line of a pane. */
public final class Messages {
  private Messages() {}

  public static String of(Throwable t) {
    Throwable e = t instanceof UncheckedIOException u && u.getCause() != null ? u.getCause() : t;
    if (e instanceof MorphscoutException || e instanceof IllegalArgumentException) {
      return capitalise(e.getMessage());
    }
    if (e instanceof NoSuchFileException n) {
      return "File not found: " + n.getFile();
    }
    if (e instanceof AccessDeniedException a) {
      return "Not allowed to read or write " + a.getFile();
    }
    if (e instanceof IOException) {
      String m = t instanceof UncheckedIOException && t.getMessage() != null ? t.getMessage() + ": " : "";
      return capitalise(m + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
    }
    if (e instanceof OutOfMemoryError) {
      return "Out of memory: close other programs or start Morphscout with more memory";
    }
    return "Something went wrong (" + e.getClass().getSimpleName()
        + (e.getMessage() == null ? "" : ": " + e.getMessage()) + "); details are in the log";
  }

  private static String capitalise(String s) {
    if (s == null || s.isEmpty()) {
      return "Something went wrong";
    }
    return Character.toUpperCase(s.charAt(0)) + s.substring(1);
  }
}
