package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.BooleanSupplier;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import javafx.scene.image.ImageView;
import javafx.stage.Stage;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.bench.HeapMeter;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.task.FxTaskRunner;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Heap of the browser's library view on large catalogs (run with {@link #COMMAND}; give the test JVM another heap
 * limit with {@code -Dmorphscout.test.heap=-Xmx512m} on the Maven command line; the default is the pom's
 * {@code -Xmx2g}). For each size
 * (default 10,000 and 100,000 images; system property {@code morphscout.bench.browserSizes}) it writes a real
 * catalog ({@link LargeCatalog}), shows the real window ({@link MainView} with the app's own backends, task runner
 * and thumbnail cache settings) on the headless Monocle platform, opens the catalog through
 * {@link MainViewModel#open}, waits until the grid shows every image and its first thumbnails, jumps to the middle
 * and the end, then scrolls through the whole grid in screenful jumps until more thumbnails were shown than the
 * cache keeps. Used heap after GC is taken before opening, when loaded, after the jumps, after the long scroll and
 * after closing; the peak since opening is both sampled ({@link HeapSampler}, a lower bound) and summed over the
 * heap pools ({@link HeapMeter#peakSinceReset}, an upper bound). The per-image slope is the difference of the loaded
 * heaps over the difference of the sizes. The figures are explained in {@link BrowserMemoryReport}.
 *
 * <p>Prints a Markdown section and writes it to {@code morphscout.bench.out} (default
 * {@code target/browser-memory.md}). Asserts only facts that can fail: every image is listed, the findings read from
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
  static final String COMMAND = "mvn -B -q -P benchmarks -Dgroups=benchmark -pl app -am test "
      + "-Dtest=LibraryViewMemoryBenchmark -Dsurefire.failIfNoSpecifiedTests=false";

  @BeforeAll
  static void toolkit() throws Exception {
    FxToolkit.registerPrimaryStage();
  }

  @Test
  void libraryViewHeapAtTenAndHundredThousandImages(@TempDir Path dir) throws Exception {
    List<Integer> sizes = Arrays.stream(System.getProperty("morphscout.bench.browserSizes", "10000,100000")
        .split(",")).map(String::trim).map(Integer::parseInt).toList();
    List<BrowserMemoryReport.Run> runs = new ArrayList<>();
    for (int n : sizes) {
      LargeCatalog.Built built = LargeCatalog.create(dir.resolve("c" + n), n, SEED + n);
      BrowserMemoryReport.Run run = measure(built);
      settle();
      runs.add(run.closed(HeapMeter.usedAfterGc()));
    }
    String report = BrowserMemoryReport.markdown(runs, COMMAND, String.format(Locale.ROOT,
        "%.0f x %.0f, headless Monocle, software rendering", WIDTH, HEIGHT), SCROLL_STOPS + 1);
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

  private BrowserMemoryReport.Run measure(LargeCatalog.Built built) throws Exception {
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
      // the findings come from the catalog (CatalogFindings.load): as many failed images as LargeCatalog wrote
      WaitForAsyncUtils.asyncFx(() -> w.vm().library().findingProperty(ImageFinding.FAILED).set(true)).get();
      assertThat(onFx(() -> w.vm().library().visible().size())).as("failed images listed")
          .isEqualTo(built.failed());
      // with every finding chosen, the grid shows the images with any finding: the flagged silhouettes plus the failures
      WaitForAsyncUtils.asyncFx(() -> {
        for (ImageFinding f : ImageFinding.values()) {
          w.vm().library().findingProperty(f).set(true);
        }
      }).get();
      assertThat(onFx(() -> w.vm().library().visible().size())).as("images with any finding listed")
          .isEqualTo(built.flagged() + built.failed());
      return new BrowserMemoryReport.Run(built, before, loaded, afterJumps, afterScroll, peak, sampledPeak, loadMs,
          tiles, maxTiles, columns, jumpShown, shown.size(), cached, scrollMs, -1);
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
    HeadlessFx.waitUntil(WAIT_S, condition);
  }

  private static <T> T onFx(java.util.concurrent.Callable<T> work) throws Exception {
    return WaitForAsyncUtils.asyncFx(work).get();
  }
}
