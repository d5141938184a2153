package org.morphscout.indexer;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Recognises a full disk among I/O and SQLite failures and says so in one line naming the folder and its free space,
 * instead of the low-level message ("No space left on device", {@code SQLITE_FULL}, or the follow-on "cannot commit -
 * no transaction is active" SQLite gives after a failed write).
 */
public final class DiskSpace {
  private DiskSpace() {}

  /** Whether {@code t} or one of its causes reports a full disk or an exhausted quota. */
  public static boolean isFull(Throwable t) {
    for (Throwable c = t; c != null; c = c.getCause()) {
      String m = c.getMessage() == null ? "" : c.getMessage().toLowerCase(Locale.ROOT);
      if (m.contains("no space left") || m.contains("sqlite_full") || m.contains("database or disk is full")
          || m.contains("disk quota exceeded") || m.contains("not enough space")) {
        return true;
      }
      if (c.getCause() == c) {
        break;
      }
    }
    return false;
  }

  /** "the disk is full (12.0 MiB free in /folder)" for a full disk, else the cause in plain words. */
  public static String describe(IOException e, Path folder) {
    if (isFull(e)) {
      return full(folder);
    }
    if (e instanceof AccessDeniedException) {
      return "permission denied";
    }
    String m = e.getMessage();
    return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
  }

  /** The one-line disk-full message for {@code folder}. */
  public static String full(Path folder) {
    return "the disk is full (" + free(folder) + " free in " + folder.toAbsolutePath().normalize() + "); free some "
        + "space and run the command again (finished work is kept)";
  }

  /** Whether the folder's file store has less than 16 MiB left (too little for a catalog transaction). */
  public static boolean nearlyFull(Path folder) {
    Path p = existing(folder);
    try {
      return p != null && Files.getFileStore(p).getUsableSpace() < 16L * 1024 * 1024;
    } catch (IOException e) {
      return false;
    }
  }

  private static Path existing(Path folder) {
    Path p = folder.toAbsolutePath().normalize();
    while (p != null && !Files.exists(p)) {
      p = p.getParent();
    }
    return p;
  }

  /** Free space in the folder's file store, human-readable, or "unknown". */
  static String free(Path folder) {
    Path p = existing(folder);
    if (p == null) {
      return "unknown";
    }
    try {
      long n = Files.getFileStore(p).getUsableSpace();
      if (n < 1024 * 1024) {
        return n / 1024 + " KiB";
      }
      return String.format(Locale.ROOT, "%.1f MiB", n / (1024.0 * 1024.0));
    } catch (IOException e) {
      return "unknown";
    }
  }
}
