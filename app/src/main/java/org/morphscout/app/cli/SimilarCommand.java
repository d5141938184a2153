package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.SimilarityService;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout similar IMAGE}: nearest images by appearance, shape or both. */
@Command(
    name = "similar",
    mixinStandardHelpOptions = true,
    header = "List the catalog images most similar to an image, by appearance, by shape, or both.",
    description = "IMAGE may be a catalog image or any image file (analysed on the fly with the catalog's model). "
        + "Distance is 1 - cosine similarity (0 = the same, 1 = unrelated); the query itself is left out.")
final class SimilarCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;

  @Parameters(index = "0", paramLabel = "<image>", description = "The query image.")
  String image;

  // No defaultValue attribute: picocli would apply it after parsing and undo the hidden alias below.
  @Option(names = "--count", paramLabel = "<n>", description = "How many images (default: ${DEFAULT-VALUE}).")
  int k = 10;

  @Option(names = "-k", hidden = true, paramLabel = "<n>", description = "Earlier name of --count.")
  void kAlias(int n) {
    k = n;
  }

  @Option(names = "--by", paramLabel = "appearance|shape|both", defaultValue = "appearance",
      description = "What similar means (default: ${DEFAULT-VALUE}).")
  SimilarityService.By by;

  @Option(names = "--json", description = "Write JSON to stdout.")
  boolean json;

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--count", k, 1, 10_000);
    PrintWriter out = spec.commandLine().getOut();
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      ImageAnalysis query = context.resolve(image);
      List<SimilarityService.Hit> hits = new SimilarityService(context).similar(query, k, by);
      List<String> notes = new ArrayList<>();
      if (hits.isEmpty()) { // no silent nothing: say why
        int ready = library.readyCount(context.modelId());
        notes.add("no similar images: the catalog has " + ready + " ready image" + (ready == 1 ? "" : "s")
            + (ready <= 1 ? " (index more pictures; see status)" : " and none has a usable "
                + by.name().toLowerCase(java.util.Locale.ROOT) + " vector"));
        notes.forEach(n -> spec.commandLine().getErr().println(n));
      }
      if (json) {
        List<Map<String, Object>> results = new ArrayList<>();
        for (SimilarityService.Hit h : hits) {
          Map<String, Object> r = new LinkedHashMap<>();
          r.put("path", h.path());
          r.put("distance", round(h.distance()));
          results.add(r);
        }
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("query", query.path());
        doc.put("by", by.name().toLowerCase(java.util.Locale.ROOT));
        doc.put("results", results);
        doc.put("notes", notes);
        JsonOut.write(out, doc);
      } else {
        out.printf("nearest to %s by %s:%n", Terminal.safe(query.path()), by.name().toLowerCase(java.util.Locale.ROOT));
        for (SimilarityService.Hit h : hits) {
          out.printf("  %s  %s%n", Text.num(h.distance(), 4), Terminal.safe(h.path()));
        }
      }
      return ExitCodes.OK;
    }
  }

  static double round(double v) {
    return Math.round(v * 10000) / 10000.0;
  }
}
