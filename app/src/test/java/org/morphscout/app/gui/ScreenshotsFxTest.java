package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.app.gui.task.FxTaskRunner;
import org.morphscout.indexer.catalog.ImageRow;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Writes a PNG of each pane, on the sample pictures indexed by the real indexer and served by the library's services,
 * to {@code target/screenshots}, or to the
 * folder named by {@code -Dmorphscout.screenshots=<dir>} (the docs use {@code docs/screenshots}). Checks that each
 * picture has real content (many distinct colours), so a blank snapshot fails.
 */
@ExtendWith(ApplicationExtension.class)
class ScreenshotsFxTest {
  static {
    HeadlessFx.configure();
  }

  @TempDir Path tmp;
  private FxTaskRunner runner;
  private ThumbnailCache thumbs;
  private MainViewModel vm;
  private Scene scene;

  @Start
  void start(Stage stage) {
    runner = new FxTaskRunner(2);
    vm = new MainViewModel(runner, LibraryBackends::create);
    thumbs = new ThumbnailCache(id -> vm.session().thumbnail(id), 144, 300);
    MainView view = new MainView(vm, thumbs);
    view.split().setDividerPositions(0.76);
    scene = view.scene(1440, 900);
    stage.setScene(scene);
    stage.show();
  }

  @AfterEach
  void close() {
    WaitForAsyncUtils.asyncFx(() -> vm.close());
    WaitForAsyncUtils.waitForFxEvents();
    runner.close();
    thumbs.close();
  }

  static void waitUntil(BooleanSupplier condition) throws Exception {
    WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> WaitForAsyncUtils.asyncFx(condition::getAsBoolean).get());
  }

  static void fx(Runnable r) throws Exception {
    WaitForAsyncUtils.asyncFx(r).get();
    WaitForAsyncUtils.waitForFxEvents();
  }

  private ImageRow row(String name) {
    return vm.library().visible().stream().filter(r -> r.path().endsWith("/" + name)).findFirst().orElseThrow();
  }

  private void shoot(Path dir, String name) throws Exception {
    WaitForAsyncUtils.sleep(400, TimeUnit.MILLISECONDS); // thumbnails arrive from the loader threads
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
    Path photos = tmp.resolve("photos");
    SampleCatalog.writePictures(photos, 5L);
    fx(() -> vm.open(tmp.resolve("catalog"), true));
    waitUntil(() -> vm.session().library() != null);
    fx(() -> {
      vm.session().paneProperty().set(Pane.INDEXING);
      vm.indexing().add(photos);
    });
    waitUntil(() -> !vm.indexing().runningProperty().get());
    assertThat(vm.indexing().messageProperty().get()).isEmpty();
    waitUntil(() -> vm.library().visible().size() == 27 && vm.indexing().failures().size() == 1);
    shoot(dir, "indexing");
    fx(() -> vm.session().paneProperty().set(Pane.LIBRARY));
    fx(() -> {
      vm.session().selectedProperty().set(row("star-02.png"));
      vm.session().selection().setAll(row("star-02.png"));
    });
    waitUntil(() -> vm.inspector().maskProperty().get() != null);
    shoot(dir, "library");

    fx(() -> vm.inspector().overlayProperty().set(true));
    fx(() -> vm.inspector().findSimilar(org.morphscout.app.gui.service.SimilarityMode.SHAPE));
    waitUntil(() -> !vm.library().searchingProperty().get());
    shoot(dir, "inspector");

    fx(() -> {
      vm.session().startProperty().set(row("round-01.png"));
      vm.session().endProperty().set(row("tile-04.png"));
      vm.session().paneProperty().set(Pane.CHAINS);
      vm.chains().run();
    });
    waitUntil(() -> !vm.chains().runningProperty().get());
    assertThat(vm.chains().messageProperty().get()).isEmpty();
    assertThat(vm.chains().chains()).isNotEmpty();
    fx(() -> vm.chains().preview(vm.chains().chains().get(0)));
    waitUntil(() -> vm.chains().previewProperty().get() != null);
    shoot(dir, "chains");

    fx(() -> {
      vm.session().paneProperty().set(Pane.PAIRS);
      vm.pairs().showFor(row("round-01.png"));
    });
    waitUntil(() -> !vm.pairs().runningProperty().get());
    assertThat(vm.pairs().messageProperty().get()).isEmpty();
    assertThat(vm.pairs().rows()).hasSizeGreaterThan(4);
    fx(() -> {
      vm.pairs().selectedProperty().set(vm.pairs().rows().get(0));
      scene.lookup("#pairs-table").requestFocus();
      ((javafx.scene.control.TableView<?>) scene.lookup("#pairs-table")).getSelectionModel().select(0);
      vm.pairs().approve(vm.pairs().rows().get(1));
      vm.pairs().reject(vm.pairs().rows().get(3));
    });
    waitUntil(() -> vm.pairs().overlayProperty().get() != null);
    shoot(dir, "pairs");

    fx(() -> {
      vm.session().selection().setAll(List.of(row("round-01.png"), row("star-04.png"), row("oval-02.png"),
          row("round-03.png"), row("kite-01.png"), row("oval-03.png"), row("star-01.png")));
      vm.session().paneProperty().set(Pane.WALKTHROUGH);
      vm.walkthrough().useSelection();
      vm.walkthrough().order();
    });
    waitUntil(() -> !vm.walkthrough().runningProperty().get() && vm.walkthrough().steps().size() == 6);
    assertThat(vm.walkthrough().messageProperty().get()).isEmpty();
    shoot(dir, "walkthrough");

    assertThat(dir.resolve("walkthrough.png")).exists();
  }
}
