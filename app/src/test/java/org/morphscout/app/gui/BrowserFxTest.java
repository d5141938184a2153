package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import javafx.scene.control.ListView;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.pairs.PairRow;
import org.morphscout.app.gui.service.ChainCandidate;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The main flows driven through real widgets on the headless Monocle platform. */
@ExtendWith(ApplicationExtension.class)
class BrowserFxTest {
  static {
    HeadlessFx.configure();
  }

  @TempDir static Path shared;
  static Path catalog;

  private TestWindow window;
  private MainViewModel vm;
  private FakeBackends fakes;

  @BeforeAll
  static void createCatalog() throws Exception {
    catalog = SampleCatalog.create(shared, 11L);
  }

  @Start
  void start(Stage stage) {
    fakes = new FakeBackends();
    window = TestWindow.show(stage, fakes.factory(), 200, 1400, 900);
    vm = window.vm;
  }

  @AfterEach
  void close() {
    window.close();
  }

  static void waitUntil(BooleanSupplier condition) throws Exception {
    HeadlessFx.waitUntil(10, condition);
  }

  private Tile tile(FxRobot robot, String name) {
    return robot.lookup(".tile").queryAllAs(Tile.class).stream()
        .filter(t -> t.isVisible() && t.caption().getText().endsWith(name)).findFirst().orElseThrow();
  }

  private void openCatalog() throws Exception {
    WaitForAsyncUtils.asyncFx(() -> vm.open(catalog, false));
    waitUntil(() -> vm.library().visible().size() == 27);
    WaitForAsyncUtils.waitForFxEvents();
  }

  @Test
  void openPickStartAndEndAndFindChains(FxRobot robot) throws Exception {
    openCatalog();
    robot.clickOn(tile(robot, "round-01.png"));
    assertThat(vm.inspector().titleProperty().get()).isEqualTo("round-01.png");
    robot.type(KeyCode.S);
    robot.clickOn(tile(robot, "oval-04.png"));
    robot.type(KeyCode.E);
    assertThat(vm.session().startProperty().get().path()).endsWith("round-01.png");
    assertThat(vm.session().endProperty().get().path()).endsWith("oval-04.png");
    robot.press(KeyCode.CONTROL).press(KeyCode.DIGIT2).release(KeyCode.DIGIT2).release(KeyCode.CONTROL);
    assertThat(robot.lookup("#panes").queryAs(TabPane.class).getSelectionModel().getSelectedItem().getText())
        .isEqualTo("Chains");
    robot.clickOn("#run-chains");
    waitUntil(() -> !vm.chains().chains().isEmpty());
    @SuppressWarnings("unchecked")
    ListView<ChainCandidate> list = robot.lookup("#chain-list").queryAs(ListView.class);
    assertThat(list.getItems()).hasSize(1);
    assertThat(list.getItems().get(0).images()).containsExactly(vm.session().startProperty().get().id(),
        vm.session().endProperty().get().id());
  }

  @Test
  void findPartnersAndApproveAPair(FxRobot robot) throws Exception {
    openCatalog();
    robot.clickOn(tile(robot, "square-02.png"));
    robot.type(KeyCode.P);
    waitUntil(() -> !vm.pairs().rows().isEmpty());
    assertThat(vm.session().paneProperty().get()).isEqualTo(Pane.PAIRS);
    @SuppressWarnings("unchecked")
    TableView<PairRow> table = robot.lookup("#pairs-table").queryAs(TableView.class);
    waitUntil(() -> robot.lookup("#pairs-table .table-row-cell").tryQuery().isPresent());
    robot.clickOn(robot.lookup("#pairs-table .table-row-cell").nth(0).queryAs(javafx.scene.Node.class));
    PairRow chosen = table.getSelectionModel().getSelectedItem();
    assertThat(chosen).isNotNull();
    // the inspector follows the table: the chosen pair's first image
    assertThat(vm.inspector().titleProperty().get()).isEqualTo(chosen.nameA());
    assertThat(table.getColumns()).extracting(c -> c.getText()).contains("First", "Second")
        .doesNotContain("A", "B", "Look");
    waitUntil(() -> vm.pairs().overlayProperty().get() != null);
    robot.type(KeyCode.A);
    waitUntil(() -> chosen.decisionProperty().get().equals("approved"));
    try (Library lib = Library.openExisting(catalog)) {
      Decision d = lib.decisions().find(chosen.suggestion().a(), chosen.suggestion().b())
          .orElseThrow();
      assertThat(d.kind()).isEqualTo(DecisionKind.APPROVED);
      lib.decisions().clear(d.imageA(), d.imageB());
    }
  }

  @Test
  void orderAWalkthroughFromTheSelection(FxRobot robot) throws Exception {
    openCatalog();
    robot.clickOn(tile(robot, "round-01.png"));
    robot.press(KeyCode.CONTROL);
    for (String n : new String[] {"star-03.png", "round-03.png", "square-01.png", "round-02.png"}) {
      robot.clickOn(tile(robot, n));
    }
    robot.release(KeyCode.CONTROL);
    assertThat(vm.session().selection()).hasSize(5);
    robot.press(KeyCode.CONTROL).press(KeyCode.DIGIT4).release(KeyCode.DIGIT4).release(KeyCode.CONTROL);
    robot.clickOn("#walk-use-selection");
    robot.clickOn("#walk-order");
    waitUntil(() -> vm.walkthrough().steps().size() == 4 && !vm.walkthrough().runningProperty().get());
    assertThat(vm.walkthrough().strip()).extracting(ImageRow::path).hasSize(5);
    // the three discs have the same shape, so a smooth order keeps them together
    int first = -1;
    int last = -1;
    for (int i = 0; i < 5; i++) {
      if (vm.walkthrough().strip().get(i).path().contains("/round-")) {
        first = first < 0 ? i : first;
        last = i;
      }
    }
    assertThat(last - first).isEqualTo(2);
    assertThat(robot.lookup("#walk-summary").queryLabeled().getText()).startsWith("5 images");
    // each image after the first shows the step cost FROM the previous one, as walk --csv counts it
    assertThat(robot.lookup(".step-cost").queryAllAs(javafx.scene.control.Label.class))
        .extracting(javafx.scene.control.Label::getText).contains("start").anyMatch(t -> t.startsWith("step cost "))
        .noneMatch(t -> t.startsWith("next"));
    // the inspector follows the strip's selection
    robot.clickOn(robot.lookup("#walk-strip .list-cell").nth(2).queryAs(javafx.scene.Node.class));
    assertThat(vm.session().selectedProperty().get()).isEqualTo(vm.walkthrough().strip().get(2));
  }

  @Test
  void ourOwnMenuAndPaneNames(FxRobot robot) {
    javafx.scene.control.MenuBar bar = robot.lookup(".menu-bar").queryAs(javafx.scene.control.MenuBar.class);
    assertThat(bar.getMenus()).extracting(javafx.scene.control.Menu::getText).containsExactly("Catalog", "Help");
    assertThat(robot.lookup("#panes").queryAs(TabPane.class).getTabs()).extracting(t -> t.getText())
        .containsExactly("Images", "Chains", "Pairs", "Walk", "Indexing");
  }
}
