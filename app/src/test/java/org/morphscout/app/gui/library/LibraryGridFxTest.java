package org.morphscout.app.gui.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import javafx.scene.Scene;
import javafx.scene.control.ListView;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.morphscout.app.gui.HeadlessFx;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.task.DirectTaskRunner;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The grid with 100,000 images: only the rows on screen become nodes, and filtering and scrolling stay quick. */
@ExtendWith(ApplicationExtension.class)
class LibraryGridFxTest {
  static {
    HeadlessFx.configure();
  }

  static final int N = 100_000;
  private LibraryViewModel vm;
  private ThumbnailCache thumbs;
  private LibraryView view;

  @Start
  void start(Stage stage) {
    vm = new LibraryViewModel(new Session(), new DirectTaskRunner());
    thumbs = new ThumbnailCache(id -> Optional.<Path>empty(), 144, 100);
    view = new LibraryView(vm, thumbs);
    stage.setScene(new Scene(view, 1100, 800));
    stage.show();
  }

  @AfterEach
  void close() {
    thumbs.close();
  }

  @Test
  void hundredThousandImagesMakeOnlyAScreenfulOfTiles(FxRobot robot) throws Exception {
    List<ImageRow> rows = new ArrayList<>(N);
    Map<Long, Set<ImageFinding>> findings = new HashMap<>();
    for (int i = 0; i < N; i++) {
      String folder = "/photos/set-" + (i % 50);
      rows.add(new ImageRow(i, 1, folder + "/img-" + i + ".jpg", 1000 + i, 0, "h" + i, 640, 480, 1, "jpeg",
          ImageStatus.READY));
      if (i % 97 == 0) {
        findings.put((long) i, EnumSet.of(ImageFinding.CUT_OFF));
      }
    }
    WaitForAsyncUtils.asyncFx(() -> vm.show(rows, List.of(new Folder(1, "/photos")), findings)).get();
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.visible()).hasSize(N);
    // a virtualised list creates cells for the visible rows only: a screenful of tiles, not 100,000
    int tiles = robot.lookup(".tile").queryAll().size();
    assertThat(tiles).isBetween(1, 400);

    @SuppressWarnings("unchecked")
    ListView<List<ImageRow>> grid = robot.lookup("#library-grid").queryAs(ListView.class);
    WaitForAsyncUtils.asyncFx(() -> grid.scrollTo(grid.getItems().size() - 1)).get();
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(robot.lookup(".tile").queryAllAs(Tile.class)).anyMatch(t -> t.shownId() == N - 1);
    assertThat(robot.lookup(".tile").queryAll().size()).isLessThanOrEqualTo(tiles + 40);

    WaitForAsyncUtils.asyncFx(() -> vm.findingProperty(ImageFinding.CUT_OFF).set(true)).get();
    WaitForAsyncUtils.waitForFxEvents();
    // every 97th row has a finding above: ids 0, 97, ..., 99,910
    assertThat(vm.visible()).hasSize((N + 96) / 97);
    // (How long showing and filtering take is measured by the browser benchmark, not asserted here.)
  }

  @Test
  void findingsShowAsAStripOnTheTileAndAMissingFileIsDimmed(FxRobot robot) throws Exception {
    List<ImageRow> rows = List.of(
        new ImageRow(1, 1, "/photos/gone.jpg", 1000, 0, "h1", 640, 480, 1, "jpeg", ImageStatus.MISSING),
        new ImageRow(2, 1, "/photos/doubtful.jpg", 1000, 0, "h2", 640, 480, 1, "jpeg", ImageStatus.READY),
        new ImageRow(3, 1, "/photos/fine.jpg", 1000, 0, "h3", 640, 480, 1, "jpeg", ImageStatus.READY));
    Map<Long, Set<ImageFinding>> findings = Map.of(1L, EnumSet.of(ImageFinding.MISSING), 2L,
        EnumSet.of(ImageFinding.UNCERTAIN, ImageFinding.CUT_OFF));
    WaitForAsyncUtils.asyncFx(() -> vm.show(rows, List.of(new Folder(1, "/photos")), findings)).get();
    WaitForAsyncUtils.waitForFxEvents();
    Map<Long, Tile> byId = new HashMap<>();
    robot.lookup(".tile").queryAllAs(Tile.class).forEach(t -> byId.put(t.shownId(), t));
    Tile gone = byId.get(1L);
    assertThat(gone.note().isVisible()).isTrue();
    assertThat(gone.note().getText()).isEqualTo("missing");
    assertThat(gone.note().getStyleClass()).contains("tile-note-missing");
    assertThat(((javafx.scene.layout.StackPane) gone.getChildren().get(0)).getChildren().get(0).getOpacity())
        .as("a missing file's thumbnail is dimmed").isLessThan(0.5);
    Tile doubtful = byId.get(2L);
    assertThat(doubtful.note().getText()).isEqualTo("uncertain +1");
    assertThat(doubtful.note().getStyleClass()).contains("tile-note-uncertain");
    assertThat(doubtful.note().getTooltip().getText()).isEqualTo("Found: uncertain silhouette, cut off");
    assertThat(byId.get(3L).note().isVisible()).isFalse();
    // the filter box for each finding is there, the missing one included
    assertThat(robot.lookup("#finding-missing").tryQuery()).isPresent();
    WaitForAsyncUtils.asyncFx(() -> vm.findingProperty(ImageFinding.UNCERTAIN).set(true)).get();
    assertThat(vm.visible()).extracting(ImageRow::id).containsExactly(2L);
  }
}
