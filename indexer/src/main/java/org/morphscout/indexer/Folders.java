package org.morphscout.indexer;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/** Removing a whole folder, the one way the project does it. */
public final class Folders {
  private Folders() {}

  /** Deletes {@code dir} and everything below it, deepest first; a folder that is not there is left as it is. */
  public static void deleteTree(Path dir) throws IOException {
    if (!Files.exists(dir)) {
      return;
    }
    try (Stream<Path> all = Files.walk(dir)) {
      for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
