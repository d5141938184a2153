package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.library.LibrarySettings;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout index PATH...}: add folders to the catalog and analyse new and changed images. */
@Command(
    name = "index",
    mixinStandardHelpOptions = true,
    header = "Add folders to the catalog and analyse new and changed images (incremental).",
    description = {
      "Registers each folder with the catalog (its folders) and scans it recursively. Unchanged files are skipped; changed files "
          + "are analysed again; a file moved or renamed inside the folders keeps its identity and your decisions, while a different picture at an "
          + "old path starts with none (reported as replaced); "
          + "deleted files are marked missing, never dropped. Reads JPEG, PNG, TIFF, BMP, GIF (first frame) and WebP; "
          + "applies EXIF orientation and converts colour profiles to sRGB. Files that cannot be read are listed "
          + "with the reason and the run goes on. After the analysis the vector index is merged into one segment "
          + "when a tenth or more of its images lie outside the largest (faster searches). "
          + "Ctrl-C stops cleanly; the next run resumes.",
    })
final class IndexCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;

  @Parameters(arity = "0..*", paramLabel = "<folder>", description = "Library folders to add and scan (default: the "
      + "catalog's folders).")
  List<Path> folders = new ArrayList<>();

  @Option(names = "--json", description = "Write the summary as JSON to stdout (no progress bar).")
  boolean json;

  @Option(names = "--threads", paramLabel = "<n>", description = "Worker threads (default: all cores).")
  Integer threads;

  @Option(names = "--follow-links", description = "Also follow symbolic links that lead out of the folders.")
  boolean followLinks;

  @Option(names = "--rebuild-vectors",
      description = "Rebuild the vector index from the vectors in the catalog (done by itself when the index files "
          + "are damaged).")
  boolean rebuildVectors;

  @Option(names = "--int8", negatable = true,
      description = "Keep the vector index int8-quantised (about 4x less vector memory, for large libraries; results "
          + "are re-scored exactly). Changing it rebuilds the vector index. Default: off.")
  Boolean int8;

  @Option(names = "--time-limit", paramLabel = "<seconds>", defaultValue = "60",
      description = "A file taking longer than this to read and analyse fails (default: ${DEFAULT-VALUE}).")
  int timeLimit;

  @Option(names = "--neighbours", paramLabel = "<k>", defaultValue = "24",
      description = "Neighbours kept per image in the chain graph (default: ${DEFAULT-VALUE}).")
  int neighbours;

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--threads", threads == null ? 1 : threads, 1, 256)
        .between("--time-limit", timeLimit, 1, 86_400).between("--neighbours", neighbours, 1, 256);
    PrintWriter out = spec.commandLine().getOut();
    if (folders.isEmpty() && !java.nio.file.Files.exists(root.catalogDir().resolve("catalog.db"))) {
      // Checked before opening, which would create an empty catalog.
      throw OptionCheck.of(spec).fail("name at least one folder to index (there is no catalog in "
          + root.catalogDir().toAbsolutePath().normalize() + " yet)");
    }
    IndexOptions options = IndexOptions.defaults()
        .withFollowLinks(followLinks)
        .withRebuildVectors(rebuildVectors)
        .withPerFileTimeLimit(Duration.ofSeconds(timeLimit))
        .withNeighbours(neighbours);
    if (threads != null) {
      options = options.withThreads(threads);
    }
    try (Library library = Library.open(root.catalogDir())) {
      // Without --int8/--no-int8 the catalog keeps the quantisation it has.
      boolean keep = library.int8Vectors();
      options = options.withInt8(int8 != null ? int8 : keep);
      List<Path> roots = new ArrayList<>(folders);
      if (roots.isEmpty()) {
        library.folders().forEach(r -> roots.add(Path.of(r.path())));
        if (roots.isEmpty()) {
          spec.commandLine().getErr().println("index: name at least one folder to index (the catalog has no folders "
              + "yet)");
          return ExitCodes.USAGE;
        }
      }
      IndexReport report = run(library, analysis.setup(), options, roots, TerminalProgress.forTerminal(json),
          spec.commandLine().getErr());
      print(out, report);
      if (report.cancelled()) {
        return ExitCodes.CANCELLED;
      }
      return report.failed() > 0 ? ExitCodes.FINISHED_WITH_FAILURES : ExitCodes.OK;
    }
  }

  /** Runs the indexer, turning Ctrl-C into a clean cancellation that keeps finished work. */
  static IndexReport run(Library library, org.morphscout.indexer.library.AnalysisSetup setup, IndexOptions options,
      List<Path> roots, ProgressListener progress, PrintWriter err) throws java.io.IOException {
    CancellationToken cancel = new CancellationToken();
    try (Interrupts ctrlC = Interrupts.cancelOnCtrlC(cancel, err)) {
      return new LibraryIndexer(library, setup, options).index(roots, progress, cancel);
    }
  }

  private void print(PrintWriter out, IndexReport r) {
    if (json) {
      Map<String, Object> doc = new LinkedHashMap<>();
      doc.put("analysed", r.indexed());
      doc.put("unchanged", r.unchanged());
      doc.put("failed", r.failed());
      List<Map<String, String>> failures = new ArrayList<>();
      r.failures().forEach(f -> failures.add(Map.of("path", f.path(), "reason", f.reason())));
      doc.put("failures", failures);
      doc.put("moved", r.moved());
      doc.put("replaced", r.replaced());
      doc.put("missing", r.missing());
      doc.put("vectorsRestored", r.vectorsRestored());
      doc.put("cancelled", r.cancelled());
      doc.put("model", r.modelId());
      doc.put("seconds", r.elapsed().toMillis() / 1000.0);
      JsonOut.write(out, doc);
      return;
    }
    out.printf("%s %d analysed, %d unchanged, %d moved, %d missing, %d failed in %s s%n",
        r.cancelled() ? "cancelled after" : "done:", r.indexed(), r.unchanged(), r.moved(), r.missing(), r.failed(),
        Text.num(r.elapsed().toMillis() / 1000.0, 1));
    printReplaced(out, r.replaced());
    if (r.vectorsRestored() > 0) {
      out.printf("vector index: %d images restored from the catalog%n", r.vectorsRestored());
    }
    printFailures(out, "failures:", r.failures());
  }

  /** The line both index and import print when paths now hold other pictures. */
  static void printReplaced(PrintWriter out, int replaced) {
    if (replaced > 0) {
      out.printf("%d paths now hold a different picture; decisions stay with the pictures judged, not the paths%n",
          replaced);
    }
  }

  /** Failed files under a title, each path then its reason, escaped for the terminal. */
  static void printFailures(PrintWriter out, String title, List<IndexReport.FileFailure> failures) {
    if (!failures.isEmpty()) {
      out.println(title);
      for (IndexReport.FileFailure f : failures) {
        out.printf("  %s%n    %s%n", Terminal.safe(f.path()), Terminal.safe(f.reason()));
      }
    }
  }
}
