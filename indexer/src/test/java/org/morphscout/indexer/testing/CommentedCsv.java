package org.morphscout.indexer.testing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the small comma-separated test tables kept beside the tests: lines starting with {@code #} say where the data
 * comes from and are skipped, as are blank lines; cells are trimmed. No quoting (the tables hold none).
 */
public final class CommentedCsv {
  private CommentedCsv() {}

  /** The rows of the resource {@code name}, next to {@code owner}'s class file. */
  public static List<String[]> rows(Class<?> owner, String name) throws IOException {
    List<String[]> rows = new ArrayList<>();
    InputStream stream = owner.getResourceAsStream(name);
    if (stream == null) {
      throw new IOException("test resource " + name + " not found next to " + owner.getName());
    }
    try (BufferedReader r = new BufferedReader(new InputStreamReader(stream, StandardCharsets.UTF_8))) {
      String line;
      while ((line = r.readLine()) != null) {
        if (line.isBlank() || line.startsWith("#")) {
          continue;
        }
        String[] cells = line.split(",");
        for (int i = 0; i < cells.length; i++) {
          cells[i] = cells[i].trim();
        }
        rows.add(cells);
      }
    }
    return rows;
  }
}
