package org.morphscout.schema;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Loads the migrations shipped in this module's resources, in order. */
public final class BundledMigrations {
  private static final String FOLDER = "/org/morphscout/schema/migrations/";
  private static final Pattern NAME = Pattern.compile("V(\\d{3})__[a-z0-9_]+\\.sql");

  private BundledMigrations() {}

  /** All bundled migrations, lowest version first; checks the numbers rise (gaps are allowed). */
  public static List<Migration> all() {
    List<Migration> result = new ArrayList<>();
    for (String name : readLines(FOLDER + "index.txt")) {
      Matcher m = NAME.matcher(name);
      if (!m.matches()) {
        throw new IllegalStateException("badly named migration " + name);
      }
      int version = Integer.parseInt(m.group(1));
      // Numbers are reserved for work in progress, so a build may skip one (say 5 before it exists while 7 is
      // shipped); the migrator applies a missing lower one later, in order. Numbers must still rise.
      int last = result.isEmpty() ? 0 : result.get(result.size() - 1).version();
      if (version <= last) {
        throw new IllegalStateException("migration " + name + " breaks the numbering (must be above " + last + ")");
      }
      result.add(new Migration(version, name, String.join("\n", readLines(FOLDER + name))));
    }
    return List.copyOf(result);
  }

  /** The newest schema version this build knows. */
  public static int latestVersion() {
    List<Migration> all = all();
    return all.isEmpty() ? 0 : all.get(all.size() - 1).version();
  }

  private static List<String> readLines(String resource) {
    try (InputStream in = BundledMigrations.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("missing resource " + resource);
      }
      List<String> lines = new ArrayList<>();
      try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
        for (String line; (line = r.readLine()) != null; ) {
          if (!line.isBlank() || !resource.endsWith("index.txt")) {
            lines.add(line);
          }
        }
      }
      return lines;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
