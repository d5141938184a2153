package org.morphscout.demo;

import java.util.Locale;

/** The text of the generated library's {@code README.txt}: what it is, where it came from, how it may be used. */
final class LibraryReadme {
  /** The invented studio the catalogue belongs to. */
  static final String STUDIO = "Quernhollow Ceramics";

  private LibraryReadme() {}

  static String text(DemoOptions o, int products, int duplicates, int problems, int shelfViews) {
    return String.join("\n",
        STUDIO + " - demo picture library for Morphscout",
        "",
        "Everything in this folder is invented. " + STUDIO + " is a fictional pottery studio; every picture",
        "is an original synthetic image drawn by Morphscout's demo-library generator (Java2D, from a fixed",
        "seed). There are no photographs, no real people, no real products, brands or logos.",
        "",
        "Licence: free to use, copy, modify and share under the Apache License, Version 2.0, the licence",
        "of the Morphscout project (https://www.apache.org/licenses/LICENSE-2.0).",
        "",
        "Contents",
        String.format(Locale.ROOT, "  %d product pictures in vases/ jugs/ bottles/ bowls/ cups/ jars/", products),
        String.format(Locale.ROOT, "  %d near-duplicates beside their originals (-web, -small, -edit)", duplicates),
        String.format(Locale.ROOT, "  %d problem pictures in problems/ (cut-off, two-objects, very-dark,", problems),
        "     panoramic, tiny, corrupt = a deliberately truncated JPEG)",
        String.format(Locale.ROOT, "  %d views of one studio shelf in shelves/, panning slowly to the right;",
            shelfViews),
        "     file numbers are shuffled, the true order is the shelf_order column",
        "  manifest.csv: ground truth per file (product line, archetypes and blend t, glaze, backdrop,",
        "     size, format, problem, duplicate_of, shelf_order, seed)",
        "",
        String.format(Locale.ROOT, "Generated with seed %d. The same seed gives the same bytes on the same JDK.",
            o.seed()),
        "");
  }
}
