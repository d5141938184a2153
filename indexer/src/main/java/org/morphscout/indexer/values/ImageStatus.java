package org.morphscout.indexer.values;

import java.util.Locale;

/** Where an image stands in the catalog. */
public enum ImageStatus {
  /** Found on disk, not analysed yet (or changed since). */
  PENDING,
  /** Analysed: features stored. */
  READY,
  /** Could not be read or analysed; the reason is in the failures table. */
  FAILED,
  /** No longer found under its root; kept with its decisions in case it comes back. */
  MISSING;

  /** The word stored in the database and shown to users. */
  public String word() {
    return name().toLowerCase(Locale.ROOT);
  }

  public static ImageStatus fromWord(String word) {
    return valueOf(word.toUpperCase(Locale.ROOT));
  }
}
