package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.DecisionTable;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.text.HumanTime;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout decisions}: list the decisions kept in the catalog. */
@Command(
    name = "decisions",
    mixinStandardHelpOptions = true,
    header = "List your decisions on pairs (newest first), as text, JSON or CSV.",
    description = "The same decisions the desktop browser shows and edits. CSV columns: first, second, decision, note, "
        + "decided_at (an ISO-8601 instant, UTC; the text shows your local date and time); the browser's export of approved pairs writes exactly "
        + "decisions --only approved --csv (or --json).")
final class DecisionsCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Option(names = "--only", paramLabel = "approved|rejected", description = "Only this decision.")
  String only;

  @Override
  public Integer call() throws Exception {
    DecisionKind wanted = only == null ? null : DecideCommand.decision(spec, "--only", only);
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir())) {
      List<Decision> decisions = DecisionTable.only(library.decisions().all(), wanted);
      String none = DecisionTable.NONE;
      if (decisions.isEmpty() && (format.json || format.csv)) {
        spec.commandLine().getErr().println(none); // no silent nothing, also for scripts
      }
      if (format.json) {
        JsonOut.write(out, DecisionTable.json(decisions, decisions.isEmpty() ? List.of(none) : List.of()));
      } else if (format.csv) {
        DecisionTable.csv(out, decisions);
        out.flush();
      } else if (decisions.isEmpty()) {
        out.println(none);
      } else {
        for (Decision d : decisions) {
          out.printf("%-8s %s%n         %s%n         decided %s%s%n", d.kind().word(), Terminal.safe(d.pathA()),
              Terminal.safe(d.pathB()), HumanTime.localIso(d.decidedAt()),
              d.note() == null ? "" : "\n         note: " + Terminal.safe(d.note()));
        }
      }
      return ExitCodes.OK;
    }
  }
}
