package org.morphscout.indexer.catalog;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

/** Every file below a folder with its bytes, by relative path: to check that a refusal left a catalog untouched. */
public final class FolderSnapshot {
  private FolderSnapshot() {}

  public static Map<String, byte[]> of(Path dir) throws IOException {
    Map<String, byte[]> files = new TreeMap<>();
    try (Stream<Path> all = Files.walk(dir)) {
      for (Path p : all.filter(Files::isRegularFile).toList()) {
        files.put(dir.relativize(p).toString(), Files.readAllBytes(p));
      }
    }
    return files;
  }
}
