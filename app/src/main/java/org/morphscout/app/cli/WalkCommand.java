package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.OutputFile;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.Sheets;
import org.morphscout.indexer.library.WalkService;
import org.morphscout.indexer.library.WalkService.WalkAnswer;
import org.morphscout.indexer.library.WalkTable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout walk}: order a set of images into the smoothest walk. */
@Command(
    name = "walk",
    mixinStandardHelpOptions = true,
    header = "Order folders, a list of images, or the whole library into the smoothest walk.",
    description = "Finds an open path through the images with the smallest total step cost and few large jumps (a "
        + "nearest-neighbour construction from several starts, then 2-opt and Or-opt improvement). Reports the total, "
        + "the largest step and the improvement over the order given. "
        + "--csv columns: position, path, step_cost (the cost FROM the previous image TO this one; empty on the first "
        + "row); the browser's walk export writes the same. The --sheet contact sheet writes each step cost on its "
        + "arrow (three significant digits) under a legend saying so.")
final class WalkCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;

  @Parameters(arity = "0..*", paramLabel = "<folder|image>",
      description = "Folders (all ready images below them) or images; none = the whole library.")
  List<String> items = new ArrayList<>();

  @Option(names = "--start", paramLabel = "<image>", description = "Begin the walk with this image.")
  String start;

  @Option(names = "--end", paramLabel = "<image>", description = "End the walk with this image.")
  String end;

  @Option(names = "--shape-weight", paramLabel = "<w>", defaultValue = "0.5",
      description = "0 = steps judged by appearance only, 1 = by silhouette only (default: ${DEFAULT-VALUE}).")
  double shapeWeight;

  @Option(names = "--sheet", paramLabel = "<file.png>",
      description = "Also write a contact sheet of the order (step costs on the arrows).")
  Path sheet;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--shape-weight", shapeWeight, 0, 1);
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      WalkService service = new WalkService(context);
      List<ImageAnalysis> images = service.select(items);
      if (sheet != null) {
        OutputFile.check(sheet, images.stream().map(i -> Path.of(i.path())).toList());
      }
      ImageAnalysis s = start == null ? null : context.resolve(start);
      ImageAnalysis e = end == null ? null : context.resolve(end);
      WalkAnswer answer = service.plan(images, s, e, StepCostModel.withShapeWeight(shapeWeight));
      if (sheet != null) {
        Sheets.sequence(library, "Walk of " + images.size() + " images",
            String.format(java.util.Locale.ROOT, "total %.4f · largest step %.4f · %.0f%% better than the order given",
                answer.result().total(), answer.result().largestStep(), 100 * answer.result().improvement()),
            answer.images().stream().map(ImageAnalysis::id).toList(), answer.steps(), sheet);
        spec.commandLine().getErr()
            .println("contact sheet written to " + Terminal.safe(sheet.toAbsolutePath().normalize().toString()));
      }
      print(out, answer);
      return ExitCodes.OK;
    }
  }

  private void print(PrintWriter out, WalkAnswer a) {
    if (format.json) {
      Map<String, Object> doc = new LinkedHashMap<>();
      doc.put("order", a.images().stream().map(ImageAnalysis::path).toList());
      doc.put("stepCosts", a.steps().stream().map(v -> PairRows.round(v, 4)).toList());
      doc.put("total", PairRows.round(a.result().total(), 4));
      doc.put("largestStep", PairRows.round(a.result().largestStep(), 4));
      doc.put("inputTotal", PairRows.round(a.result().inputTotal(), 4));
      doc.put("improvement", PairRows.round(a.result().improvement(), 4));
      JsonOut.write(out, doc);
      return;
    }
    if (format.csv) {
      try {
        WalkTable.csv(out, a.images().stream().map(ImageAnalysis::path).toList(), a.steps());
      } catch (java.io.IOException e) {
        throw new java.io.UncheckedIOException(e);
      }
      out.flush();
      return;
    }
    for (int i = 0; i < a.images().size(); i++) {
      out.printf("%3d. %s%s%n", i + 1, i == 0 ? "       " : Text.step(a.steps().get(i - 1)) + " ",
          Terminal.safe(a.images().get(i).path()));
    }
    out.printf("total %s, largest step %s; the order given totals %s (%s%% better)%n", Text.step(a.result().total()),
        Text.step(a.result().largestStep()), Text.step(a.result().inputTotal()),
        Text.num(100 * a.result().improvement(), 0));
  }
}
