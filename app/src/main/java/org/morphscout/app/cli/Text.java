package org.morphscout.app.cli;

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

  static String num(double v, int decimals) {
    return String.format(Locale.ROOT, "%." + decimals + "f", v);
  }
}
