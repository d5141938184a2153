package org.morphscout.app.cli;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.Backdrop;
import org.morphscout.demo.BackdropKind;
import org.morphscout.demo.Glazes;
import org.morphscout.demo.ImageCodec;
import org.morphscout.demo.Lighting;
import org.morphscout.demo.Placement;
import org.morphscout.demo.Shot;
import org.morphscout.demo.VesselRenderer;
import org.morphscout.app.bench.CatalogVolumes;
import org.morphscout.indexer.Folders;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.app.bench.ChainBenchmark;
import org.morphscout.app.bench.FeatureBenchmark;
import org.morphscout.app.bench.HeapMeter;
import org.morphscout.app.bench.IndexingBenchmark;
import org.morphscout.app.bench.MachineInfo;
import org.morphscout.app.bench.PairBenchmark;
import org.morphscout.app.bench.PairStoreCost;
import org.morphscout.app.bench.PeerVectors;
import org.morphscout.app.bench.RescanBenchmark;
import org.morphscout.app.bench.SilhouetteCost;
import org.morphscout.app.bench.StoredPairsBenchmark;
import org.morphscout.app.bench.VectorSearchBenchmark;
import org.morphscout.app.bench.WalkBenchmark;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneIndexOptions.Quantization;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code morphscout bench}: measures indexing, features, vector search, pairs, chains and walks; prints Markdown. */
@Command(
    name = "bench",
    mixinStandardHelpOptions = true,
    header = "Measure indexing, features, vector search, pairs, chains and walks on this machine (Markdown report).",
    description = {
      "Generates realistic test photos (3000x2000 JPEG, quality 90, cached in the work folder) and synthetic vectors "
          + "and graphs (seeded), runs each benchmark and prints a Markdown report with the machine description and "
          + "the targets met or missed. Progress goes to stderr. Does not touch the catalog.",
      "Each vector index is searched at the default candidate count and at 50, 100 and 200 candidates per query "
          + "(recall against speed, no rebuild needed). The browser's memory is measured by a separate benchmark "
          + "that needs the test tools' headless JavaFX (see docs/BENCHMARKS.md).",
      "The full run indexes 300 photos and searches up to 1,000,000 vectors; give the JVM room for it, for example "
          + "MORPHSCOUT_JAVA_OPTS=-Xmx12g ./morphscout bench --out bench.md; it takes about 85 minutes on 2 cores "
          + "(two 1M-vector index builds of ~30 minutes each, each then merged into one segment in ~5). --quick "
          + "takes ~6 minutes on a quiet 2-core machine, ~13 on a busy one (plus ~5 minutes to render the photos the "
          + "first time).",
    })
final class BenchCommand implements Callable<Integer> {
  private static final long SEED = 20_261_201L;
  private static final int DIMENSION = 560; // the built-in appearance descriptor
  /** Candidate counts measured on every built vector index besides the default. */
  private static final List<Integer> CANDIDATE_SWEEP = List.of(50, 100, 200);
  /** With --peers, also the small counts where native libraries reach recall 0.95. */
  private static final List<Integer> PEER_SWEEP = List.of(10, 20, 30, 50, 100, 200);

  @Spec CommandSpec spec;

  @Option(names = "--quick", description = "Smaller sizes (60 photos, 10k and 100k vectors, fewer chain queries).")
  boolean quick;

  @Option(names = "--out", paramLabel = "<file.md>", description = "Also write the report to this file.")
  Path out;

  @Option(names = "--work", paramLabel = "<folder>", description = "Scratch folder (default: a folder in the system "
      + "temp folder); generated photos are cached there between runs.")
  Path work;

  @Option(names = "--photos", paramLabel = "<n>", description = "Photos to index (default 300, quick 60).")
  Integer photos;

  @Option(names = "--vectors", paramLabel = "<n>", split = ",", description = "Vector counts to search (default "
      + "10000,100000,1000000; quick 10000,100000).")
  List<Integer> vectorSizes;

  @Option(names = "--catalog-volumes", paramLabel = "<catalog>", description = "Also report the per-image data "
      + "volumes of this catalog folder (for example a demo catalog).")
  Path volumesCatalog;

  @Option(names = "--stored-pairs", paramLabel = "<images>", split = ",", description = "Only measure whole-library "
      + "pair queries (pairs --count 30) on stored pairs of synthetic catalogs of these sizes, for example "
      + "10000,100000, and stop. Give the JVM room for the largest (MORPHSCOUT_JAVA_OPTS=-Xmx4g is plenty).")
  List<Integer> storedPairSizes;

  @Option(names = "--pair-cost", paramLabel = "<folder>", description = "Only measure what storing pairs adds to "
      + "indexing this folder of images (into a scratch catalog, with index's default settings), and stop. "
      + "Combines with --stored-pairs.")
  Path pairCostFolder;

  @Option(names = "--rescan", paramLabel = "<files>", description = "Only measure index on a library of this many "
      + "unchanged files (for example 100000) and then with 1,000 new pictures added, and stop. Combines with "
      + "--stored-pairs and --pair-cost.")
  Integer rescanFiles;

  @Option(names = "--silhouette-cost", paramLabel = "<folder>", description = "Only measure what the per-image "
      + "choice of silhouettes costs: index this folder with the classical extractor alone, then with auto (the "
      + "per-image choice), into scratch catalogs; and stop. Combines with --stored-pairs, --pair-cost and --rescan.")
  Path silhouetteCostFolder;

  @Option(names = "--peers", paramLabel = "<folder>", description = "Only measure our vector search at the --vectors "
      + "sizes (default 100000) and both real dimensions (560 appearance, 1024 shape), float, and write the vectors, "
      + "queries and our figures to this folder for scripts/vector-peers, which runs other libraries on the same "
      + "data; then stop. Each index is kept in that folder (index-N-D) and searched again without rebuilding by the "
      + "next run into the same folder; delete it to rebuild.")
  Path peersFolder;

  @Option(names = "--decode-floor", description = "Only measure indexing against its floor (decoding alone, with the "
      + "same decoder) on generated 12-megapixel photos (4000x3000 JPEG, quality 90; --photos of them, default 30), at "
      + "1 to N threads (N = cores), with classical silhouettes and then with the learned model for every image when "
      + "it is installed; and stop.")
  boolean decodeFloor;

  @Option(names = "--dimensions", paramLabel = "<d>", split = ",", description = "With --peers: the vector "
      + "dimensions to measure (default 560,1024).")
  List<Integer> peerDimensions;

  private PrintWriter err;

  @Override
  public Integer call() throws Exception {
    OptionCheck check = OptionCheck.of(spec).between("--photos", photos == null ? 1 : photos, 1, 100_000);
    if (vectorSizes != null) {
      vectorSizes.forEach(n -> check.between("--vectors", n, 1, 100_000_000));
    }
    if (peerDimensions != null) {
      peerDimensions.forEach(d -> check.between("--dimensions", d, 2, 1024));
    }
    err = spec.commandLine().getErr();
    if (peersFolder != null) {
      for (int n : vectorSizes != null ? vectorSizes : List.of(100_000)) {
        for (int dimension : peerDimensions != null ? peerDimensions : List.of(DIMENSION, 1024)) {
          status("vector search for peers, " + n + " x " + dimension);
          VectorSearchBenchmark.Config config = new VectorSearchBenchmark.Config(n, dimension, Quantization.NONE,
              200, 10, SEED, PEER_SWEEP);
          Files.createDirectories(peersFolder);
          PeerVectors.export(peersFolder, config,
              VectorSearchBenchmark.run(config, peersFolder.resolve("index-" + n + "-" + dimension)));
        }
      }
      err.println("wrote " + peersFolder + "; now run: scripts/vector-peers " + peersFolder);
      return ExitCodes.OK;
    }
    if (decodeFloor) {
      return decodeFloorOnly();
    }
    if (storedPairSizes != null || pairCostFolder != null || rescanFiles != null || silhouetteCostFolder != null) {
      if (rescanFiles != null) {
        check.between("--rescan", rescanFiles, 1, 10_000_000);
      }
      if (storedPairSizes != null) {
        storedPairSizes.forEach(n -> check.between("--stored-pairs", n, 100, 10_000_000));
      }
      return storedPairsOnly();
    }
    int photoCount = photos != null ? photos : quick ? 60 : 300;
    List<Integer> sizes = vectorSizes != null ? vectorSizes : quick ? List.of(10_000, 100_000)
        : List.of(10_000, 100_000, 1_000_000);
    Path base = work != null ? work : Path.of(System.getProperty("java.io.tmpdir"), "morphscout-bench");
    Path cache = PhotoCache.ensure(base.resolve("photos-3000x2000-q90"), photoCount, err);
    Path scratch = Files.createTempDirectory(Files.createDirectories(base), "run-");
    Path photoDir = Files.createDirectories(scratch.resolve("photos"));
    for (int i = 0; i < photoCount; i++) { // links to the first photoCount cached photos: the folder to index
      Path cached = PhotoCache.file(cache, i);
      Files.createLink(photoDir.resolve(cached.getFileName()), cached);
    }
    String loadBefore = MachineInfo.currentLoadAverage();
    long start = System.nanoTime();
    Report r = new Report();
    try {
      header(r, quick);
      status("indexing " + photoCount + " photos");
      IndexingBenchmark.Result indexing = IndexingBenchmark.run(photoDir, scratch.resolve("indexing"));
      long photoBytes = 0;
      for (int i = 0; i < photoCount; i++) {
        photoBytes += Files.size(PhotoCache.file(cache, i));
      }
      r.indexing(indexing, photoBytes / photoCount);
      status("features");
      List<Path> files;
      try (Stream<Path> s = Files.list(photoDir)) {
        files = s.sorted().limit(quick ? 60 : 120).toList();
      }
      FeatureBenchmark.Result features = FeatureBenchmark.run(files, scratch.resolve("models"));
      r.features(features);
      List<VectorSearchBenchmark.Result> vectors = new ArrayList<>();
      for (int n : sizes) {
        for (Quantization q : Quantization.values()) {
          status("vector search, " + n + " vectors, " + q);
          vectors.add(VectorSearchBenchmark.run(new VectorSearchBenchmark.Config(n, DIMENSION, q,
              n >= 1_000_000 ? 100 : 200, 10, SEED, CANDIDATE_SWEEP), scratch.resolve("vectors-" + n + "-" + q)));
          Folders.deleteTree(scratch.resolve("vectors-" + n + "-" + q));
        }
      }
      r.vectors(vectors);
      status("pairs");
      r.pairs(PairBenchmark.run(features.analyses(), 100));
      features = null; // the analyses hold masks and images' statistics; free them for the heap figures below
      status("chains, 100,000-image graph");
      r.chains(ChainBenchmark.run(100_000, 24, quick ? 30 : 100, SEED));
      status("walk of 1,000 images");
      r.walk(WalkBenchmark.run(1000, quick ? 3 : 5, SEED));
      r.memory(indexing, vectors);
      r.volumes("the benchmark's own catalog (" + photoCount + " photos of 3000x2000)",
          CatalogVolumes.measure(scratch.resolve("indexing").resolve("catalog")));
      if (volumesCatalog != null) {
        r.volumes(volumesCatalog.toString(), CatalogVolumes.measure(volumesCatalog));
      }
      r.footer(loadBefore, MachineInfo.currentLoadAverage(), (System.nanoTime() - start) / 60e9);
    } finally {
      Folders.deleteTree(scratch);
    }
    return emit(r);
  }

  /** A catalog folder that holds no model (the learned model is looked up in the per-user folder only). */
  private static Path scratchCatalogFolder(Path base) {
    return base.resolve("no-catalog");
  }

  /** Indexing against decoding alone on 12-megapixel photos, at 1 to N threads: the decode-floor table alone. */
  private int decodeFloorOnly() throws Exception {
    int photoCount = photos != null ? photos : 30;
    Path base = work != null ? work : Path.of(System.getProperty("java.io.tmpdir"), "morphscout-bench");
    Path cache = PhotoCache.ensure(base.resolve("photos-4000x3000-q90"), photoCount, PhotoCache.LARGE_WIDTH,
        PhotoCache.LARGE_HEIGHT, err);
    Path scratch = Files.createTempDirectory(Files.createDirectories(base), "run-");
    Path photoDir = Files.createDirectories(scratch.resolve("photos"));
    long photoBytes = 0;
    for (int i = 0; i < photoCount; i++) {
      Path cached = PhotoCache.file(cache, i);
      Files.createLink(photoDir.resolve(cached.getFileName()), cached);
      photoBytes += Files.size(cached);
    }
    List<Integer> threads = new ArrayList<>();
    for (int t = 1; t <= Runtime.getRuntime().availableProcessors(); t++) {
      threads.add(t);
    }
    List<AnalysisSetup.SilhouetteMode> modes = new ArrayList<>(List.of(AnalysisSetup.SilhouetteMode.CLASSICAL));
    boolean learned = new SalientModelStore().find(ModelFolder.resolve(Optional.empty()), scratchCatalogFolder(base))
        .isPresent();
    if (learned) {
      modes.add(AnalysisSetup.SilhouetteMode.LEARNED);
    }
    String loadBefore = MachineInfo.currentLoadAverage();
    long start = System.nanoTime();
    Report r = new Report();
    try {
      header(r, false);
      status("indexing " + photoCount + " photos of 12 megapixels against decoding alone, 1 to "
          + threads.getLast() + " threads");
      r.decodeFloor(IndexingBenchmark.scaling(photoDir, scratch.resolve("indexing"), threads, modes),
          photoBytes / photoCount, learned);
      r.footer(loadBefore, MachineInfo.currentLoadAverage(), (System.nanoTime() - start) / 60e9);
    } finally {
      Folders.deleteTree(scratch);
    }
    return emit(r);
  }

  /** The stored-pairs benchmarks alone: query time and memory, and the indexing time they add. */
  private int storedPairsOnly() throws Exception {
    Path base = work != null ? work : Path.of(System.getProperty("java.io.tmpdir"), "morphscout-bench");
    Path scratch = Files.createTempDirectory(Files.createDirectories(base), "pairs-");
    String loadBefore = MachineInfo.currentLoadAverage();
    long start = System.nanoTime();
    Report r = new Report();
    try {
      header(r, false);
      if (storedPairSizes != null) {
        List<StoredPairsBenchmark.Result> results = new ArrayList<>();
        for (int n : storedPairSizes) {
          status("stored pairs, " + n + " images");
          results.add(StoredPairsBenchmark.run(scratch.resolve("stored-" + n), n, SEED, 5));
          Folders.deleteTree(scratch.resolve("stored-" + n));
        }
        r.storedPairs(results);
      }
      if (pairCostFolder != null) {
        status("indexing " + pairCostFolder + " with stored pairs");
        r.pairCost(pairCostFolder.toString(), PairStoreCost.run(pairCostFolder, scratch.resolve("cost"),
            AnalysisSetup.defaults().withSilhouettes(AnalysisSetup.SilhouetteMode.AUTO)
                .withModels(ModelFolder.resolve(java.util.Optional.empty()))));
      }
      if (silhouetteCostFolder != null) {
        status("indexing " + silhouetteCostFolder + " with classical silhouettes, then with the default choice");
        r.silhouetteCost(silhouetteCostFolder.toString(), SilhouetteCost.run(silhouetteCostFolder,
            scratch.resolve("silhouettes")));
      }
      if (rescanFiles != null) {
        status("re-scanning " + rescanFiles + " unchanged files, then adding 1,000");
        r.rescan(RescanBenchmark.run(scratch.resolve("rescan"), rescanFiles, 1000, SEED));
      }
      r.footer(loadBefore, MachineInfo.currentLoadAverage(), (System.nanoTime() - start) / 60e9);
    } finally {
      Folders.deleteTree(scratch);
    }
    return emit(r);
  }

  /** Prints the report, and writes it to --out when given. */
  private int emit(Report r) throws IOException {
    String text = r.toString();
    spec.commandLine().getOut().print(text);
    spec.commandLine().getOut().flush();
    if (out != null) {
      Files.writeString(out, text);
    }
    return ExitCodes.OK;
  }

  private void status(String what) {
    err.printf("bench: %s (load %s)%n", what, MachineInfo.currentLoadAverage());
    err.flush();
  }


  /** Renders demo-style product photos (3000x2000, or 4000x3000 for the decode floor) as quality-90 JPEGs. */
  static final class PhotoCache {
    static final int WIDTH = 3000;
    static final int HEIGHT = 2000;
    /** The decode floor's 12-megapixel photos. */
    static final int LARGE_WIDTH = 4000;
    static final int LARGE_HEIGHT = 3000;
    /** Distinct rendered scenes; larger photo sets reuse them as variants. */
    static final int SCENES = 60;
    /** Sensor-like noise, 8-bit levels (a clean base-ISO camera file shows about 1.5-3). */
    static final double NOISE_SD = 2.5;

    private PhotoCache() {}

    static Path ensure(Path dir, int count, PrintWriter err) throws Exception {
      return ensure(dir, count, WIDTH, HEIGHT, err);
    }

    static Path ensure(Path dir, int count, int width, int height, PrintWriter err) throws Exception {
      Files.createDirectories(dir);
      List<Integer> missing = new ArrayList<>();
      for (int i = 0; i < count; i++) {
        if (!Files.isRegularFile(file(dir, i))) {
          missing.add(i);
        }
      }
      if (missing.isEmpty()) {
        return dir;
      }
      err.printf("bench: rendering %d photos of %dx%d into %s (cached for later runs)%n", missing.size(), width,
          height, dir);
      err.flush();
      VesselRenderer renderer = new VesselRenderer();
      ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors(), r -> {
        Thread t = new Thread(r, "morphscout-bench-render");
        t.setDaemon(true);
        return t;
      });
      try {
        // Rendering a 3000x2000 scene costs seconds, so each scene is rendered once and saved in up to
        // VARIANTS_PER_SCENE variants (mirrored or not, its own sensor noise): distinct files, as in a real shoot.
        List<Future<?>> done = new ArrayList<>();
        for (int scene = 0; scene < Math.min(count, SCENES); scene++) {
          List<Integer> todo = new ArrayList<>();
          for (int i = scene; i < count; i += SCENES) {
            if (missing.contains(i)) {
              todo.add(i);
            }
          }
          if (todo.isEmpty()) {
            continue;
          }
          int sceneId = scene;
          done.add(pool.submit(() -> {
            BufferedImage image = renderer.render(shot(sceneId, width, height)).image();
            for (int i : todo) {
              Path tmp = dir.resolve("photo-" + i + ".tmp");
              Files.write(tmp, ImageCodec.jpeg(variant(image, i, (i / SCENES) % 2 == 1), 0.9f));
              Files.move(tmp, file(dir, i));
            }
            return null;
          }));
        }
        for (Future<?> f : done) {
          f.get();
        }
      } finally {
        pool.shutdownNow();
      }
      return dir;
    }

    /**
     * Photo {@code i} from its scene: Gaussian sensor-like noise (sd {@value #NOISE_SD} levels, independent per
     * channel), mirrored when asked. The noise makes the files as large and as costly to decode as camera JPEGs of
     * the same size (a noiseless rendering compresses several times better than any photo).
     */
    static BufferedImage variant(BufferedImage src, int i, boolean mirror) {
      int w = src.getWidth();
      int h = src.getHeight();
      BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
      SplittableRandom rnd = new SplittableRandom(SEED ^ (31L * i + 17));
      int[] row = new int[w];
      for (int y = 0; y < h; y++) {
        src.getRGB(0, y, w, 1, row, 0, w);
        for (int x = 0; x < w; x++) {
          int p = row[mirror ? w - 1 - x : x];
          int r = noisy((p >> 16) & 0xFF, rnd);
          int g = noisy((p >> 8) & 0xFF, rnd);
          int b = noisy(p & 0xFF, rnd);
          row[x] = (r << 16) | (g << 8) | b;
        }
        out.setRGB(0, y, w, 1, row, 0, w);
      }
      return out;
    }

    private static int noisy(int v, SplittableRandom rnd) {
      // Sum of three uniforms approximates a Gaussian cheaply (variance 3/12 per unit range -> scale to the sd).
      double n = (rnd.nextDouble() + rnd.nextDouble() + rnd.nextDouble() - 1.5) * 2 * NOISE_SD;
      return Math.max(0, Math.min(255, (int) Math.round(v + n)));
    }

    static Path file(Path dir, int i) {
      return dir.resolve(String.format(Locale.ROOT, "photo-%04d.jpg", i));
    }

    /** Photo {@code i}: a random vessel, glaze, backdrop and light, like the demo library's product shots. */
    static Shot shot(int i, int width, int height) {
      SplittableRandom rnd = new SplittableRandom(SEED + 7919L * i);
      Archetype[] all = Archetype.values();
      BackdropKind[] kinds = {BackdropKind.STUDIO_SWEEP, BackdropKind.GRADIENT, BackdropKind.LINEN,
          BackdropKind.WOOD_TABLE};
      int a = 0xD0D0D0 + rnd.nextInt(0x202020);
      Backdrop backdrop = new Backdrop(kinds[rnd.nextInt(kinds.length)], a, a - 0x181818, 0.55 + 0.1
          * rnd.nextDouble(), rnd.nextLong());
      double side = rnd.nextBoolean() ? -1 : 1;
      Lighting light = new Lighting(side * (25 + 35 * rnd.nextDouble()), 20 + 30 * rnd.nextDouble(),
          0.85 + 0.3 * rnd.nextDouble(), 0.22 + 0.16 * rnd.nextDouble(), -0.4 + 0.9 * rnd.nextDouble(), 1.0);
      double tilt = 0.10 + 0.12 * rnd.nextDouble();
      Placement p = Placement.fitted(all[rnd.nextInt(all.length)].profile().varied(rnd.nextLong(), 0.08),
          Glazes.pick(rnd), width, height, 0.55 + 0.25 * rnd.nextDouble(), tilt, 0.15 * (rnd.nextDouble() - 0.5));
      return new Shot(width, height, backdrop, light, tilt, List.of(p));
    }
  }

  /** The Markdown report. */
  static final class Report {
    private final StringBuilder md = new StringBuilder();

    void header(MachineInfo m, String command, boolean quick) {
      line("# Morphscout benchmarks");
      line("");
      line("Run " + ZonedDateTime.now(ZoneOffset.UTC).format(DateTimeFormatter.ISO_OFFSET_DATE_TIME) + " with `"
          + command + "`" + (quick ? " (quick sizes)" : "") + ".");
      line("");
      line("| machine | |");
      line("|---|---|");
      line("| CPU | " + m.cpuModel() + " |");
      line("| cores (available to the JVM) | " + m.cores() + " |");
      line("| JDK | " + m.jdk() + " |");
      line("| max heap | " + Text.bytes(m.maxHeapBytes()) + " |");
      line("| jdk.incubator.vector | " + (m.vectorModule() ? "on" : "off") + " |");
      line("| OS | " + m.os() + " |");
      line("| load average at start (1/5/15 min) | " + m.loadAverage() + " |");
      line("");
    }

    void indexing(IndexingBenchmark.Result r, long meanFileBytes) {
      line("## Indexing");
      line("");
      line(photosLine(r.images()) + " Mean file size " + Text.bytes(meanFileBytes) + ".");
      line("");
      line("| threads | decode-only (floor) | full indexing | ratio (wall) | CPU s per image: decode-only / "
          + "indexing | ratio (CPU) | target >= 0.8x | peak heap |");
      line("|---|---|---|---|---|---|---|---|");
      line("| " + r.threads() + " | " + f(r.decodeOnlyPerSecond(), 2) + " images/s | " + f(r.indexPerSecond(), 2)
          + " images/s | " + f(r.ratio(), 2) + "x | " + f(r.decodeCpuSecondsPerImage(), 3) + " / "
          + f(r.indexCpuSecondsPerImage(), 3) + " | " + f(r.cpuRatio(), 2) + "x | " + met(r.ratio() >= 0.8)
          + " | " + Text.bytes(r.peakHeapBytes()) + " |");
      if (r.failures() > 0) {
        line("");
        line("**" + r.failures() + " photos failed to index.**");
      }
      line("");
    }

    void decodeFloor(List<IndexingBenchmark.Result> rs, long meanFileBytes, boolean learnedInstalled) {
      line("## Indexing against the decode floor, 1 to N threads");
      line("");
      line(rs.getFirst().images() + " generated product photos, " + PhotoCache.LARGE_WIDTH + "x"
          + PhotoCache.LARGE_HEIGHT + " JPEG quality 90 (12 megapixels; vessel, glaze texture, backdrop, light, "
          + "sensor-like noise of sd 2.5 levels), mean file size " + Text.bytes(meanFileBytes) + ". Decode-only = the "
          + "indexer's decoder (the fast JPEG path) and options on the same threads, nothing else. Full indexing = "
          + "scan, SHA-256, decode, silhouette, shape, colour, descriptor, thumbnail, catalog, vector index, "
          + "neighbour graph, stored pairs. Throughput is wall-clock; CPU is the whole process's CPU time.");
      line("");
      line("| silhouettes | threads | decode-only | full indexing | ratio (wall) | CPU s per image: decode-only / "
          + "indexing | ratio (CPU) | target >= 0.8x | peak heap |");
      line("|---|---|---|---|---|---|---|---|---|");
      for (IndexingBenchmark.Result r : rs) {
        line("| " + r.silhouettes().name().toLowerCase(Locale.ROOT) + " | " + r.threads() + " | "
            + f(r.decodeOnlyPerSecond(), 2) + " images/s | " + f(r.indexPerSecond(), 2) + " images/s | "
            + f(r.ratio(), 2) + "x | " + f(r.decodeCpuSecondsPerImage(), 3) + " / " + f(r.indexCpuSecondsPerImage(), 3)
            + " | " + f(r.cpuRatio(), 2) + "x | "
            + (r.silhouettes() == AnalysisSetup.SilhouetteMode.CLASSICAL ? met(r.ratio() >= 0.8) : "(stated)")
            + " | " + Text.bytes(r.peakHeapBytes()) + " |");
      }
      if (!learnedInstalled) {
        line("");
        line("The learned silhouette model is not installed (morphscout models add-salient), so only the classical "
            + "extractor was measured.");
      }
      if (rs.stream().anyMatch(r -> r.failures() > 0)) {
        line("");
        line("**Some photos failed to index.**");
      }
      line("");
    }

    private static String photosLine(int n) {
      return n + " generated product photos, 3000x2000 JPEG quality 90 (vessel, glaze texture, backdrop, light, "
          + "sensor-like noise of sd 2.5 levels; 60 rendered scenes, further photos are mirrored/re-noised variants). "
          + "Full indexing = scan, SHA-256, decode, silhouette, shape, colour, ONNX descriptor, thumbnail, catalog, "
          + "vector index, neighbour graph. Decode-only = the same decoder and options on the same threads.";
    }

    void features(FeatureBenchmark.Result r) {
      line("## Features (CPU ms per image, one thread, " + r.images() + " photos)");
      line("");
      line("| decode to analysis size | silhouette | shape descriptors | colour statistics | ONNX descriptor "
          + "(batches of 16) |");
      line("|---|---|---|---|---|");
      line("| " + f(r.decodeMs(), 1) + " | " + f(r.silhouetteMs(), 1) + " | " + f(r.shapeMs(), 1) + " | "
          + f(r.colourMs(), 1) + " | " + f(r.descriptorMs(), 1) + " |");
      line("");
    }

    void vectors(List<VectorSearchBenchmark.Result> rs) {
      line("## Vector search (k = 10, " + DIMENSION + "-d synthetic embedding-like vectors)");
      line("");
      int defaultCandidates = LuceneIndexOptions.defaults().candidates(10);
      line("LuceneVectorIndex.search (HNSW M 16, beam 100, " + defaultCandidates + " candidates at the default options, "
          + "rescored exactly) against an exact scan (SIMD dot products over all vectors, one thread). Heap = index "
          + "open read-only after warm-up.");
      line("");
      line("| vectors | HNSW vectors | build | kNN p50 | kNN p99 | kNN CPU p50 | recall@10 | scan p50 | speed-up | "
          + "index heap | index on disk |");
      line("|---|---|---|---|---|---|---|---|---|---|---|");
      for (VectorSearchBenchmark.Result r : rs) {
        line("| " + r.config().size() + " | " + kind(r) + " | " + f(r.buildSeconds(), 1) + " s | "
            + f(r.knn().p50Ms(), 2) + " ms | " + f(r.knn().p99Ms(), 2)
            + " ms | " + f(r.knnCpu().p50Ms(), 2) + " ms | " + f(r.recall(), 3) + " | " + f(r.scan().p50Ms(), 2)
            + " ms | " + f(r.speedUp(), 1) + "x | "
            + heap(r.heapBytes()) + " | " + Text.bytes(r.diskBytes()) + " |");
      }
      line("");
      line("### Candidates per query (same indexes; the recall and speed knob that needs no rebuild)");
      line("");
      line("| vectors | HNSW vectors | candidates | kNN p50 | kNN p99 | kNN CPU p50 | recall@10 | speed-up |");
      line("|---|---|---|---|---|---|---|---|");
      for (VectorSearchBenchmark.Result r : rs) {
        for (VectorSearchBenchmark.Probe p : r.probes().stream()
            .sorted(Comparator.comparingInt(VectorSearchBenchmark.Probe::candidates)).toList()) {
          line("| " + r.config().size() + " | " + kind(r) + " | " + p.candidates()
              + (p == r.atDefault() ? " (default)" : "") + " | " + f(p.knn().p50Ms(), 2) + " ms | "
              + f(p.knn().p99Ms(), 2) + " ms | " + f(p.knnCpu().p50Ms(), 2) + " ms | " + f(p.recall(), 3) + " | "
              + f(r.speedUp(p), 1) + "x |");
        }
      }
      line("");
      for (VectorSearchBenchmark.Result r : rs) {
        if (r.config().size() == 100_000) {
          line("- Target at 100k (" + kind(r) + ", default " + r.atDefault().candidates() + " candidates): p50 <= 2 ms "
              + met(r.knn().p50Ms() <= 2) + " (CPU p50 " + f(r.knnCpu().p50Ms(), 2) + " ms)"
              + ", recall@10 >= 0.97 " + met(r.recall() >= 0.97) + ", >= 20x the scan " + met(r.speedUp() >= 20)
              + ". All three met at: " + allMet(r) + ".");
        }
      }
      line("");
    }

    private static String kind(VectorSearchBenchmark.Result r) {
      return r.config().quantization() == Quantization.INT8 ? "int8" : "float";
    }

    /** The candidate counts at which the 100k targets (p50 <= 2 ms, recall >= 0.97, >= 20x the scan) all hold. */
    private static String allMet(VectorSearchBenchmark.Result r) {
      List<String> ok = r.probes().stream()
          .filter(p -> p.knn().p50Ms() <= 2 && p.recall() >= 0.97 && r.speedUp(p) >= 20)
          .map(p -> String.valueOf(p.candidates())).sorted(Comparator.comparingInt(Integer::parseInt)).toList();
      return ok.isEmpty() ? "none of the measured candidate counts" : String.join(", ", ok) + " candidates";
    }

    void pairs(PairBenchmark.Result r) {
      line("## Pairs");
      line("");
      line("| exact pair score (with warp), one thread: p50 | p99 | CPU p50 | discovery measured | projected at "
          + "10,000 images |");
      line("|---|---|---|---|---|");
      line("| " + f(r.pairMs().p50Ms(), 1) + " ms (mean " + f(r.pairMs().meanMs(), 1) + ") | "
          + f(r.pairMs().p99Ms(), 1) + " ms | " + f(r.pairCpuMs().p50Ms(), 1) + " ms | " + r.discoveryImages()
          + " images, " + r.pairsScored()
          + " candidate pairs, " + f(r.discoverySeconds(), 1) + " s on " + r.threads() + " threads | "
          + f(r.projectedSeconds(10_000) / 60, 1) + " min (linear: fixed candidates per image) |");
      line("");
    }

    void chains(ChainBenchmark.Result r) {
      line("## Chains");
      line("");
      line("| graph | build | chain query p50 | p99 | CPU p50 | found | target |");
      line("|---|---|---|---|---|---|---|");
      line("| " + r.nodes() + " images, " + r.edges() + " steps (24 nearest each, 2-d layout) | "
          + f(r.buildSeconds(), 1) + " s | " + f(r.query().p50Ms(), 1) + " ms | " + f(r.query().p99Ms(), 1)
          + " ms | " + f(r.queryCpu().p50Ms(), 1) + " ms | " + r.found() + "/" + r.query().count()
          + " | p50 <= 100 ms: " + met(r.query().p50Ms() <= 100)
          + " |");
      line("");
    }

    void walk(WalkBenchmark.Result r) {
      line("## Walk");
      line("");
      line("Walk of " + r.items() + " images (nearest-neighbour starts + 2-opt + Or-opt): p50 "
          + f(r.plan().p50Ms(), 0) + " ms (CPU " + f(r.planCpu().p50Ms(), 0) + " ms), worst "
          + f(r.plan().p99Ms(), 0) + " ms over " + r.plan().count() + " runs.");
      line("");
    }

    void memory(IndexingBenchmark.Result indexing, List<VectorSearchBenchmark.Result> vectors) {
      line("## Memory");
      line("");
      line("- Peak heap while indexing " + indexing.images() + " photos on " + indexing.threads() + " threads: "
          + Text.bytes(indexing.peakHeapBytes()) + " (sum of heap pools' peaks; bounded by threads x batch, not "
          + "by library size).");
      for (VectorSearchBenchmark.Result r : vectors) {
        if (r.config().quantization() == Quantization.INT8) {
          long perMillion = r.heapBytes() * (1_000_000L / r.config().size());
          line("- int8 index of " + r.config().size() + " vectors: " + heap(r.heapBytes()) + " heap"
              + (r.config().size() < 1_000_000 ? " (linear projection to 1M: " + heap(perMillion) + ")" : "")
              + "; target 1M within 2 GB: " + met(perMillion <= 2L << 30)
              + (r.config().size() < 1_000_000 ? " (projected)" : "") + ". Vectors and graph are memory-mapped "
              + "files (page cache, off the heap): " + Text.bytes(r.diskBytes()) + " on disk.");
        }
      }
      line("- Browser library view at 100,000 images: measured by the browser's own benchmark, which needs the "
          + "headless JavaFX toolkit of the test tools (see \"Browser memory\" in docs/BENCHMARKS.md).");
      line("- Heap in use now: " + Text.bytes(HeapMeter.usedAfterGc()) + ".");
      line("");
    }

    void volumes(String what, CatalogVolumes v) {
      line("## Catalog data volumes: " + what);
      line("");
      line("| per image | bytes |");
      line("|---|---|");
      line("| appearance vector | " + f(v.appearanceBytes(), 0) + " |");
      line("| shape vector | " + f(v.shapeBytes(), 0) + " |");
      line("| packed silhouette mask (mean " + f(v.maskPixels(), 0) + " px) | " + f(v.maskBytes(), 0) + " |");
      line("| shape descriptors (JSON) | " + f(v.descriptorBytes(), 0) + " |");
      line("| colour statistics (JSON) | " + f(v.colourBytes(), 0) + " |");
      line("| neighbour rows | " + f(v.neighbourRowsPerImage(), 1) + " rows |");
      line("| catalog.db total | " + f(v.databaseBytesPerImage(), 0) + " |");
      line("| thumbnails | " + f(v.thumbnailBytesPerImage(), 0) + " |");
      line("| vector index | " + f(v.vectorIndexBytesPerImage(), 0) + " |");
      line("");
      line(v.images() + " images measured.");
      line("");
    }

    void storedPairs(List<StoredPairsBenchmark.Result> results) {
      line("## Pair queries on stored pairs");
      line("");
      line("Synthetic catalogs: each image stores 20 to 30 candidate pairs of seeded random measures (one in ten stored "
          + "without a warp); the query is `pairs --count 30` (whole library), then the same under changed weights "
          + "(`--set`). Five runs each, the first cold. Goal: under 2 s at 10,000 and at 100,000 images, memory that "
          + "does not grow with the stored pairs.");
      line("");
      line("| images | stored pairs | catalog size | top 30: p50 / max | re-ranked: p50 / max | peak heap of the "
          + "queries | goal |");
      line("|---|---|---|---|---|---|---|");
      for (StoredPairsBenchmark.Result x : results) {
        line("| " + x.images() + " | " + x.pairs() + " | " + Text.bytes(x.databaseBytes()) + " | "
            + f(x.queryMs().p50Ms() / 1000, 2) + " s / " + f(x.queryMs().p99Ms() / 1000, 2) + " s | "
            + f(x.rerankMs().p50Ms() / 1000, 2) + " s / " + f(x.rerankMs().p99Ms() / 1000, 2) + " s | "
            + heap(x.heapBytes()) + " | " + met(x.queryMs().p99Ms() < 2000 && x.rerankMs().p99Ms() < 2000) + " |");
      }
      line("");
    }

    void pairCost(String folder, PairStoreCost.Result x) {
      line("## What storing pairs adds to indexing");
      line("");
      line("`" + folder + "`: " + x.images() + " images indexed on " + x.threads() + " threads; "
          + x.pairs() + " stored pairs, " + x.bounded() + " of them stored without a warp.");
      line("");
      line("| | whole run | stored pairs | of which measuring | added to indexing without them | goal (under 25%) |");
      line("|---|---|---|---|---|---|");
      line("| wall | " + f(x.totalSeconds(), 1) + " s | " + f(x.pairSeconds(), 1) + " s | | " + f(100 * x.added(), 0)
          + "% | " + met(x.added() < 0.25) + " |");
      line("| CPU | " + f(x.totalCpuSeconds(), 1) + " s | " + f(x.pairCpuSeconds(), 1) + " s | "
          + f(x.measureCpuSeconds(), 1) + " s | **" + f(100 * x.addedCpu(), 0) + "%** | " + met(x.addedCpu() < 0.25)
          + " |");
      line("");
    }

    void silhouetteCost(String folder, SilhouetteCost.Result x) {
      line("## Silhouettes: classical only against the per-image choice");
      line("");
      line("`" + folder + "`, indexed twice into new catalogs, one run after the other, all cores:");
      line("");
      line("| silhouettes | wall | CPU | masks |");
      line("|---|---|---|---|");
      for (SilhouetteCost.Run run : List.of(x.classical(), x.auto())) {
        line("| " + run.mode().name().toLowerCase(java.util.Locale.ROOT) + " | " + f(run.seconds(), 1) + " s | "
            + f(run.cpuSeconds(), 1) + " s | " + run.masks().bySource() + "; " + run.masks().uncertain()
            + " uncertain |");
      }
      line("| ratio | " + f(x.wallRatio(), 2) + "x | " + f(x.cpuRatio(), 2) + "x | goal <= 1.5x: "
          + met(x.cpuRatio() <= 1.5) + " |");
      line("");
    }

    void rescan(RescanBenchmark.Result x) {
      line("## Indexing a large library that barely changed");
      line("");
      line("| files | re-scan, all unchanged | files/s | then 1,000 pictures added (160x120 px) | files/s | goal "
          + "(re-scan of 100,000 under 60 s) |");
      line("|---|---|---|---|---|---|");
      line("| " + x.files() + " | " + f(x.rescanSeconds(), 1) + " s (" + x.unchanged() + " unchanged) | "
          + f(x.files() / x.rescanSeconds(), 0) + " | " + f(x.addSeconds(), 1) + " s (" + x.indexed()
          + " analysed, stored pairs included) | " + f(x.added() / x.addSeconds(), 1) + " | "
          + met(x.rescanSeconds() * 100_000 / x.files() < 60) + " |");
      line("");
      line("Indexing threads: " + x.threads() + ".");
      line("");
    }

    void footer(String loadBefore, String loadAfter, double minutes) {
      line("Load average (1/5/15 min) before " + loadBefore + ", after " + loadAfter + "; run took "
          + f(minutes, 1) + " min.");
    }

    private void line(String s) {
      md.append(s).append('\n');
    }

    private static String f(double v, int decimals) {
      return Text.num(v, decimals);
    }

    /** Heap differences below a MiB are within the noise of a used-heap-after-GC measurement. */
    private static String heap(long bytes) {
      return bytes < (1 << 20) ? "< 1 MiB" : Text.bytes(bytes);
    }

    private static String met(boolean ok) {
      return ok ? "met" : "**missed**";
    }

    @Override
    public String toString() {
      return md.toString();
    }
  }

  /** The report's header: the machine and the command line as typed. */
  private void header(Report r, boolean quick) {
    String args = String.join(" ", spec.commandLine().getParseResult().originalArgs());
    r.header(MachineInfo.current(), "./morphscout " + (args.startsWith("bench") ? args : "bench " + args), quick);
  }
}
