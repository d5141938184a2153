package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.catalog.DecisionStore.Decision;
import org.morphscout.indexer.catalog.DecisionStore.Verdict;
import org.morphscout.indexer.library.Library;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout decisions}: list the verdicts kept in the catalog. */
@Command(
    name = "decisions",
    mixinStandardHelpOptions = true,
    header = "List your verdicts on pairs (newest first), as text, JSON or CSV.",
    description = "The same verdicts the desktop browser shows and edits.")
final class DecisionsCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Option(names = "--only", paramLabel = "approved|rejected", description = "Only this verdict.")
  String only;

  @Override
  public Integer call() throws Exception {
    Verdict wanted = only == null ? null : DecideCommand.verdict(spec, "--only", only);
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir())) {
      List<Decision> decisions = new ArrayList<>();
      for (Decision d : library.decisions().all()) {
        if (wanted == null || d.verdict() == wanted) {
          decisions.add(d);
        }
      }
      String none = "no decisions yet (morphscout decide A B approve|reject)";
      if (decisions.isEmpty() && (format.json || format.csv)) {
        spec.commandLine().getErr().println(none); // no silent nothing, also for scripts
      }
      if (format.json) {
        List<Map<String, Object>> rows = new ArrayList<>();
        for (Decision d : decisions) {
          Map<String, Object> row = new LinkedHashMap<>();
          row.put("a", d.pathA());
          row.put("b", d.pathB());
          row.put("verdict", d.verdict().word());
          row.put("note", d.note());
          row.put("decidedAt", d.decidedAt());
          rows.add(row);
        }
        JsonOut.write(out, Map.of("decisions", rows, "notes", decisions.isEmpty() ? List.of(none) : List.of()));
      } else if (format.csv) {
        try (CsvOut csv = new CsvOut(out, "a", "b", "verdict", "note", "decided_at")) {
          for (Decision d : decisions) {
            csv.row(d.pathA(), d.pathB(), d.verdict().word(), d.note(), d.decidedAt());
          }
        }
      } else if (decisions.isEmpty()) {
        out.println(none);
      } else {
        for (Decision d : decisions) {
          out.printf("%-8s %s%n         %s%s%n", d.verdict().word(), Terminal.safe(d.pathA()),
              Terminal.safe(d.pathB()), d.note() == null ? "" : "\n         note: " + Terminal.safe(d.note()));
        }
      }
      return ExitCodes.OK;
    }
  }
}
