package org.morphscout.app.cli;

/**
 * Makes text from files and users (paths, notes, reasons) safe to print in plain-text output: control characters
 * (C0, DEL, C1 and the line and paragraph separators) are shown as visible escapes instead of reaching the terminal,
 * where an escape sequence could recolour or rewrite the screen, a bell ring or a carriage return hide what came
 * before. JSON and CSV output are not passed through here: JSON escapes control characters itself, and CSV keeps the
 * value intact inside quotes (see {@link CsvCells} for its own rule).
 */
final class Terminal {
  private Terminal() {}

  /** The text with every control character replaced by a visible escape such as {@code \n} or {@code \x1B}. */
  static String safe(String text) {
    if (text == null) {
      return null;
    }
    int i = 0;
    while (i < text.length() && !isControl(text.charAt(i))) {
      i++;
    }
    if (i == text.length()) {
      return text;
    }
    StringBuilder sb = new StringBuilder(text.length() + 8).append(text, 0, i);
    for (; i < text.length(); i++) {
      char c = text.charAt(i);
      if (!isControl(c)) {
        sb.append(c);
      } else if (c == '\n') {
        sb.append("\\n");
      } else if (c == '\r') {
        sb.append("\\r");
      } else if (c == '\t') {
        sb.append("\\t");
      } else if (c < 0x100) {
        sb.append(String.format("\\x%02X", (int) c));
      } else {
        sb.append(String.format("\\u%04X", (int) c));
      }
    }
    return sb.toString();
  }

  static boolean isControl(char c) {
    return c < 0x20 || (c >= 0x7F && c <= 0x9F) || c == '\u2028' || c == '\u2029';
  }
}
