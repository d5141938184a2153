package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import javafx.scene.image.ImageView;
import javafx.stage.Stage;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.ImageFlag;
import org.morphscout.app.gui.task.FxTaskRunner;
import org.morphscout.indexer.bench.HeapMeter;
import org.morphscout.indexer.bench.MachineInfo;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.catalog.ImageStatus;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Heap of the browser's library view on large catalogs (run with
 * {@code mvn -o -B -P benchmarks -Dgroups=benchmark -pl app test -Dtest=LibraryViewMemoryBenchmark}). For each size
 * (default 10,000 and 100,000 images; system property {@code morphscout.bench.browserSizes}) it writes a real
 * catalog ({@link LargeCatalog}), shows the real window ({@link MainView} with the app's own backends, task runner
 * and thumbnail cache settings) on the headless Monocle platform, opens the catalog through
 * {@link MainViewModel#open}, waits until the grid shows every image and its first thumbnails, jumps to the middle
 * and the end, then scrolls through the whole grid in screenful jumps until more thumbnails were shown than the
 * cache keeps. Used heap after GC is taken before opening, when loaded, after the jumps and after the long scroll;
 * the peak is the sum of the heap pools' peaks since just before opening (an upper bound). The per-image slope is
 * the difference of the loaded heaps over the difference of the sizes.
 *
 * <p>Prints a Markdown section and writes it to {@code morphscout.bench.out} (default
 * {@code target/browser-memory.md}). Asserts only facts that can fail: every image is listed, the flags read from
 * the catalog match what was written, tile nodes stay a screenful, and the thumbnail cache stays within its capacity.
 * Nothing is timed against a limit.
 */
@Tag("benchmark")
class LibraryViewMemoryBenchmark {
  static {
    HeadlessFx.configure();
  }

  private static final long SEED = 20261202L;
  /** The headless screen (HeadlessFx: 1600 x 1000): a maximised window, the most tiles a screen shows. */
  private static final double WIDTH = 1600;
  private static final double HEIGHT = 1000;
  /** Screenful jumps of the long scroll, spread evenly over the grid. */
  private static final int SCROLL_STOPS = 80;
  private static final long WAIT_S = 120;
  /** How it is run (printed in the report). */
  static final String COMMAND = "nice -n 19 mvn -o -B -q -P benchmarks -Dgroups=benchmark -pl app -am test "
      + "-Dtest=LibraryViewMemoryBenchmark -Dsurefire.failIfNoSpecifiedTests=false";

  /** The figures of one size. Heaps in bytes. */
  record Run(LargeCatalog.Built catalog, long before, long loaded, long afterJumps, long afterScroll, long peak,
      long sampledPeak, long loadMs, int tiles, int maxTiles, int columns, int jumpShown, int thumbnailsShown, int thumbnailsCached,
      long scrollMs, long afterClose) {
    Run closed(long heap) {
      return new Run(catalog, before, loaded, afterJumps, afterScroll, peak, sampledPeak, loadMs, tiles, maxTiles, columns,
          jumpShown, thumbnailsShown, thumbnailsCached, scrollMs, heap);
    }
  }

  @BeforeAll
  static void toolkit() throws Exception {
    FxToolkit.registerPrimaryStage();
  }

  @Test
  void libraryViewHeapAtTenAndHundredThousandImages(@TempDir Path dir) throws Exception {
    List<Integer> sizes = Arrays.stream(System.getProperty("morphscout.bench.browserSizes", "10000,100000")
        .split(",")).map(String::trim).map(Integer::parseInt).toList();
    List<Run> runs = new ArrayList<>();
    for (int n : sizes) {
      LargeCatalog.Built built = LargeCatalog.create(dir.resolve("c" + n), n, SEED + n);
      Run run = measure(built);
      settle();
      runs.add(run.closed(HeapMeter.usedAfterGc()));
    }
    String report = report(runs);
    System.out.println(report);
    Path out = Path.of(System.getProperty("morphscout.bench.out", "target/browser-memory.md"));
    if (out.toAbsolutePath().getParent() != null) {
      Files.createDirectories(out.toAbsolutePath().getParent());
    }
    Files.writeString(out, report);
  }

  /** What the window holds during one run. */
  private record Window(MainViewModel vm, ThumbnailCache thumbs, FxTaskRunner runner, Stage stage,
      ListView<List<ImageRow>> grid) {}

  private Run measure(LargeCatalog.Built built) throws Exception {
    int n = built.images();
    FxTaskRunner runner = new FxTaskRunner(2);
    Window w = WaitForAsyncUtils.asyncFx(() -> {
      MainViewModel vm = new MainViewModel(runner, MorphscoutApp.BACKENDS);
      ThumbnailCache thumbs = new ThumbnailCache(id -> vm.session().thumbnail(id), MorphscoutApp.THUMB_SIZE,
          MorphscoutApp.THUMB_CAPACITY);
      MainView view = new MainView(vm, thumbs);
      Stage stage = new Stage();
      stage.setScene(view.scene(WIDTH, HEIGHT));
      stage.show();
      @SuppressWarnings("unchecked")
      ListView<List<ImageRow>> grid = (ListView<List<ImageRow>>) stage.getScene().lookup("#library-grid");
      return new Window(vm, thumbs, runner, stage, grid);
    }).get();
    try {
      settle();
      long before = HeapMeter.usedAfterGc();
      HeapMeter.resetPeak();
      HeapSampler sampler = new HeapSampler();

      long t0 = System.nanoTime();
      WaitForAsyncUtils.asyncFx(() -> w.vm().open(built.dir(), false));
      waitUntil(() -> w.vm().library().visible().size() == n && !w.vm().library().busyProperty().get()
          && w.grid().getItems().size() > 0);
      Set<Long> shown = new HashSet<>();
      waitForThumbnails(w, shown);
      long loadMs = (System.nanoTime() - t0) / 1_000_000;
      assertThat(w.vm().library().visible()).as("rows listed").hasSize(n);
      int tiles = onFx(() -> w.grid().lookupAll(".tile").size());
      long loaded = HeapMeter.usedAfterGc();

      int gridRows = onFx(() -> w.grid().getItems().size());
      int columns = onFx(() -> w.grid().getItems().get(0).size());
      scrollTo(w, gridRows / 2, shown);
      scrollTo(w, gridRows - 1, shown);
      long afterJumps = HeapMeter.usedAfterGc();
      int jumpShown = shown.size();

      long t1 = System.nanoTime();
      int maxTiles = tiles;
      for (int k = 0; k <= SCROLL_STOPS; k++) {
        scrollTo(w, (int) ((long) k * (gridRows - 1) / SCROLL_STOPS), shown);
        maxTiles = Math.max(maxTiles, onFx(() -> w.grid().lookupAll(".tile").size()));
      }
      long scrollMs = (System.nanoTime() - t1) / 1_000_000;
      long afterScroll = HeapMeter.usedAfterGc();
      long peak = HeapMeter.peakSinceReset();
      long sampledPeak = sampler.stop();
      int cached = (int) shown.stream().filter(id -> w.thumbs().cached(id).isPresent()).count();

      // a virtualised grid makes tiles for the rows on screen only (a 1600 x 1000 window shows ~10 x 6)
      assertThat(maxTiles).as("tile nodes with %d images", n).isBetween(1, 400);
      // the cache is an LRU of MorphscoutApp.THUMB_CAPACITY: the long scroll must overflow it and it must not grow
      assertThat(shown.size()).as("thumbnails shown by the long scroll").isGreaterThan(MorphscoutApp.THUMB_CAPACITY);
      assertThat(cached).as("thumbnails still cached").isBetween(1, MorphscoutApp.THUMB_CAPACITY);
      // the flags come from the catalog (CatalogFlags.load): as many failed images as LargeCatalog wrote
      WaitForAsyncUtils.asyncFx(() -> w.vm().library().flagProperty(ImageFlag.FAILED).set(true)).get();
      assertThat(onFx(() -> w.vm().library().visible().size())).as("failed images listed")
          .isEqualTo(built.failed());
      return new Run(built, before, loaded, afterJumps, afterScroll, peak, sampledPeak, loadMs, tiles, maxTiles, columns,
          jumpShown, shown.size(), cached, scrollMs, -1);
    } finally {
      WaitForAsyncUtils.asyncFx(() -> {
        w.stage().close();
        w.vm().close();
      }).get();
      runner.close();
      w.thumbs().close();
      WaitForAsyncUtils.waitForFxEvents();
    }
  }

  /**
   * The highest used heap seen every {@value #PERIOD_MS} ms on a daemon thread: the occupancy at its worst, garbage
   * included. A lower bound of the true peak (a spike between samples is missed), where the pools' summed peaks are
   * an upper bound (the pools peak at different moments).
   */
  private static final class HeapSampler {
    static final long PERIOD_MS = 5;
    private final AtomicLong max = new AtomicLong();
    private final ScheduledExecutorService timer =
        Executors.newSingleThreadScheduledExecutor(FxTaskRunner.namedDaemons("bench-heap-sampler-"));

    HeapSampler() {
      MemoryMXBean memory = ManagementFactory.getMemoryMXBean();
      timer.scheduleAtFixedRate(() -> max.accumulateAndGet(memory.getHeapMemoryUsage().getUsed(), Math::max), 0,
          PERIOD_MS, TimeUnit.MILLISECONDS);
    }

    long stop() {
      timer.shutdownNow();
      return max.get();
    }
  }

  /**
   * Lets the toolkit run a few pulses before a heap reading, so that a window just shown has been laid out and
   * painted, and one just closed has been disposed.
   */
  private static void settle() throws InterruptedException {
    for (int i = 0; i < 5; i++) {
      WaitForAsyncUtils.waitForFxEvents();
      Thread.sleep(100);
    }
  }

  private static void scrollTo(Window w, int gridRow, Set<Long> shown) throws Exception {
    WaitForAsyncUtils.asyncFx(() -> w.grid().scrollTo(gridRow)).get();
    WaitForAsyncUtils.waitForFxEvents();
    waitForThumbnails(w, shown);
  }

  /**
   * Waits until every tile on screen shows its thumbnail (images without one, pending or failed, excepted), and
   * records the ids on screen.
   */
  private static void waitForThumbnails(Window w, Set<Long> shown) throws Exception {
    waitUntil(() -> {
      boolean all = true;
      for (Node n : w.grid().lookupAll(".tile")) {
        Tile t = (Tile) n;
        long id = t.shownId();
        if (id < 0 || !onScreen(t, w.grid())) {
          continue;
        }
        ImageStatus status = w.vm().session().row(id).map(ImageRow::status).orElse(ImageStatus.PENDING);
        if (status != ImageStatus.READY && status != ImageStatus.MISSING) {
          continue; // LargeCatalog writes thumbnails for analysed images only
        }
        ImageView view = (ImageView) t.lookup(".image-view");
        if (view.getImage() == null) {
          all = false;
        } else {
          shown.add(id);
        }
      }
      return all;
    });
  }

  /** Whether a tile is shown: visible itself and in every parent up to the grid (pooled cells are hidden). */
  private static boolean onScreen(Node tile, Node grid) {
    for (Node p = tile; p != null && p != grid; p = p.getParent()) {
      if (!p.isVisible()) {
        return false;
      }
    }
    return true;
  }

  private static void waitUntil(BooleanSupplier condition) throws Exception {
    WaitForAsyncUtils.waitFor(WAIT_S, TimeUnit.SECONDS, () -> onFx(condition::getAsBoolean));
  }

  private static <T> T onFx(java.util.concurrent.Callable<T> work) throws Exception {
    return WaitForAsyncUtils.asyncFx(work).get();
  }

  static String report(List<Run> runs) {
    MachineInfo m = MachineInfo.current();
    StringBuilder s = new StringBuilder();
    s.append("### Browser: library view heap\n\n");
    s.append("Run ").append(Instant.now()).append(" by `LibraryViewMemoryBenchmark` (app tests, tag `benchmark`): `")
        .append(COMMAND).append("`");
    String opts = System.getenv("_JAVA_OPTIONS");
    if (opts != null && !opts.isBlank()) {
      s.append(", with `_JAVA_OPTIONS=").append(opts.trim()).append('`');
    }
    s.append(".\n\n");
    s.append("| machine | |\n|---|---|\n");
    s.append("| cores | ").append(m.cores()).append(" |\n");
    s.append("| JDK | ").append(m.jdk()).append(" |\n");
    s.append("| max heap | ").append(mib(m.maxHeapBytes())).append(" |\n");
    s.append("| CPU | ").append(m.cpuModel()).append(" |\n");
    s.append("| load average now | ").append(MachineInfo.currentLoadAverage()).append(" |\n");
    s.append(String.format(Locale.ROOT, "| window | %.0f x %.0f, headless Monocle, software rendering |%n", WIDTH,
        HEIGHT));
    s.append(String.format(Locale.ROOT, "| thumbnail cache | %,d decoded at %.0f px (MorphscoutApp) |%n%n",
        MorphscoutApp.THUMB_CAPACITY, MorphscoutApp.THUMB_SIZE));
    // One baseline for every run: the heap with the empty window, in the first run (a fresh JVM). Observed: after a
    // window is closed, about its cache's worth of heap stays reachable until the next window draws thumbnails;
    // consistent with the software renderer holding drawn images' textures (Java arrays) until its texture pool is
    // next pruned. So a later run's own reading is not a clean baseline; it is printed in brackets.
    long base = runs.isEmpty() ? 0 : runs.get(0).before();
    s.append("| images | catalog.db | open to grid filled | empty window (own reading) | loaded (+ baseline) "
        + "| after jumps (+) | after long scroll (+) | peak since open: sampled / pools' sum | after closing | thumbnails shown / cached "
        + "| tile nodes (max) |\n");
    s.append("|---|---|---|---|---|---|---|---|---|---|---|\n");
    for (Run r : runs) {
      s.append(String.format(Locale.ROOT, "| %,d | %s | %,d ms | %s (%s) | %s (+%s) | %s (+%s) | %s (+%s) | %s / %s | %s "
          + "| %,d / %,d | %d (%d) |%n", r.catalog().images(), mib(r.catalog().databaseBytes()), r.loadMs(),
          mib(base), mib(r.before()), mib(r.loaded()), mib(r.loaded() - base), mib(r.afterJumps()),
          mib(r.afterJumps() - base), mib(r.afterScroll()), mib(r.afterScroll() - base), mib(r.sampledPeak()), mib(r.peak()),
          mib(r.afterClose()), r.thumbnailsShown(), r.thumbnailsCached(), r.tiles(), r.maxTiles()));
    }
    s.append('\n');
    if (runs.size() >= 2) {
      Run a = runs.get(0);
      Run b = runs.get(runs.size() - 1);
      double images = b.catalog().images() - a.catalog().images();
      double loadedSlope = (b.loaded() - a.loaded()) / images;
      double scrolledSlope = (b.afterScroll() - a.afterScroll()) / images;
      s.append(String.format(Locale.ROOT, "- Heap per image (slope between %,d and %,d images): %.0f bytes "
          + "loaded, %.0f bytes after the long scroll; projected to 1,000,000 images: %s of rows.%n",
          a.catalog().images(), b.catalog().images(), loadedSlope, scrolledSlope,
          mib((long) (loadedSlope * 1_000_000))));
      s.append(String.format(Locale.ROOT, "- Fixed part (loaded heap minus slope x images, at %,d): %s; the full "
          + "thumbnail cache adds about %s (after long scroll minus loaded).%n", b.catalog().images(),
          mib((long) ((b.loaded() - base) - loadedSlope * b.catalog().images())),
          mib(b.afterScroll() - b.loaded())));
    }
    for (Run r : runs) {
      s.append(String.format(Locale.ROOT, "- %,d images: one cached thumbnail holds about %.0f KiB of heap "
          + "((after long scroll - after jumps) / (%,d cached - %,d cached after the jumps)).%n", r.catalog().images(),
          (r.afterScroll() - r.afterJumps()) / 1024.0 / Math.max(1, r.thumbnailsCached() - r.jumpShown()), r.thumbnailsCached(), r.jumpShown()));
    }
    for (Run r : runs) {
      LargeCatalog.Built c = r.catalog();
      s.append(String.format(Locale.ROOT, "- %,d images: %,d ready, %,d pending, %,d failed, %,d missing, %,d "
          + "flagged; %d columns; catalog written in %.1f s; long scroll of %d screenful jumps took %.1f s.%n",
          c.images(), c.ready(), c.pending(), c.failed(), c.missing(), c.flagged(), r.columns(),
          c.buildMs() / 1000.0, SCROLL_STOPS + 1, r.scrollMs() / 1000.0));
    }
    s.append("- Heaps are used heap after three requested full GCs (HeapMeter.usedAfterGc). The baseline is the "
        + "heap with the empty window shown, read in the first run. A later run's own reading (in brackets) and the "
        + "reading after closing still hold about a full cache's worth of the previous window's thumbnails, freed "
        + "once the next window draws thumbnails (consistent with the software renderer keeping drawn images' "
        + "textures until its texture pool is pruned; not traced further). The peak since opening is given twice: the highest used "
        + "heap sampled every 5 ms (a lower bound) and the sum of the heap pools' peaks (an upper bound, which can "
        + "exceed the heap limit because the pools peak at different moments); both include garbage not yet "
        + "collected, so they grow with the heap limit the collector is given.\n");
    s.append("- Every size completed within the heap limit of ").append(mib(m.maxHeapBytes())).append(".\n");
    s.append("- Software rendering (Monocle's headless platform, prism.order=sw) makes textures Java arrays; the "
        + "desktop's hardware pipelines keep textures in video memory, so the per-thumbnail heap here is likely "
        + "an upper bound for the real window.\n");
    return s.toString();
  }

  private static String mib(long bytes) {
    return String.format(Locale.ROOT, "%.1f MiB", bytes / (1024.0 * 1024.0));
  }
}
