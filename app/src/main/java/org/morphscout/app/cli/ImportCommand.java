package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceLoader;
import java.util.concurrent.Callable;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.library.AnalysisImporter;
import org.morphscout.indexer.library.ImportReport;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.OutsideAnalyses;
import org.morphscout.indexer.progress.CancellationToken;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout import DIR}: load the cluster job's analyses into the catalog. */
@Command(
    name = "import",
    mixinStandardHelpOptions = true,
    header = "Load analyses made by the cluster job (Apache Spark, Parquet output) into the catalog.",
    description = {
      "Reads the folder the cluster job wrote (see the README, 'Libraries larger than one machine') and stores its "
          + "analyses as 'index' would have: images keep their identity by path and content hash (a picture at a new "
          + "path whose old file is gone keeps its decisions), vectors go into the vector index (merged into one "
          + "segment as after 'index'), and the neighbour graph and stored pairs are brought up to date. Importing "
          + "the same folder twice changes nothing. The "
          + "whole folder is checked first: a damaged or foreign Parquet file is refused and nothing is stored. The "
          + "catalog must use the same appearance model and silhouettes as the job (an empty catalog takes the "
          + "job's). Needs the cluster job's module built (mvn -pl indexer/spark -am package -DskipTests).",
    })
final class ImportCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Parameters(index = "0", paramLabel = "<folder>", description = "The folder the cluster job wrote (--out).")
  Path folder;

  @Option(names = "--json", description = "Write the summary as JSON to stdout (no progress bar).")
  boolean json;

  @Option(names = "--threads", paramLabel = "<n>", description = "Worker threads for the pair step (default: all "
      + "cores).")
  Integer threads;

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--threads", threads == null ? 1 : threads, 1, 256);
    OutsideAnalyses reader = reader().orElseThrow(() -> new MorphscoutException("import reads the cluster job's "
        + "Parquet output with the job's module, which is not built here: run 'mvn -B -q -pl indexer/spark -am "
        + "package -DskipTests' in the Morphscout folder (downloads Apache Spark), then run import again"));
    IndexOptions options = IndexOptions.defaults();
    if (threads != null) {
      options = options.withThreads(threads);
    }
    try (Library library = Library.open(root.catalogDir())) {
      CancellationToken cancel = new CancellationToken();
      ImportReport report;
      try (Interrupts ctrlC = Interrupts.cancelOnCtrlC(cancel, spec.commandLine().getErr())) {
        report = new AnalysisImporter(library, options)
            .importFrom(reader, folder, TerminalProgress.forTerminal(json), cancel);
      }
      print(spec.commandLine().getOut(), report);
      if (report.cancelled()) {
        return ExitCodes.CANCELLED;
      }
      return report.failures().isEmpty() ? ExitCodes.OK : ExitCodes.FINISHED_WITH_FAILURES;
    }
  }

  /** The reader the cluster job's module provides, when it is on the class path. */
  static Optional<OutsideAnalyses> reader() {
    return ServiceLoader.load(OutsideAnalyses.class).findFirst();
  }

  private void print(PrintWriter out, ImportReport r) {
    if (json) {
      Map<String, Object> doc = new LinkedHashMap<>();
      doc.put("added", r.added());
      doc.put("unchanged", r.unchanged());
      doc.put("moved", r.moved());
      doc.put("replaced", r.replaced());
      doc.put("failed", r.failures().size());
      List<Map<String, String>> failures = new ArrayList<>();
      r.failures().forEach(f -> failures.add(Map.of("path", f.path(), "reason", f.reason())));
      doc.put("failures", failures);
      doc.put("cancelled", r.cancelled());
      doc.put("model", r.modelId());
      doc.put("seconds", r.elapsed().toMillis() / 1000.0);
      JsonOut.write(out, doc);
      return;
    }
    out.printf("%s %d added, %d unchanged, %d moved, %d failed in %s s%n",
        r.cancelled() ? "cancelled after" : "done:", r.added(), r.unchanged(), r.moved(), r.failures().size(),
        Text.num(r.elapsed().toMillis() / 1000.0, 1));
    IndexCommand.printReplaced(out, r.replaced());
    IndexCommand.printFailures(out, "failures (as the job reported them):", r.failures());
  }
}
