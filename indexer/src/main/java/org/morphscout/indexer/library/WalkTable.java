package org.morphscout.indexer.library;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.morphscout.indexer.text.CsvCells;

/**
 * The one CSV form of a walk, written by {@code walk --csv} and by the browser's walk export: columns
 * {@code position, path, step_cost}, one row an image in walk order; {@code step_cost} is the cost FROM the previous
 * image TO this one (4 decimals), so the first row's is empty.
 */
public final class WalkTable {
  /** The CSV header. */
  public static final List<String> CSV_COLUMNS = List.of("position", "path", "step_cost");

  private WalkTable() {}

  /**
   * Writes the CSV form; does not close {@code out}.
   *
   * @param paths the images in walk order
   * @param steps the step costs, {@code steps.get(i)} between image {@code i} and image {@code i + 1}
   */
  public static void csv(Writer out, List<String> paths, List<Double> steps) throws IOException {
    if (!paths.isEmpty() && steps.size() != paths.size() - 1) {
      throw new IllegalArgumentException("a walk of " + paths.size() + " images has " + (paths.size() - 1)
          + " steps, not " + steps.size());
    }
    try (CsvCells.Printer csv = CsvCells.printer(out, CSV_COLUMNS.toArray(String[]::new))) {
      for (int i = 0; i < paths.size(); i++) {
        csv.row(i + 1, paths.get(i), i == 0 ? "" : cost(steps.get(i - 1)));
      }
    }
  }

  /** A step cost as written: rounded to 4 decimals, plain notation. */
  static String cost(double v) {
    if (!Double.isFinite(v)) {
      return "";
    }
    BigDecimal d = new BigDecimal(v).setScale(4, RoundingMode.HALF_UP).stripTrailingZeros();
    return d.scale() <= 0 ? d.setScale(1).toPlainString() : d.toPlainString();
  }

  /** Writes the CSV to {@code file} through {@link OutputFile} (never over one of the walk's images). */
  public static void write(Path file, List<String> paths, List<Double> steps) throws IOException {
    OutputFile.write(file, paths.stream().map(Path::of).toList(), temp -> {
      try (Writer w = Files.newBufferedWriter(temp, StandardCharsets.UTF_8)) {
        csv(w, paths, steps);
      }
    });
  }
}
