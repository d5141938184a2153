package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.morphscout.app.gui.TestWindow.fx;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.AnnotatedElementContext;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.extension.ExtensionContext;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.io.TempDirFactory;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.pairs.PairRow;
import org.morphscout.app.gui.service.ChainCandidate;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.demo.DemoLibrary;
import org.morphscout.demo.DemoOptions;
import org.morphscout.demo.LibrarySummary;
import org.morphscout.indexer.Folders;
import org.morphscout.indexer.values.ImageRow;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Writes a PNG of each pane, on a small demo library (the invented ceramics studio of {@code demo-library}) indexed
 * through the Indexing pane by the real indexer and served by the library's services, to {@code target/screenshots},
 * or to the folder named by {@code -Dmorphscout.screenshots=<dir>} (the README's pictures are made with
 * {@code -Dmorphscout.screenshots=$PWD/docs/screenshots} from the repository root; surefire runs in {@code app/}, so
 * give an absolute path). Checks that each picture has real content (many distinct colours), so a blank snapshot
 * fails, and that each pane shows real results: a near-duplicate found as the closest shape, a chain with images
 * between its endpoints, partners for a jug, and a shelf walkthrough close to the order the generator filmed it in.
 */
@ExtendWith(ApplicationExtension.class)
class ScreenshotsFxTest {
  static {
    HeadlessFx.configure();
  }

  /**
   * Small enough to generate and index in well under a minute on 2 cores, large enough for chains and partners to
   * have real choices: 40 products in six product lines, one near-duplicate, the six problem pictures, and 8 shelf
   * views (as many as the walkthrough strip shows side by side in the screenshot).
   */
  static final DemoOptions DEMO = DemoOptions.defaults().withProductCount(40).withShelfViews(8);

  // Pictures picked by name from the demo with DEMO's default seed (see demo-library's manifest.csv).
  static final String VASE = "vase-honey-021.jpg";
  static final String VASE_COPY = "vase-honey-021-web.jpg";
  static final String BOWL = "bowl-ivory-011.jpg";
  static final String BOTTLE = "bottle-oxblood-032.jpg";
  static final String JUG = "jug-celadon-035.jpg";

  /**
   * The studio's folder, with a plain name so the status bar and the inspector in the README's pictures show a path a
   * reader recognises (not a test runner's random temporary name); removed after the test like any temporary folder.
   */
  @TempDir(factory = StudioFolder.class) Path tmp;

  /** Makes {@code <system temp>/quernhollow}, emptied first if an interrupted run left it behind. */
  static final class StudioFolder implements TempDirFactory {
    @Override
    public Path createTempDirectory(AnnotatedElementContext element, ExtensionContext extension) throws IOException {
      Path dir = Path.of(System.getProperty("java.io.tmpdir"), "quernhollow");
      Folders.deleteTree(dir);
      return Files.createDirectories(dir);
    }
  }
  private TestWindow window;
  private MainViewModel vm;
  private Scene scene;

  @Start
  void start(Stage stage) {
    // The headless screen's size (HeadlessFx): room for the pairs table's columns and a whole walkthrough strip.
    window = TestWindow.show(stage, LibraryBackends::create, 300, 1600, 1000, 0.78);
    vm = window.vm;
    scene = window.scene;
  }

  @AfterEach
  void close() {
    window.close();
  }

  static void waitUntil(BooleanSupplier condition) throws Exception {
    HeadlessFx.waitUntil(90, condition);
  }

  private ImageRow row(String name) {
    return vm.session().rows().stream().filter(r -> r.path().endsWith("/" + name)).findFirst()
        .orElseThrow(() -> new AssertionError(name + " is not in the indexed demo library (seed "
            + DEMO.seed() + ")"));
  }

  /** Scrolls the library grid as a user would, so the selected tile is on screen (second visible row). */
  @SuppressWarnings("unchecked")
  private void scrollGridTo(ImageRow image) {
    ListView<List<ImageRow>> grid = (ListView<List<ImageRow>>) scene.lookup("#library-grid");
    List<List<ImageRow>> rows = grid.getItems();
    for (int i = 0; i < rows.size(); i++) {
      if (rows.get(i).contains(image)) {
        grid.scrollTo(Math.max(0, i - 1));
        return;
      }
    }
    throw new AssertionError("the library grid does not show " + image.path());
  }

  private String name(long id) {
    return vm.session().name(id);
  }

  private void shoot(Path dir, String name) throws Exception {
    WaitForAsyncUtils.sleep(600, TimeUnit.MILLISECONDS); // thumbnails arrive from the loader threads
    WaitForAsyncUtils.waitForFxEvents();
    BufferedImage img = WaitForAsyncUtils.asyncFx(() -> SwingFXUtils.fromFXImage(scene.snapshot(null), null)).get();
    Set<Integer> colours = new HashSet<>();
    for (int y = 0; y < img.getHeight(); y += 3) {
      for (int x = 0; x < img.getWidth(); x += 3) {
        colours.add(img.getRGB(x, y));
      }
    }
    assertThat(colours.size()).as("distinct colours in %s", name).isGreaterThan(200);
    ImageIO.write(img, "png", dir.resolve(name + ".png").toFile());
  }

  @Test
  void everyPane() throws Exception {
    String target = System.getProperty("morphscout.screenshots");
    Path dir = Files.createDirectories(target == null ? Path.of("target", "screenshots") : Path.of(target));
    Path demo = tmp.resolve("studio");
    LibrarySummary summary = DemoLibrary.generate(demo, DEMO);

    fx(() -> vm.open(tmp.resolve("catalog"), true));
    waitUntil(() -> vm.session().library() != null);
    fx(() -> {
      vm.session().paneProperty().set(Pane.INDEXING);
      vm.indexing().add(demo);
    });
    waitUntil(() -> !vm.indexing().runningProperty().get());
    assertThat(vm.indexing().messageProperty().get()).isEmpty();
    // Every picture gets a row (failed ones too, flagged); the corrupt problem picture is listed as a failure.
    waitUntil(() -> vm.library().visible().size() == summary.pictures() && !vm.indexing().failures().isEmpty());
    assertThat(vm.indexing().failures()).anySatisfy(f -> assertThat(f.path()).contains("corrupt-"));
    shoot(dir, "indexing");

    fx(() -> {
      vm.session().paneProperty().set(Pane.LIBRARY);
      vm.session().selectedProperty().set(row(VASE));
      vm.session().selection().setAll(row(VASE));
    });
    fx(() -> scrollGridTo(row(VASE)));
    waitUntil(() -> vm.inspector().maskProperty().get() != null);
    shoot(dir, "images");

    fx(() -> vm.inspector().overlayProperty().set(true));
    fx(() -> vm.inspector().findSimilar(SimilarityMode.SHAPE));
    waitUntil(() -> !vm.library().searchingProperty().get());
    assertThat(vm.library().messageProperty().get()).isEmpty();
    fx(() -> ((ListView<?>) scene.lookup("#library-grid")).scrollTo(0)); // the nearest shapes first
    // The resized, recompressed copy has the same outline: it must be the nearest shape after the vase itself.
    List<String> similar = vm.library().visible().stream().map(r -> name(r.id())).toList();
    assertThat(similar.stream().filter(n -> !n.endsWith(VASE)).findFirst()).as("nearest shapes %s", similar)
        .hasValueSatisfying(n -> assertThat(n).endsWith(VASE_COPY));
    // Shape, not colour: most of the nearest outlines are other vases, whatever their glaze. The shelf views are
    // left out: they hold several objects, and the silhouette kept of each (its largest object, found by the learned
    // model as index's default auto silhouettes choose) is a vase, so they rightly rank near it too.
    List<ImageRow> nearest = vm.library().visible().stream().filter(r -> !r.path().contains("/shelves/")).limit(5)
        .toList();
    assertThat(nearest.stream().filter(r -> r.path().contains("/vases/")).count()).as("nearest shapes %s", similar)
        .isGreaterThanOrEqualTo(4);
    shoot(dir, "inspector");

    fx(() -> {
      vm.session().startProperty().set(row(BOWL));
      vm.session().endProperty().set(row(BOTTLE));
      vm.session().paneProperty().set(Pane.CHAINS);
      // At most 4 steps: a whole chain (5 pictures and its 4 step costs) fits the pane's width in the screenshot.
      vm.chains().maxStepsProperty().set(4);
      vm.chains().run();
    });
    waitUntil(() -> !vm.chains().runningProperty().get());
    assertThat(vm.chains().messageProperty().get()).isEmpty();
    assertThat(vm.chains().chains()).isNotEmpty();
    long bowl = row(BOWL).id();
    long bottle = row(BOTTLE).id();
    for (ChainCandidate c : vm.chains().chains()) {
      assertThat(c.images().get(0)).isEqualTo(bowl);
      assertThat(c.images().get(c.images().size() - 1)).isEqualTo(bottle);
      assertThat(c.images()).as("a chain goes through real images in between").hasSizeBetween(3, 5);
      assertThat(c.steps()).allSatisfy(s -> assertThat(s.cost()).isBetween(0.0, 2.0));
    }
    fx(() -> vm.chains().preview(vm.chains().chains().get(0)));
    waitUntil(() -> vm.chains().previewProperty().get() != null);
    shoot(dir, "chains");

    fx(() -> {
      vm.session().paneProperty().set(Pane.PAIRS);
      vm.pairs().showFor(row(JUG));
    });
    waitUntil(() -> !vm.pairs().runningProperty().get());
    assertThat(vm.pairs().messageProperty().get()).isEmpty();
    List<PairRow> pairs = List.copyOf(vm.pairs().rows());
    assertThat(pairs).hasSizeGreaterThan(4);
    long jug = row(JUG).id();
    assertThat(pairs).allSatisfy(p -> {
      assertThat(List.of(p.suggestion().a(), p.suggestion().b())).contains(jug);
      assertThat(p.suggestion().score()).isBetween(0.0, 100.0);
    });
    // The jug's best partner is another jug (same archetype, so the outlines overlap and the warp is small).
    PairRow best = pairs.stream().max(Comparator.comparingDouble(p -> p.suggestion().score())).orElseThrow();
    PairRow worst = pairs.stream().min(Comparator.comparingDouble(p -> p.suggestion().score())).orElseThrow();
    long partner = best.suggestion().a() == jug ? best.suggestion().b() : best.suggestion().a();
    assertThat(name(partner)).as("best partner of %s", JUG).startsWith("jug-");
    fx(() -> {
      TableView<?> table = (TableView<?>) scene.lookup("#pairs-table");
      table.requestFocus();
      table.getSelectionModel().select(0); // the table lists the best score first
      vm.pairs().approve(best);
      vm.pairs().reject(worst);
    });
    waitUntil(() -> vm.pairs().overlayProperty().get() != null && !worst.decisionProperty().get().isEmpty());
    assertThat(vm.pairs().selectedProperty().get()).isSameAs(best);
    shoot(dir, "pairs");

    Path shelves = demo.resolve("shelves");
    List<String> filmed = shelfOrder(demo.resolve("manifest.csv"));
    fx(() -> {
      vm.session().paneProperty().set(Pane.WALKTHROUGH);
      vm.walkthrough().useFolder(shelves, List.copyOf(vm.session().rows()));
      vm.walkthrough().order();
    });
    waitUntil(() -> !vm.walkthrough().runningProperty().get()
        && vm.walkthrough().steps().size() == filmed.size() - 1);
    assertThat(vm.walkthrough().messageProperty().get()).isEmpty();
    List<String> ordered = vm.walkthrough().strip().stream().map(r -> Path.of(r.path()).getFileName().toString())
        .toList();
    assertThat(ordered).containsExactlyInAnyOrderElementsOf(filmed);
    // Ground truth from the demo generator (manifest.csv, shelf_order): it films the shelf along one camera path and
    // shuffles the names; a smooth order must put most views next to the ones filmed just before or after them
    // (either direction; up to two breaks allowed for 2-opt's local optima).
    assertThat(trueNeighbours(ordered, filmed)).as("ordered %s, filmed %s", ordered, filmed)
        .isGreaterThanOrEqualTo(filmed.size() - 3);
    shoot(dir, "walk");

    assertThat(dir.resolve("walk.png")).exists();
  }

  /** The shelf views' file names in the order the generator filmed them ({@code shelf_order} in the manifest). */
  static List<String> shelfOrder(Path manifest) throws Exception {
    List<String> lines = Files.readAllLines(manifest);
    List<String> header = List.of(lines.get(0).split(","));
    int file = header.indexOf("file");
    int order = header.indexOf("shelf_order");
    Map<Integer, String> byOrder = new TreeMap<>();
    for (String line : lines.subList(1, lines.size())) {
      String[] cells = line.split(",", -1);
      int position = Integer.parseInt(cells[order]);
      if (position >= 0) {
        byOrder.put(position, Path.of(cells[file]).getFileName().toString());
      }
    }
    return new ArrayList<>(byOrder.values());
  }

  /** How many consecutive pairs of {@code ordered} were also consecutive when filmed. */
  static int trueNeighbours(List<String> ordered, List<String> filmed) {
    int n = 0;
    for (int i = 0; i + 1 < ordered.size(); i++) {
      if (Math.abs(filmed.indexOf(ordered.get(i)) - filmed.indexOf(ordered.get(i + 1))) == 1) {
        n++;
      }
    }
    return n;
  }
}
