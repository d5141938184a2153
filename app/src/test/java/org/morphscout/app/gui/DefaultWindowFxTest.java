package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.morphscout.app.gui.TestWindow.fx;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollBar;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.indexer.values.ImageRow;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Every table of the browser, filled by the library's real services, at the window's default size
 * ({@link WindowSettings#DEFAULTS}): each visible column shows its whole title (no ellipsis) and no table needs a
 * horizontal scroll bar; and no text on screen uses a word the glossary retired.
 */
@ExtendWith(ApplicationExtension.class)
class DefaultWindowFxTest {
  static {
    HeadlessFx.configure();
  }

  @TempDir Path tmp;
  private TestWindow window;
  private MainViewModel vm;
  private Scene scene;

  @Start
  void start(Stage stage) {
    WindowSettings defaults = WindowSettings.DEFAULTS;
    // as MorphscoutApp opens the window on a first run
    window = TestWindow.show(stage, LibraryBackends::create, 200, defaults.width(), defaults.height(),
        defaults.inspectorDivider());
    vm = window.vm;
    scene = window.scene;
  }

  @AfterEach
  void close() {
    window.close();
  }

  @Test
  void everyTableShowsWholeTitlesWithoutSidewaysScrolling() throws Exception {
    Path photos = Files.createDirectories(tmp.resolve("photos"));
    String[] kinds = {"round", "square", "star"};
    Color[] colours = {new Color(0xC0504D), new Color(0x4F81BD), new Color(0x9BBB59)};
    for (String kind : kinds) {
      for (int i = 0; i < 3; i++) {
        // names as long as a camera's or a studio's, so titles and status lines have something to cut
        SampleCatalog.Picture p = new SampleCatalog.Picture("", "studio-shot-2026-12-04-" + kind + "-" + i + ".png",
            kind, 0.5 + 0.15 * i,
            colours[i], 0, 0, false);
        ImageIO.write(SampleCatalog.draw(p, 320, 240, true), "png", photos.resolve(p.name()).toFile());
      }
    }
    // a failure with a long path and reason, so the failures table has a row to lay out
    Path deep = Files.createDirectories(photos.resolve("a folder with a rather long name/and another one below it"));
    Files.write(deep.resolve("a picture that was cut short while it was being copied.jpg"),
        new byte[] {(byte) 0xFF, (byte) 0xD8, 0, 1});

    fx(() -> vm.open(tmp.resolve("catalog"), true));
    HeadlessFx.waitUntil(60, () -> vm.session().library() != null);
    fx(() -> {
      vm.session().paneProperty().set(Pane.INDEXING);
      vm.indexing().add(photos);
    });
    HeadlessFx.waitUntil(120, () -> !vm.indexing().runningProperty().get() && !vm.indexing().failures().isEmpty());
    assertThat(vm.indexing().messageProperty().get()).isEmpty();
    checkTable("#failures", 1);
    checkButtons("Indexing");

    ImageRow round = vm.session().rows().stream().filter(r -> r.path().endsWith("round-0.png")).findFirst()
        .orElseThrow();
    fx(() -> {
      vm.session().paneProperty().set(Pane.PAIRS);
      vm.pairs().showFor(round);
    });
    HeadlessFx.waitUntil(60, () -> !vm.pairs().runningProperty().get() && !vm.pairs().rows().isEmpty());
    assertThat(vm.pairs().messageProperty().get()).isEmpty();
    fx(() -> vm.pairs().reject(vm.pairs().rows().get(vm.pairs().rows().size() - 1))); // the status line has text
    HeadlessFx.waitUntil(30, () -> !vm.pairs().infoProperty().get().isEmpty());
    checkTable("#pairs-table", 5);
    checkButtons("Pairs");

    // The words people read in every pane (labels, buttons, tabs, column titles, prompts, tooltips) use the
    // glossary's words: none of those it retired (README, Glossary).
    List<String> retired = new ArrayList<>();
    fx(() -> retired.addAll(retiredWords(scene.getRoot())));
    assertThat(retired).as("retired words on screen").isEmpty();
  }

  /** No button shown on screen (the pane on show, the menu bar, the inspector) cuts its label. */
  private void checkButtons(String pane) throws Exception {
    List<String> cut = new ArrayList<>();
    int[] seen = new int[1];
    fx(() -> {
      for (Node n : scene.getRoot().lookupAll(".button")) {
        if (n instanceof javafx.scene.control.Button b && shown(b) && b.getText() != null && !b.getText().isEmpty()) {
          seen[0]++;
          Text t = (Text) b.lookup(".text");
          if (t == null || !b.getText().equals(t.getText())) {
            cut.add(b.getText() + " shown as '" + (t == null ? "" : t.getText()) + "'");
          }
        }
      }
    });
    assertThat(seen[0]).as("buttons on screen with %s shown", pane).isGreaterThan(3);
    assertThat(cut).as("buttons cut at the default window size with %s shown", pane).isEmpty();
  }

  private static boolean shown(Node n) {
    for (Node p = n; p != null; p = p.getParent()) {
      if (!p.isVisible()) {
        return false;
      }
    }
    return true;
  }

  /** Retired words (whole words, any case) in the texts under {@code node}, each with the text it is in. */
  private static List<String> retiredWords(Node node) {
    java.util.regex.Pattern retired = java.util.regex.Pattern.compile(
        "(?i)(?<![\\w-])(walkthroughs?|roots?|evenness|look|flags?|indexed|overlap|[KM]B|alternatives)(?![\\w-])");
    List<String> texts = new ArrayList<>();
    collect(node, texts);
    assertThat(texts).as("texts on screen").hasSizeGreaterThan(40);
    return texts.stream().filter(t -> retired.matcher(t).find()).toList();
  }

  private static void collect(Node node, List<String> texts) {
    if (node instanceof javafx.scene.control.Labeled l) {
      add(texts, l.getText());
      if (l.getTooltip() != null) {
        add(texts, l.getTooltip().getText());
      }
    }
    if (node instanceof javafx.scene.control.TextInputControl t) {
      add(texts, t.getPromptText());
    }
    if (node instanceof TableView<?> table) {
      table.getColumns().forEach(c -> add(texts, c.getText()));
    }
    if (node instanceof javafx.scene.control.TabPane tabs) {
      tabs.getTabs().forEach(t -> {
        add(texts, t.getText());
        if (t.getContent() != null) {
          collect(t.getContent(), texts);
        }
      });
    }
    if (node instanceof javafx.scene.control.MenuBar bar) {
      bar.getMenus().forEach(m -> {
        add(texts, m.getText());
        m.getItems().forEach(i -> add(texts, i.getText()));
      });
    }
    if (node instanceof javafx.scene.Parent p) {
      p.getChildrenUnmodifiable().forEach(c -> collect(c, texts));
    }
  }

  private static void add(List<String> texts, String text) {
    if (text != null && !text.isBlank()) {
      texts.add(text);
    }
  }

  /**
   * The table {@code id}, laid out on screen: at least {@code columns} visible columns, no title cut (also while its
   * column is the one sorted by, when the header shows a sort arrow), no sideways scroll bar.
   */
  private void checkTable(String id, int columns) throws Exception {
    WaitForAsyncUtils.waitForFxEvents();
    TableView<?> table = (TableView<?>) scene.lookup(id);
    List<String> cut = new ArrayList<>();
    List<String> titles = new ArrayList<>();
    boolean[] sideways = new boolean[1];
    StringBuilder widths = new StringBuilder();
    fx(() -> {
      assertThat(table.isVisible() && table.getWidth() > 0).as("%s is on screen", id).isTrue();
      widths.append("table ").append(Math.round(table.getWidth())).append(" px, columns");
      table.getVisibleLeafColumns().forEach(c -> {
        widths.append(' ').append(c.getText()).append(' ').append(Math.round(c.getWidth()));
        titles.add(c.getText());
      });
      sideways[0] = scrollsSideways(table);
    });
    assertThat(titles).as("%s: visible columns", id).hasSizeGreaterThanOrEqualTo(columns);
    assertThat(sideways[0]).as("%s scrolls sideways at the default window size (%s)", id, widths).isFalse();
    for (int i = 0; i < titles.size(); i++) {
      int column = i;
      fx(() -> sortBy(table, column));
      fx(() -> cut.addAll(cutTitles(table)));
    }
    assertThat(cut).as("%s: column titles cut at %sx%s (%s)", id, WindowSettings.DEFAULTS.width(),
        WindowSettings.DEFAULTS.height(), widths).isEmpty();
  }

  @SuppressWarnings({"unchecked", "rawtypes"})
  private static void sortBy(TableView table, int column) {
    TableColumn c = (TableColumn) table.getVisibleLeafColumns().get(column);
    if (c.isSortable()) {
      table.getSortOrder().setAll(c);
    }
    table.applyCss();
    table.layout();
  }

  /** The header titles of {@code table} that show less than their text (an ellipsis), with what they show. */
  private static List<String> cutTitles(TableView<?> table) {
    List<String> cut = new ArrayList<>();
    int seen = 0;
    for (Node header : table.lookupAll(".column-header")) {
      Label label = header.isVisible() ? (Label) header.lookup(".label") : null;
      if (label == null || label.getText() == null || label.getText().isEmpty()) {
        continue; // the filler right of the last column
      }
      seen++;
      Text shown = (Text) label.lookup(".text");
      if (shown == null || !label.getText().equals(shown.getText())) {
        cut.add(label.getText() + " shown as '" + (shown == null ? "" : shown.getText()) + "'");
      }
    }
    assertThat(seen).as("headers laid out").isEqualTo(table.getVisibleLeafColumns().size());
    return cut;
  }

  private static boolean scrollsSideways(TableView<?> table) {
    for (Node n : table.lookupAll(".scroll-bar")) {
      if (n instanceof ScrollBar bar && bar.getOrientation() == Orientation.HORIZONTAL && bar.isVisible()) {
        return true;
      }
    }
    return false;
  }
}
