package org.morphscout.demo;

import java.nio.file.Path;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * What {@link DemoLibrary#generate} wrote.
 *
 * @param root the library folder
 * @param manifest {@code manifest.csv} in it
 * @param readme {@code README.txt} in it
 * @param products product pictures
 * @param duplicates near-duplicate copies
 * @param problems problem pictures
 * @param shelfViews walkthrough views
 * @param filesPerFolder picture files per top-level folder, sorted by folder name
 * @param elapsedMillis wall-clock time taken (informational; not part of the output)
 */
public record LibrarySummary(Path root, Path manifest, Path readme, int products, int duplicates, int problems,
    int shelfViews, SortedMap<String, Integer> filesPerFolder, long elapsedMillis) {
  public LibrarySummary {
    filesPerFolder = new TreeMap<>(filesPerFolder);
  }

  /** All picture files written. */
  public int pictures() {
    int n = 0;
    for (Map.Entry<String, Integer> e : filesPerFolder.entrySet()) {
      n += e.getValue();
    }
    return n;
  }
}
