package org.morphscout.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** Writes RFC 4180 CSV with a header row to a command's stdout. */
final class CsvOut implements AutoCloseable {
  private final CSVPrinter printer;

  CsvOut(PrintWriter out, String... header) {
    try {
      printer = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(header).get());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  void row(Object... values) {
    try {
      printer.printRecord(values);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
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
