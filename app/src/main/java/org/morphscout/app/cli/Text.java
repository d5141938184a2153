package org.morphscout.app.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Small formatting helpers for plain-text output. */
final class Text {
  private Text() {}

  static String bytes(long n) {
    if (n < 1024) {
      return n + " B";
    }
    String[] units = {"KiB", "MiB", "GiB", "TiB"};
    double v = n;
    int u = -1;
    while (v >= 1024 && u < units.length - 1) {
      v /= 1024;
      u++;
    }
    return String.format(Locale.ROOT, "%.1f %s", v, units[u]);
  }

  /**
   * A step cost (or a sum of them) as printed: 4 decimals, the precision of the CSV, so neighbouring steps of a walk
   * (often 0.003 to 0.006) still differ on screen.
   */
  static String step(double v) {
    return num(v, 4);
  }

  static String num(double v, int decimals) {
    return String.format(Locale.ROOT, "%." + decimals + "f", v);
  }

  /** The text broken at spaces into lines of at most {@code width} characters (longer words stay whole), indented. */
  static List<String> wrap(String text, int width, String indent) {
    List<String> lines = new ArrayList<>();
    StringBuilder line = new StringBuilder();
    for (String word : text.split(" ")) {
      if (line.length() > 0 && line.length() + 1 + word.length() > width) {
        lines.add(indent + line);
        line.setLength(0);
      }
      line.append(line.length() > 0 ? " " : "").append(word);
    }
    if (line.length() > 0) {
      lines.add(indent + line);
    }
    return lines;
  }
}
