package org.morphscout.indexer.text;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.Arrays;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * The one rule for cells of every CSV file Morphscout writes: a text cell that a spreadsheet would run as a formula is
 * neutralised by putting a single quote in front of it.
 *
 * <p>A cell is neutralised when it starts with {@code =}, {@code +}, {@code -}, {@code @}, a tab or a carriage return,
 * the characters the OWASP "CSV Injection" guidance lists (spreadsheets treat such cells as formulas, which can run
 * commands or leak data, e.g. {@code =HYPERLINK(...)}). Numbers are written as numbers and never changed, so a negative
 * score stays a number; only text (paths, notes, reasons, columns passed through from a user's file) is checked.
 * Reading the file back, a cell starting with {@code '} followed by one of those characters is the original text with
 * one quote in front.
 *
 * <p>The files are RFC 4180 CSV (comma, double-quote quoting, CRLF line ends) in UTF-8.
 */
public final class CsvCells {
  /** The characters that make a spreadsheet read a cell as a formula (OWASP "CSV Injection"). */
  private static final String FORMULA_STARTS = "=+-@\t\r";

  private CsvCells() {}

  /** The cell as written: text starting with a formula character gets a leading {@code '}; anything else unchanged. */
  public static Object cell(Object value) {
    if (value instanceof CharSequence text) {
      return safe(text.toString());
    }
    return value;
  }

  /** The text cell as written (see the class comment). */
  public static String safe(String text) {
    if (text == null || text.isEmpty()) {
      return text;
    }
    return FORMULA_STARTS.indexOf(text.charAt(0)) >= 0 ? "'" + text : text;
  }

  /** A printer that writes the header and then rows through {@link #row}, every cell passed through this rule. */
  public static Printer printer(Writer out, String... header) {
    try {
      return new Printer(new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(safeAll(header)).get()));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  private static String[] safeAll(String[] header) {
    return Arrays.stream(header).map(CsvCells::safe).toArray(String[]::new);
  }

  /** Writes rows with every cell under the rule; closing flushes (the writer itself stays open). */
  public static final class Printer implements AutoCloseable {
    private final CSVPrinter printer;

    private Printer(CSVPrinter printer) {
      this.printer = printer;
    }

    /** One row; cells may be text, numbers or null (written empty). */
    public void row(Object... values) {
      try {
        Object[] cells = new Object[values.length];
        for (int i = 0; i < values.length; i++) {
          cells[i] = cell(values[i]);
        }
        printer.printRecord(cells);
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }

    /** One row from a list of cells. */
    public void row(java.util.List<?> values) {
      row(values.toArray());
    }

    @Override
    public void close() {
      try {
        printer.flush();
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    }
  }
}
