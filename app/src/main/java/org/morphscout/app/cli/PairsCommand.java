package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.Decisions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout pairs}: the most morph-friendly pairs of the library, or partners of one image. */
@Command(
    name = "pairs",
    mixinStandardHelpOptions = true,
    header = "List the most morph-friendly pairs in the library, or the best partners of one image.",
    description = "Candidates come from the vector index (similar outline or appearance) and are scored exactly: "
        + "how well the silhouettes match after alignment (aligned IoU), warp effort and fold risk, appearance and colour gaps, framing. "
        + "index stores every candidate pair's measures, so the answer is read from the catalog and scored under the "
        + "current settings (--set, --score-config) in seconds; when the stored pairs are not up to date, or "
        + "--candidates differs from the stored 20, pairs are measured live and a note says so. "
        + "Score 0-100 with a verdict (pass >= passScore, warn >= warnScore, else fail) and reasons. Near-duplicates "
        + "(the same picture resized, recompressed or lightly edited) are never proposed; --duplicates lists them.")
final class PairsCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;
  @Mixin ScoreOptions scoring;

  @Option(names = "--for", paramLabel = "<image>", description = "Best partners of this image (catalog or any file).")
  String forImage;

  // No defaultValue attribute: picocli would apply it after parsing and undo the hidden alias below.
  @Option(names = "--count", paramLabel = "<n>", description = "How many pairs (default: ${DEFAULT-VALUE}).")
  int top = 20;

  @Option(names = "--top", hidden = true, paramLabel = "<n>", description = "Earlier name of --count.")
  void topAlias(int n) {
    top = n;
  }

  @Option(names = "--min-score", paramLabel = "<s>", defaultValue = "0",
      description = "Leave out pairs scoring below this (default: ${DEFAULT-VALUE}).")
  double minScore;

  @Option(names = "--candidates", paramLabel = "<k>", defaultValue = "20",
      description = "Candidates per image taken from the index (default: ${DEFAULT-VALUE}).")
  int candidates;

  @Option(names = "--duplicates", description = "List the near-duplicates found instead of pairs.")
  boolean duplicates;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--count", top, 1, Integer.MAX_VALUE).between("--candidates", candidates, 1, 1000)
        .between("--min-score", minScore, 0, 100);
    PrintWriter out = spec.commandLine().getOut();
    PairQuery query = new PairQuery(candidates, top, minScore);
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      PairService service = new PairService(context, scoring.config());
      PairSearchResult result;
      ImageAnalysis image = forImage == null ? null : context.resolve(forImage);
      if (image != null) {
        result = service.partners(image, query, TerminalProgress.forTerminal(format.json || format.csv),
            CancellationToken.none());
      } else {
        result = service.bestPairs(query, TerminalProgress.forTerminal(format.json || format.csv),
            CancellationToken.none());
      }
      Paths paths = new Paths(context, image == null ? null : image.path());
      if (duplicates) {
        result.notes().forEach(n -> spec.commandLine().getErr().println(n));
        printDuplicates(out, result, paths);
      } else {
        printPairs(out, result, paths, library.decisions());
      }
      return ExitCodes.OK;
    }
  }

  /** Paths by id; -1 stands for an image outside the catalog. */
  private record Paths(QueryContext context, String outside) {
    String of(long id) {
      if (id < 0) {
        return outside;
      }
      return context.library().image(id).map(r -> r.path()).orElse("#" + id);
    }
  }

  /** Why a search gave no pairs, in one line; empty when pairs were found (no silent nothing). */
  private List<String> notes(PairSearchResult result) {
    List<String> notes = new ArrayList<>(result.notes());
    notes.addAll(emptyNotes(result));
    return notes;
  }

  private List<String> emptyNotes(PairSearchResult result) {
    if (!result.pairs().isEmpty()) {
      return List.of();
    }
    if (result.scored() == 0) {
      return List.of("no pairs found: no candidate pairs were scored (the catalog needs at least two ready images;"
          + " see status)");
    }
    return List.of("no pairs found" + (minScore > 0 ? " scoring at least " + minScore : "") + ": "
        + result.scored() + " pairs scored, " + result.duplicates().size() + " near-duplicate pairs left out"
        + (minScore > 0 ? "; try a lower --min-score" : ""));
  }

  private void printPairs(PrintWriter out, PairSearchResult result, Paths paths, Decisions decisions) {
    List<String> notes = notes(result);
    notes.forEach(n -> spec.commandLine().getErr().println(n));
    if (format.json) {
      List<Map<String, Object>> rows = new ArrayList<>();
      for (ScoredPair p : result.pairs()) {
        Map<String, Object> row = PairRows.json(paths.of(p.a()), paths.of(p.b()), p.score());
        decisions.find(p.a(), p.b()).ifPresent(d -> row.put("decision", d.kind().word()));
        rows.add(row);
      }
      Map<String, Object> doc = new LinkedHashMap<>();
      doc.put("pairs", rows);
      doc.put("duplicatesExcluded", result.duplicates().size());
      doc.put("scored", result.scored());
      doc.put("notes", notes);
      JsonOut.write(out, doc);
      return;
    }
    if (format.csv) {
      // The sub-scores come last, so the columns before them keep their places whatever sub-scores there are.
      List<String> header = new ArrayList<>(List.of("first", "second", "score", "verdict", "reasons", "decision"));
      header.addAll(PairRows.componentColumns());
      try (CsvOut csv = new CsvOut(out, header.toArray(String[]::new))) {
        for (ScoredPair p : result.pairs()) {
          List<Object> cells = new ArrayList<>(List.of(paths.of(p.a()), paths.of(p.b()),
              PairRows.round(p.score().score(), 1), p.score().verdict().label(), PairRows.reasons(p.score().reasons()),
              decisions.find(p.a(), p.b()).map(d -> d.kind().word()).orElse("")));
          cells.addAll(PairRows.componentCells(p.score()));
          csv.row(cells);
        }
      }
      return;
    }
    int rank = 0;
    for (ScoredPair p : result.pairs()) {
      String decided = decisions.find(p.a(), p.b()).map(d -> "  [" + d.kind().word() + "]").orElse("");
      out.printf("%2d. %5s %-4s %s%n             %s%s%n", ++rank, Text.num(p.score().score(), 1),
          p.score().verdict().label(), Terminal.safe(paths.of(p.a())), Terminal.safe(paths.of(p.b())), decided);
      if (!p.score().reasons().isEmpty()) {
        out.printf("             %s%n", PairRows.reasons(p.score().reasons()));
      }
    }
    out.printf("(%d pairs scored; %d near-duplicate pairs left out: pairs --duplicates lists them)%n", result.scored(),
        result.duplicates().size());
  }

  private void printDuplicates(PrintWriter out, PairSearchResult result, Paths paths) {
    if (format.json) {
      List<Map<String, String>> rows = new ArrayList<>();
      result.duplicates().forEach(d -> rows.add(Map.of("first", paths.of(d.a()), "second", paths.of(d.b()))));
      JsonOut.write(out, Map.of("duplicates", rows));
    } else if (format.csv) {
      try (CsvOut csv = new CsvOut(out, "first", "second")) {
        result.duplicates().forEach(d -> csv.row(paths.of(d.a()), paths.of(d.b())));
      }
    } else {
      if (result.duplicates().isEmpty()) {
        out.println("no near-duplicates found");
      }
      result.duplicates().forEach(d -> out.printf("%s%n  = %s%n", Terminal.safe(paths.of(d.a())),
          Terminal.safe(paths.of(d.b()))));
    }
  }
}
