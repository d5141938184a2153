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

/** Loads the layout steps shipped in this module's resources, in order. */
public final class BundledMigrations {
  private static final String FOLDER = "/org/morphscout/schema/layout/";
  private static final String LIST = "steps.txt";
  private static final Pattern NAME = Pattern.compile("step-(\\d{2,})-[a-z0-9-]+\\.sql");

  private BundledMigrations() {}

  /** All bundled steps, lowest number first; checks that the numbers grow strictly. */
  public static List<Migration> all() {
    List<Migration> result = new ArrayList<>();
    for (String name : readLines(FOLDER + LIST, true)) {
      Matcher m = NAME.matcher(name);
      if (!m.matches()) {
        throw new IllegalStateException("badly named layout step " + name + " (expected step-NN-name.sql)");
      }
      int number = Integer.parseInt(m.group(1));
      if (!result.isEmpty() && number <= result.getLast().version()) {
        throw new IllegalStateException("layout step " + name + " is out of order in " + LIST);
      }
      result.add(new Migration(number, name, String.join("\n", readLines(FOLDER + name, false))));
    }
    return List.copyOf(result);
  }

  /** The highest step number this build knows. */
  public static int latestVersion() {
    List<Migration> all = all();
    return all.isEmpty() ? 0 : all.getLast().version();
  }

  private static List<String> readLines(String resource, boolean skipBlank) {
    try (InputStream in = BundledMigrations.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IllegalStateException("missing resource " + resource);
      }
      List<String> lines = new ArrayList<>();
      try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
        for (String line; (line = r.readLine()) != null; ) {
          if (!skipBlank || !line.isBlank()) {
            lines.add(skipBlank ? line.strip() : line);
          }
        }
      }
      return lines;
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
