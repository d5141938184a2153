package org.morphscout.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.pairing.Verdict;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.screen.PairScreener;
import org.morphscout.indexer.screen.ScreenResult;
import org.morphscout.indexer.screen.ScreenRow;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout screen PAIRS.csv}: pass / warn / fail for a list of planned pairs, before rendering. */
@Command(
    name = "screen",
    mixinStandardHelpOptions = true,
    header = "Check a CSV list of planned pairs before rendering: pass, warn or fail, with reasons.",
    description = "Each row holds two image paths (absolute, or relative to the CSV file's folder) and any extra "
        + "columns, which are kept. A header row is recognised when its first cell is not an image path. Images not in "
        + "the catalog are analysed on the fly; an unreadable image gives a fail row with the reason.")
final class ScreenCommand implements Callable<Integer> {
  private static final Set<String> IMAGE_EXTENSIONS = Set.of("jpg", "jpeg", "jpe", "png", "tif", "tiff", "bmp", "gif",
      "webp", "heic", "heif", "avif");

  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;
  @Mixin ScoreOptions scoring;

  @Parameters(index = "0", paramLabel = "<pairs.csv>", description = "The planned pairs.")
  Path csv;

  @Option(names = "--strict", description = "Exit with code 1 when any pair fails.")
  boolean strict;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Override
  public Integer call() throws Exception {
    Table table = read(csv);
    PrintWriter out = spec.commandLine().getOut();
    List<ScreenResult> results;
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      PairService pairs = new PairService(context, scoring.config());
      PairScreener screener = new PairScreener(pairs.scorer(), context::resolve);
      results = screener.screenAll(table.rows(), TerminalProgress.forTerminal(format.json || format.csv),
          CancellationToken.none());
    }
    print(out, table, results);
    boolean anyFail = results.stream().anyMatch(r -> r.verdict() == Verdict.FAIL);
    return strict && anyFail ? ExitCodes.FINISHED_WITH_FAILURES : ExitCodes.OK;
  }

  /** The CSV's rows and the names of its extra columns. */
  record Table(List<String> extraNames, List<ScreenRow> rows) {}

  static Table read(Path file) throws IOException {
    if (!Files.isRegularFile(file)) {
      throw new NoSuchFileException(file.toAbsolutePath().normalize().toString());
    }
    Path base = file.toAbsolutePath().normalize().getParent();
    List<CSVRecord> records;
    try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
      records = CSVFormat.RFC4180.builder().setIgnoreEmptyLines(true).setTrim(true).get().parse(r).getRecords();
    } catch (IllegalStateException | java.io.UncheckedIOException e) {
      throw new MorphscoutException(file + ": not a readable CSV file (" + e.getMessage() + ")");
    }
    List<String> extraNames = new ArrayList<>();
    int first = 0;
    if (!records.isEmpty() && !looksLikeImage(records.get(0).get(0))) {
      for (int i = 2; i < records.get(0).size(); i++) {
        extraNames.add(records.get(0).get(i));
      }
      first = 1;
    }
    List<ScreenRow> rows = new ArrayList<>();
    for (int i = first; i < records.size(); i++) {
      CSVRecord rec = records.get(i);
      if (rec.size() < 2) {
        throw new MorphscoutException(file + ", line " + rec.getRecordNumber() + ": a row needs two image paths");
      }
      List<String> extras = new ArrayList<>();
      for (int c = 2; c < rec.size(); c++) {
        extras.add(rec.get(c));
      }
      rows.add(new ScreenRow(resolve(base, rec.get(0)), resolve(base, rec.get(1)), extras));
    }
    while (!rows.isEmpty() && extraNames.size() < rows.get(0).extras().size()) {
      extraNames.add("extra" + (extraNames.size() + 1));
    }
    return new Table(extraNames, rows);
  }

  private static boolean looksLikeImage(String cell) {
    int dot = cell.lastIndexOf('.');
    return dot > 0 && IMAGE_EXTENSIONS.contains(cell.substring(dot + 1).toLowerCase(Locale.ROOT));
  }

  private static String resolve(Path base, String cell) {
    Path p = Path.of(cell);
    return (p.isAbsolute() ? p : base.resolve(p)).normalize().toString();
  }

  private void print(PrintWriter out, Table table, List<ScreenResult> results) {
    if (format.json) {
      List<Map<String, Object>> rows = new ArrayList<>();
      for (ScreenResult r : results) {
        Map<String, Object> row = new LinkedHashMap<>();
        row.put("a", r.a());
        row.put("b", r.b());
        row.put("verdict", r.verdict().label());
        row.put("score", PairRows.round(r.score(), 1));
        row.put("reasons", r.reasons());
        Map<String, String> extras = new LinkedHashMap<>();
        for (int i = 0; i < r.extras().size(); i++) {
          extras.put(i < table.extraNames().size() ? table.extraNames().get(i) : "extra" + (i + 1), r.extras().get(i));
        }
        if (!extras.isEmpty()) {
          row.put("extras", extras);
        }
        rows.add(row);
      }
      JsonOut.write(out, Map.of("results", rows));
      return;
    }
    if (format.csv) {
      List<String> header = new ArrayList<>(List.of("a", "b"));
      header.addAll(table.extraNames());
      header.addAll(List.of("verdict", "score", "reasons"));
      try (CsvOut w = new CsvOut(out, header.toArray(String[]::new))) {
        for (ScreenResult r : results) {
          List<Object> cells = new ArrayList<>(List.of(r.a(), r.b()));
          cells.addAll(r.extras());
          cells.addAll(List.of(r.verdict().label(), PairRows.round(r.score(), 1), PairRows.reasons(r.reasons())));
          w.row(cells.toArray());
        }
      }
      return;
    }
    int pass = 0;
    int warn = 0;
    int fail = 0;
    for (ScreenResult r : results) {
      switch (r.verdict()) {
        case PASS -> pass++;
        case WARN -> warn++;
        case FAIL -> fail++;
      }
      out.printf("%-4s %5s  %s%n           %s%n", r.verdict().label(), Text.num(r.score(), 1), Terminal.safe(r.a()),
          Terminal.safe(r.b()));
      if (!r.reasons().isEmpty()) {
        out.printf("           %s%n", Terminal.safe(PairRows.reasons(r.reasons())));
      }
    }
    out.printf("%d pairs: %d pass, %d warn, %d fail%n", results.size(), pass, warn, fail);
  }
}
