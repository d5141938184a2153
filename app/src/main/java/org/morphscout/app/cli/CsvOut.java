package org.morphscout.app.cli;

import java.io.PrintWriter;
import org.morphscout.indexer.text.CsvCells;

/** Writes RFC 4180 CSV with a header row to a command's stdout, every cell under {@link CsvCells}' formula rule. */
final class CsvOut implements AutoCloseable {
  private final CsvCells.Printer printer;

  CsvOut(PrintWriter out, String... header) {
    printer = CsvCells.printer(out, header);
  }

  void row(Object... values) {
    printer.row(values);
  }

  void row(java.util.List<?> values) {
    printer.row(values);
  }

  @Override
  public void close() {
    printer.close();
  }
}
