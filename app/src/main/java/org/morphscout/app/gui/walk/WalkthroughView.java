package org.morphscout.app.gui.walk;

import java.io.File;
import java.util.List;
import javafx.collections.ListChangeListener;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.Tooltip;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.DataFormat;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.indexer.text.Figures;
import org.morphscout.indexer.values.ImageRow;

/** The walk strip: images in order with the size of each step drawn as a bar; drag to reorder. */
public final class WalkthroughView extends BorderPane {
  static final double TILE = 120;
  private static final DataFormat POSITION = new DataFormat("application/x-morphscout-strip-position");

  private final WalkthroughViewModel vm;
  private final Session session;
  private final ThumbnailCache thumbs;
  private final ListView<ImageRow> strip = new ListView<>();

  public WalkthroughView(WalkthroughViewModel vm, ThumbnailCache thumbs) {
    this.vm = vm;
    this.session = vm.session();
    this.thumbs = thumbs;
    getStyleClass().add("walk-view");
    setTop(new VBox(toolbar(), MessageLine.error(vm.messageProperty())));
    strip.setId("walk-strip");
    strip.setOrientation(Orientation.HORIZONTAL);
    strip.setItems(vm.strip());
    strip.setCellFactory(l -> new StripCell());
    strip.setPlaceholder(new Label("Select images in Images (Ctrl+click), then Use the selection; or use a folder."));
    vm.steps().addListener((ListChangeListener<Double>) c -> strip.refresh());
    // the inspector follows the strip's selection
    strip.getSelectionModel().selectedItemProperty().addListener((o, a, r) -> {
      if (r != null) {
        session.selectedProperty().set(r);
      }
    });
    strip.setOnKeyPressed(e -> {
      int i = strip.getSelectionModel().getSelectedIndex();
      if (e.isAltDown() && i >= 0) {
        switch (e.getCode()) {
          case LEFT -> move(i, i - 1);
          case RIGHT -> move(i, i + 1);
          default -> {
            return;
          }
        }
        e.consume();
      }
    });
    setCenter(strip);
  }

  private VBox toolbar() {
    Button selection = new Button("Use the selection");
    selection.setId("walk-use-selection");
    selection.setOnAction(e -> vm.useSelection());
    Button folder = new Button("Use folder…");
    folder.setOnAction(e -> {
      DirectoryChooser dc = new DirectoryChooser();
      dc.setTitle("Choose a folder of the catalog");
      File f = dc.showDialog(getScene().getWindow());
      if (f != null) {
        vm.useFolder(f.toPath(), List.copyOf(session.rows()));
      }
    });
    Button order = new Button("Order smoothly");
    order.setId("walk-order");
    order.getStyleClass().add("primary");
    order.setTooltip(new Tooltip("Order the strip into the smoothest sequence (Ctrl+Enter)"));
    order.setOnAction(e -> vm.order());
    Button left = new Button("◀ Move");
    left.setTooltip(new Tooltip("Move the chosen image left (Alt+Left)"));
    left.setOnAction(e -> moveSelected(-1));
    Button right = new Button("Move ▶");
    right.setTooltip(new Tooltip("Move the chosen image right (Alt+Right)"));
    right.setOnAction(e -> moveSelected(1));
    Button remove = new Button("Remove");
    remove.setOnAction(e -> vm.remove(strip.getSelectionModel().getSelectedIndex()));
    Button export = new Button("Export order…");
    export.setId("walk-export");
    export.setOnAction(e -> {
      FileChooser fc = new FileChooser();
      fc.setTitle("Export the walk (the same CSV as walk --csv)");
      fc.getExtensionFilters().add(new FileChooser.ExtensionFilter("CSV", "*.csv"));
      fc.setInitialFileName("walk.csv");
      File f = fc.showSaveDialog(getScene().getWindow());
      if (f != null) {
        vm.export(f.toPath());
      }
    });
    ProgressIndicator busy = new ProgressIndicator();
    busy.setPrefSize(18, 18);
    busy.visibleProperty().bind(vm.runningProperty());
    Label summary = new Label();
    summary.setId("walk-summary");
    summary.getStyleClass().add("summary");
    summary.textProperty().bind(vm.summaryProperty());
    Region spacer = new Region();
    HBox.setHgrow(spacer, Priority.ALWAYS);
    HBox buttons = new HBox(10, selection, folder, order, left, right, remove, spacer, export);
    buttons.setAlignment(Pos.CENTER_LEFT);
    for (javafx.scene.Node n : buttons.getChildren()) {
      if (n instanceof Button b) {
        b.setMinWidth(Region.USE_PREF_SIZE);
      }
    }
    HBox status = new HBox(8, busy, summary);
    status.setAlignment(Pos.CENTER_LEFT);
    VBox bar = new VBox(6, buttons, status);
    bar.getStyleClass().add("toolbar");
    return bar;
  }

  private void moveSelected(int delta) {
    int i = strip.getSelectionModel().getSelectedIndex();
    if (i >= 0) {
      move(i, i + delta);
    }
  }

  private void move(int from, int to) {
    if (to < 0 || to >= vm.strip().size()) {
      return;
    }
    vm.move(from, to);
    strip.getSelectionModel().select(to);
  }

  /**
   * One image with the step cost FROM the previous image TO it (as {@code walk} and its CSV count it) as a number and
   * a bar (longer bar = bigger jump); the first image has none.
   */
  private final class StripCell extends ListCell<ImageRow> {
    private final Tile tile = new Tile(TILE);
    private final Label step = new Label();
    private final Region bar = new Region();
    private final VBox box;

    StripCell() {
      bar.getStyleClass().add("step-bar");
      step.getStyleClass().add("step-cost");
      box = new VBox(4, tile, step, bar);
      box.setAlignment(Pos.TOP_CENTER);
      setOnDragDetected(e -> {
        if (getItem() != null) {
          var db = startDragAndDrop(TransferMode.MOVE);
          ClipboardContent c = new ClipboardContent();
          c.put(POSITION, getIndex());
          db.setContent(c);
          e.consume();
        }
      });
      setOnDragOver(e -> {
        if (e.getDragboard().hasContent(POSITION)) {
          e.acceptTransferModes(TransferMode.MOVE);
        }
        e.consume();
      });
      setOnDragDropped(e -> {
        Object from = e.getDragboard().getContent(POSITION);
        if (from instanceof Integer f) {
          int to = isEmpty() ? vm.strip().size() - 1 : getIndex();
          move(f, to);
          e.setDropCompleted(true);
        }
        e.consume();
      });
    }

    @Override
    protected void updateItem(ImageRow row, boolean empty) {
      super.updateItem(row, empty);
      if (empty || row == null) {
        setGraphic(null);
        return;
      }
      tile.show(row, (getIndex() + 1) + ". " + session.name(row.id()), null, thumbs);
      List<Double> steps = vm.steps();
      int i = getIndex();
      if (i > 0 && i - 1 < steps.size()) {
        double max = steps.stream().mapToDouble(Double::doubleValue).max().orElse(1);
        double s = steps.get(i - 1);
        step.setText("step cost " + Figures.threeDigits(s));
        bar.setPrefWidth(Math.max(4, (TILE - 8) * (max <= 0 ? 0 : s / max)));
        bar.setMaxWidth(bar.getPrefWidth());
        bar.setVisible(true);
        bar.pseudoClassStateChanged(javafx.css.PseudoClass.getPseudoClass("largest"), s >= max - 1e-12);
      } else {
        step.setText(i == 0 && !steps.isEmpty() ? "start" : "");
        bar.setVisible(false);
      }
      setGraphic(box);
    }
  }
}
