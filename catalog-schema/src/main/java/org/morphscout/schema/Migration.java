package org.morphscout.schema;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * One numbered layout step: a change to the catalog's tables, applied once per catalog.
 *
 * @param version its step number, from 1; numbers only grow, and a step may be applied after a higher one
 * @param name the file name it came from
 * @param sql the statements, separated by semicolons at line ends
 */
public record Migration(int version, String name, String sql) {

  public Migration {
    if (version < 1) {
      throw new IllegalArgumentException("layout steps are numbered from 1: " + name);
    }
  }

  /** SHA-256 of the step's text, recorded with it so a catalog shows exactly which text shaped it. */
  public String sha256() {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(sql.getBytes(StandardCharsets.UTF_8)));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java runtime has SHA-256", e);
    }
  }

  /**
   * The statements of this step, with {@code --} comments removed. A {@code CREATE TRIGGER ... END} block stays one
   * statement although it holds semicolons. Semicolons inside string literals are not supported (no step uses them),
   * which keeps this splitter simple.
   */
  public List<String> statements() {
    StringBuilder cleaned = new StringBuilder();
    for (String line : sql.split("\n", -1)) {
      int comment = line.indexOf("--");
      cleaned.append(comment >= 0 ? line.substring(0, comment) : line).append('\n');
    }
    List<String> result = new ArrayList<>();
    StringBuilder pending = new StringBuilder();
    for (String part : cleaned.toString().split(";")) {
      if (!pending.isEmpty()) {
        pending.append(';').append(part);
        if (endsTrigger(part)) {
          result.add(pending.toString().strip());
          pending.setLength(0);
        }
        continue;
      }
      if (part.isBlank()) {
        continue;
      }
      if (startsTrigger(part)) {
        pending.append(part);
        continue;
      }
      result.add(part.strip());
    }
    if (!pending.isEmpty()) {
      throw new IllegalStateException("layout step " + name + " has a CREATE TRIGGER without its END");
    }
    return result;
  }

  private static boolean startsTrigger(String part) {
    String s = part.strip().toUpperCase(java.util.Locale.ROOT).replaceAll("\\s+", " ");
    return s.startsWith("CREATE TRIGGER") || s.startsWith("CREATE TEMP TRIGGER");
  }

  private static boolean endsTrigger(String part) {
    return part.strip().toUpperCase(java.util.Locale.ROOT).equals("END");
  }
}
