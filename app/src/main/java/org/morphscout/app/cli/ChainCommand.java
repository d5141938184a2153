package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.library.ChainService.ChainAnswer;
import org.morphscout.indexer.library.ChainService.ChainDetail;
import org.morphscout.indexer.library.ChainService.StepDetail;
import org.morphscout.indexer.library.ChainService;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.OutputFile;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout chain FROM TO}: chains of real library images between two endpoints. */
@Command(
    name = "chain",
    mixinStandardHelpOptions = true,
    header = "Find chains of similar real images between two catalog images, in small even steps.",
    description = "Searches the neighbour graph for the chains with the smallest sum of squared step costs (many small, "
        + "even steps beat a few big ones), within the step bounds, and returns several alternatives that share few "
        + "images. Each step is scored as a pair. Unevenness is the coefficient of variation of the step costs (0 = "
        + "perfectly even). The direct pair's score is shown for comparison.")
final class ChainCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;
  @Mixin ScoreOptions scoring;

  @Parameters(index = "0", paramLabel = "<from>", description = "Start image (in the catalog).")
  String from;

  @Parameters(index = "1", paramLabel = "<to>", description = "End image (in the catalog).")
  String to;

  // No defaultValue attribute: picocli would apply it after parsing and undo the hidden alias below.
  @Option(names = "--count", paramLabel = "<n>", description = "How many different chains (default: "
      + "${DEFAULT-VALUE}).")
  int alternatives = 3;

  @Option(names = "--alternatives", hidden = true, paramLabel = "<n>", description = "Earlier name of --count.")
  void alternativesAlias(int n) {
    alternatives = n;
  }

  @Option(names = "--min-steps", paramLabel = "<n>", defaultValue = "1", description = "Fewest steps (default: "
      + "${DEFAULT-VALUE}).")
  int minSteps;

  @Option(names = "--max-steps", paramLabel = "<n>", defaultValue = "12", description = "Most steps (default: "
      + "${DEFAULT-VALUE}).")
  int maxSteps;

  @Option(names = "--shape-weight", paramLabel = "<w>", defaultValue = "0.5",
      description = "0 = steps judged by appearance only, 1 = by silhouette only (default: ${DEFAULT-VALUE}).")
  double shapeWeight;

  @Option(names = "--avoid", paramLabel = "<image>", description = "Never pass through this image. Repeatable.")
  List<String> avoid = new ArrayList<>();

  @Option(names = "--via", paramLabel = "<image>", description = "Pass through this image (in order). Repeatable.")
  List<String> via = new ArrayList<>();

  @Option(names = "--sheet", paramLabel = "<file.png>", description = "Also write a contact sheet of the chains.")
  Path sheet;

  @ArgGroup(exclusive = true)
  OutputFormat format = new OutputFormat();

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--count", alternatives, 1, 20)
        .between("--min-steps", minSteps, 1, ChainQuery.STEP_LIMIT)
        .between("--max-steps", maxSteps, minSteps, ChainQuery.STEP_LIMIT).between("--shape-weight", shapeWeight, 0, 1);
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      ImageAnalysis a = context.resolve(from);
      ImageAnalysis b = context.resolve(to);
      if (sheet != null) {
        OutputFile.check(sheet, List.of(Path.of(a.path()), Path.of(b.path())));
      }
      Set<Long> avoidIds = new LinkedHashSet<>();
      avoid.forEach(p -> avoidIds.add(library.require(p).id()));
      List<Long> viaIds = new ArrayList<>();
      via.forEach(p -> viaIds.add(library.require(p).id()));
      checkEnds(a.id(), b.id(), avoidIds, viaIds);
      ChainQuery query = ChainQuery.between(a.id(), b.id()).withAlternatives(alternatives)
          .withSteps(minSteps, maxSteps).withShapeWeight(shapeWeight).withAvoid(avoidIds).withVia(viaIds);
      PairService pairs = new PairService(context, scoring.config());
      ChainAnswer answer = new ChainService(context, pairs).chains(a, b, query);
      if (sheet != null) {
        org.morphscout.indexer.library.Sheets.chains(context.library(), answer, sheet);
        spec.commandLine().getErr()
            .println("contact sheet written to " + Terminal.safe(sheet.toAbsolutePath().normalize().toString()));
      }
      print(out, answer, context);
      return ExitCodes.OK;
    }
  }

  /** The query's rules on ends, waypoints and avoided images, as usage errors in the user's words (no ids). */
  private void checkEnds(long a, long b, Set<Long> avoidIds, List<Long> viaIds) {
    OptionCheck check = OptionCheck.of(spec);
    if (a == b) {
      throw check.fail("<from> and <to> are the same image; a chain needs two different images");
    }
    if (new LinkedHashSet<>(viaIds).size() != viaIds.size() || viaIds.contains(a) || viaIds.contains(b)) {
      throw check.fail("--via images must differ from each other and from <from> and <to>");
    }
    if (avoidIds.contains(a) || avoidIds.contains(b) || viaIds.stream().anyMatch(avoidIds::contains)) {
      throw check.fail("--avoid must not name <from>, <to> or a --via image");
    }
    if (viaIds.size() + 1 > maxSteps) {
      throw check.fail("--max-steps " + maxSteps + " is too few to pass through " + viaIds.size() + " --via images");
    }
  }

  private void print(PrintWriter out, ChainAnswer answer, QueryContext context) {
    if (answer.chains().isEmpty() && (format.json || format.csv)) {
      spec.commandLine().getErr().println("no chain: " + answer.reason()); // no silent nothing in machine output
    }
    java.util.function.LongFunction<String> path = id -> context.library().image(id).map(r -> r.path())
        .orElse("#" + id);
    if (format.json) {
      Map<String, Object> doc = new LinkedHashMap<>();
      doc.put("from", answer.from().path());
      doc.put("to", answer.to().path());
      doc.put("direct", PairRows.json(answer.from().path(), answer.to().path(), answer.direct()));
      List<Map<String, Object>> chains = new ArrayList<>();
      for (ChainDetail d : answer.chains()) {
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("images", d.chain().images().stream().map(path::apply).toList());
        List<Map<String, Object>> steps = new ArrayList<>();
        for (StepDetail s : d.steps()) {
          steps.add(step(s, path));
        }
        c.put("steps", steps);
        c.put("largestStep", PairRows.round(d.chain().maxStep(), 4));
        c.put("unevenness", PairRows.round(d.chain().evenness(), 4));
        c.put("sumOfSquaredStepCosts", PairRows.round(d.chain().total(), 4));
        c.put("sharedImages", PairRows.round(d.chain().sharedImages(), 4));
        chains.add(c);
      }
      doc.put("chains", chains);
      doc.put("notes", answer.chains().isEmpty() ? List.of("no chain: " + answer.reason()) : List.of());
      if (answer.chains().isEmpty()) {
        doc.put("reason", answer.reason());
        doc.put("closestReachable", answer.closestReachable() < 0 ? null : path.apply(answer.closestReachable()));
      }
      JsonOut.write(out, doc);
      return;
    }
    if (format.csv) {
      try (CsvOut csv = new CsvOut(out, "chain", "step", "first", "second", "step_cost", "appearance_distance", "shape_distance", "aligned_iou",
          "mean_displacement", "colour_gap", "score", "verdict")) {
        int n = 0;
        for (ChainDetail d : answer.chains()) {
          n++;
          int i = 0;
          for (StepDetail s : d.steps()) {
            Map<String, Object> st = step(s, path);
            csv.row(n, ++i, st.get("first"), st.get("second"), st.get("stepCost"), st.get("appearanceDistance"), st.get("shapeDistance"),
                st.get("alignedIou"),
                st.get("meanDisplacement"), st.get("colourGap"), st.get("score"), st.get("verdict"));
          }
        }
      }
      return;
    }
    out.printf("from %s%n  to %s%n", Terminal.safe(answer.from().path()), Terminal.safe(answer.to().path()));
    out.printf("direct pair: score %s (%s)%s%n", Text.num(answer.direct().score(), 1),
        answer.direct().verdict().label(),
        answer.direct().reasons().isEmpty() ? "" : ": " + PairRows.reasons(answer.direct().reasons()));
    if (answer.chains().isEmpty()) {
      out.println("no chain: " + answer.reason());
      if (answer.closestReachable() >= 0) {
        out.println("closest reachable image to the end: " + Terminal.safe(path.apply(answer.closestReachable())));
      }
      return;
    }
    int n = 0;
    for (ChainDetail d : answer.chains()) {
      out.printf("%nchain %d: %d steps, largest step %s, unevenness %s, images shared with earlier chains %s%n", ++n,
          d.steps().size(), Text.step(d.chain().maxStep()), Text.num(d.chain().evenness(), 2),
          Text.num(d.chain().sharedImages(), 2));
      out.printf("  %s%n", Terminal.safe(path.apply(d.chain().images().get(0))));
      for (StepDetail s : d.steps()) {
        Map<String, Object> st = step(s, path);
        out.printf("    step cost %s | score %s %s | aligned IoU %s, mean displacement %s, colour gap %s%n  %s%n",
            Text.step(s.cost()), Text.num(s.score().score(), 1), s.score().verdict().label(), st.get("alignedIou"),
            st.get("meanDisplacement"), st.get("colourGap"), Terminal.safe(path.apply(s.b())));
      }
    }
  }

  private static Map<String, Object> step(StepDetail s, java.util.function.LongFunction<String> path) {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("first", path.apply(s.a()));
    m.put("second", path.apply(s.b()));
    m.put("stepCost", PairRows.round(s.cost(), 4));
    m.put("appearanceDistance", PairRows.round(s.components().appearanceDistance(), 4));
    m.put("shapeDistance", PairRows.round(s.components().shapeIncompatibility(), 4));
    m.put("alignedIou", PairRows.round(s.score().measures().getOrDefault("alignedIou", Double.NaN), 3));
    m.put("meanDisplacement", PairRows.round(s.score().measures().getOrDefault("meanDisplacement", Double.NaN), 3));
    m.put("colourGap", PairRows.round(s.components().colourGap(), 2));
    m.put("score", PairRows.round(s.score().score(), 1));
    m.put("verdict", s.score().verdict().label());
    return m;
  }
}
