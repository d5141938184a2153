package org.morphscout.app.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.pairing.Verdict;
import org.morphscout.indexer.screen.PairListReader;
import org.morphscout.indexer.screen.PairScreener;
import org.morphscout.indexer.screen.ScreenResult;
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
        + "the catalog are analysed on the fly; an unreadable image gives a fail row with the reason. The file is UTF-8 "
        + "(a byte-order mark is fine); a row that cannot be read (not UTF-8, unbalanced quote, one path) becomes a "
        + "fail row naming its line, and the rest is screened. Rows are read and written one at a time, so lists of "
        + "any length work in bounded memory.")
final class ScreenCommand implements Callable<Integer> {
  /** Images kept analysed while streaming (about 20 KB each). */
  private static final int CACHE = 4096;

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
    PrintWriter out = spec.commandLine().getOut();
    try (PairListReader reader = new PairListReader(csv);
        Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      PairService pairs = new PairService(context, scoring.config());
      PairScreener.Stream screener = new PairScreener(pairs.scorer(), context::resolve).stream(CACHE);
      List<String> extraNames = reader.extraNames();
      Counts counts = new Counts();
      try (Sink sink = sink(out, extraNames)) {
        while (reader.hasNext()) {
          PairListReader.Entry e = reader.next();
          ScreenResult r = e.row() != null ? screener.screen(e.row())
              : new ScreenResult("", "", Verdict.FAIL, 0, List.of(e.problem()), List.of());
          counts.add(r.verdict());
          sink.write(r);
        }
        if (!format.json && !format.csv) {
          out.printf("%d pair%s: %d pass, %d warn, %d fail%n", counts.total(), counts.total() == 1 ? "" : "s",
              counts.pass, counts.warn, counts.fail);
        }
      }
      if (counts.total() == 0) {
        spec.commandLine().getErr().println("screen: " + Terminal.safe(csv.toAbsolutePath().normalize().toString())
            + " holds no pairs to screen");
      }
      return strict && counts.fail > 0 ? ExitCodes.FINISHED_WITH_FAILURES : ExitCodes.OK;
    }
  }

  private static final class Counts {
    int pass;
    int warn;
    int fail;

    void add(Verdict v) {
      switch (v) {
        case PASS -> pass++;
        case WARN -> warn++;
        case FAIL -> fail++;
      }
    }

    int total() {
      return pass + warn + fail;
    }
  }

  /** Where results go as they come: JSON, CSV or text. */
  private interface Sink extends AutoCloseable {
    void write(ScreenResult r) throws IOException;

    @Override
    void close() throws IOException;
  }

  private Sink sink(PrintWriter out, List<String> extraNames) throws IOException {
    if (format.json) {
      JsonGenerator g = JsonOut.MAPPER.getFactory().createGenerator(out).useDefaultPrettyPrinter();
      g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
      g.writeStartObject();
      g.writeArrayFieldStart("results");
      return new Sink() {
        @Override
        public void write(ScreenResult r) throws IOException {
          Map<String, Object> row = new LinkedHashMap<>();
          row.put("first", r.a());
          row.put("second", r.b());
          row.put("verdict", r.verdict().label());
          row.put("score", PairRows.round(r.score(), 1));
          row.put("reasons", r.reasons());
          Map<String, String> extras = new LinkedHashMap<>();
          for (int i = 0; i < r.extras().size(); i++) {
            extras.put(i < extraNames.size() ? extraNames.get(i) : "extra" + (i + 1), r.extras().get(i));
          }
          if (!extras.isEmpty()) {
            row.put("extras", extras);
          }
          JsonOut.MAPPER.writeValue(g, row);
        }

        @Override
        public void close() throws IOException {
          g.writeEndArray();
          g.writeEndObject();
          g.close();
          out.println();
          out.flush();
        }
      };
    }
    if (format.csv) {
      List<String> header = new ArrayList<>(List.of("first", "second"));
      header.addAll(extraNames);
      header.addAll(List.of("verdict", "score", "reasons"));
      CsvOut w = new CsvOut(out, header.toArray(String[]::new));
      return new Sink() {
        @Override
        public void write(ScreenResult r) {
          List<Object> cells = new ArrayList<>(List.of(r.a(), r.b()));
          for (int i = 0; i < extraNames.size(); i++) {
            cells.add(i < r.extras().size() ? r.extras().get(i) : "");
          }
          cells.addAll(List.of(r.verdict().label(), PairRows.round(r.score(), 1), PairRows.reasons(r.reasons())));
          w.row(cells);
        }

        @Override
        public void close() {
          w.close();
        }
      };
    }
    return new Sink() {
      @Override
      public void write(ScreenResult r) {
        out.printf("%-4s %5s  %s%n           %s%n", r.verdict().label(), Text.num(r.score(), 1), Terminal.safe(r.a()),
            Terminal.safe(r.b()));
        if (!r.reasons().isEmpty()) {
          out.printf("           %s%n", Terminal.safe(PairRows.reasons(r.reasons())));
        }
      }

      @Override
      public void close() {
        out.flush();
      }
    };
  }
}
