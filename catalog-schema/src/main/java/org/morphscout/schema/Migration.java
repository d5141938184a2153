package org.morphscout.schema;

import java.util.ArrayList;
import java.util.List;

/**
 * One numbered schema migration.
 *
 * @param version its number, from 1, without gaps
 * @param name the file name it came from
 * @param sql the statements, separated by semicolons at line ends
 */
public record Migration(int version, String name, String sql) {

  public Migration {
    if (version < 1) {
      throw new IllegalArgumentException("migration versions start at 1: " + name);
    }
  }

  /**
   * The statements of this migration, with {@code --} comments removed. Semicolons inside string literals are not
   * supported (the migrations do not use them), which keeps this splitter trivial.
   */
  public List<String> statements() {
    StringBuilder cleaned = new StringBuilder();
    for (String line : sql.split("\n", -1)) {
      int comment = line.indexOf("--");
      cleaned.append(comment >= 0 ? line.substring(0, comment) : line).append('\n');
    }
    List<String> result = new ArrayList<>();
    for (String part : cleaned.toString().split(";")) {
      if (!part.isBlank()) {
        result.add(part.strip());
      }
    }
    return result;
  }
}
