package org.morphscout.app.gui.library;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.TextField;
import javafx.scene.input.MouseButton;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.morphscout.app.gui.common.ImageDrag;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageRow;

/**
 * The thumbnail grid. Virtualised: a {@link ListView} whose items are rows of images, so only the rows on screen
 * exist as nodes (a dozen rows of tiles whether the library holds 100 or 100,000 images).
 */
public final class LibraryView extends BorderPane {
  static final double TILE = 132;
  static final double GAP = 10;

  private final LibraryViewModel vm;
  private final Session session;
  private final ThumbnailCache thumbs;
  private final ListView<List<ImageRow>> grid = new ListView<>();
  private final ObservableList<List<ImageRow>> rows = FXCollections.observableArrayList();
  private int columns = 1;
  private int anchor = -1;

  public LibraryView(LibraryViewModel vm, ThumbnailCache thumbs) {
    this.vm = vm;
    this.session = vm.session();
    this.thumbs = thumbs;
    getStyleClass().add("library-view");
    setTop(new VBox(toolbar(), searchBar(), MessageLine.error(vm.messageProperty())));
    grid.setId("library-grid");
    grid.getStyleClass().add("tile-grid");
    grid.setItems(rows);
    grid.setFixedCellSize(TILE + 34);
    grid.setCellFactory(lv -> new RowCell());
    grid.setPlaceholder(new Label("No images to show. Open a catalog (Catalog ▸ Open a catalog folder…) or loosen the filters."));
    grid.widthProperty().addListener((o, a, w) -> relayout());
    vm.visible().addListener((ListChangeListener<ImageRow>) c -> relayout());
    session.selection().addListener((ListChangeListener<ImageRow>) c -> grid.refresh());
    grid.setOnKeyPressed(e -> {
      int step = switch (e.getCode()) {
        case LEFT -> -1;
        case RIGHT -> 1;
        case UP -> -columns;
        case DOWN -> columns;
        default -> 0;
      };
      if (step != 0) {
        moveSelection(step);
        e.consume();
      }
    });
    setCenter(grid);
  }

  private VBox toolbar() {
    ComboBox<Folder> root = new ComboBox<>();
    root.setId("root-filter");
    ObservableList<Folder> items = FXCollections.observableArrayList();
    Runnable fill = () -> {
      List<Folder> all = new ArrayList<>();
      all.add(null);
      all.addAll(vm.roots());
      items.setAll(all);
    };
    vm.roots().addListener((ListChangeListener<Folder>) c -> fill.run());
    fill.run();
    root.setItems(items);
    root.setConverter(new StringConverter<>() {
      @Override
      public String toString(Folder r) {
        return LibraryViewModel.rootLabel(r);
      }

      @Override
      public Folder fromString(String s) {
        return null;
      }
    });
    root.setButtonCell(new ListCell<>() {
      @Override
      protected void updateItem(Folder r, boolean empty) {
        super.updateItem(r, empty);
        setText(LibraryViewModel.rootLabel(r));
      }
    });
    root.valueProperty().bindBidirectional(vm.rootProperty());
    root.setPrefWidth(180);

    TextField folder = new TextField();
    folder.setId("folder-filter");
    folder.setPromptText("Folder contains…");
    folder.textProperty().bindBidirectional(vm.folderProperty());
    folder.setPrefColumnCount(12);

    HBox findingBoxes = new HBox(8);
    findingBoxes.setAlignment(Pos.CENTER_LEFT);
    for (ImageFinding f : ImageFinding.values()) {
      CheckBox box = new CheckBox(f.label());
      box.setId("finding-" + f.name().toLowerCase(java.util.Locale.ROOT));
      box.selectedProperty().bindBidirectional(vm.findingProperty(f));
      findingBoxes.getChildren().add(box);
    }

    ComboBox<SortKey> sort = new ComboBox<>(FXCollections.observableArrayList(SortKey.values()));
    sort.setId("sort");
    sort.valueProperty().bindBidirectional(vm.sortProperty());

    ProgressIndicator busy = new ProgressIndicator();
    busy.setPrefSize(18, 18);
    busy.visibleProperty().bind(vm.busyProperty().or(vm.searchingProperty()));
    Label summary = new Label();
    summary.getStyleClass().add("summary");
    summary.textProperty().bind(vm.summaryProperty());
    Region spacer = new Region();
    HBox.setHgrow(spacer, Priority.ALWAYS);
    javafx.scene.control.MenuButton byFile = new javafx.scene.control.MenuButton("Similar to a file…");
    byFile.setId("similar-file");
    for (SimilarityMode mode : SimilarityMode.values()) {
      MenuItem item = new MenuItem("… in " + mode.label());
      item.setOnAction(e -> {
        javafx.stage.FileChooser fc = new javafx.stage.FileChooser();
        fc.setTitle("Find catalog images similar in " + mode.label() + " to a file");
        java.io.File f = fc.showOpenDialog(getScene().getWindow());
        if (f != null) {
          vm.findSimilarToFile(f.toPath(), mode);
        }
      });
      byFile.getItems().add(item);
    }
    HBox top = new HBox(10, root, folder, new Label("Sort by"), sort, byFile, spacer, busy, summary);
    top.setAlignment(Pos.CENTER_LEFT);
    Label only = new Label("Show only findings:");
    only.getStyleClass().add("summary");
    findingBoxes.getChildren().add(0, only);
    VBox bar = new VBox(8, top, findingBoxes);
    bar.getStyleClass().add("toolbar");
    for (javafx.scene.Node n : List.of(summary, sort, only, byFile)) {
      ((Region) n).setMinWidth(Region.USE_PREF_SIZE);
    }
    return bar;
  }

  private HBox searchBar() {
    Label title = new Label();
    title.getStyleClass().add("search-title");
    title.textProperty().bind(vm.searchTitleProperty());
    Button clear = new Button("Show all images");
    clear.setId("clear-search");
    clear.setOnAction(e -> vm.clearSimilar());
    HBox bar = new HBox(10, title, clear);
    bar.getStyleClass().add("search-bar");
    bar.setAlignment(Pos.CENTER_LEFT);
    bar.setPadding(new Insets(4, 10, 4, 10));
    bar.visibleProperty().bind(Bindings.isNotEmpty(vm.searchTitleProperty()));
    bar.managedProperty().bind(bar.visibleProperty());
    return bar;
  }

  private void relayout() {
    double width = grid.getWidth() - 24; // room for the scroll bar
    int c = TileRows.columns(Math.max(width, TILE), TILE, GAP);
    columns = c;
    rows.setAll(TileRows.split(vm.visible(), c));
  }

  private void moveSelection(int step) {
    List<ImageRow> v = vm.visible();
    if (v.isEmpty()) {
      return;
    }
    int i = v.indexOf(session.selectedProperty().get());
    int next = i < 0 ? 0 : Math.max(0, Math.min(v.size() - 1, i + step));
    select(v.get(next), false, false);
    grid.scrollTo(Math.max(0, next / columns - 1));
  }

  /** Plain click selects one image; Ctrl toggles it in the selection; Shift selects a range from the anchor. */
  void select(ImageRow row, boolean toggle, boolean range) {
    List<ImageRow> v = vm.visible();
    int index = v.indexOf(row);
    if (range && anchor >= 0 && anchor < v.size() && index >= 0) {
      int from = Math.min(anchor, index);
      int to = Math.max(anchor, index);
      session.selection().setAll(v.subList(from, to + 1));
    } else if (toggle) {
      if (!session.selection().remove(row)) {
        session.selection().add(row);
      }
      anchor = index;
    } else {
      session.selection().setAll(row);
      anchor = index;
    }
    session.selectedProperty().set(row);
  }

  private ContextMenu menu(ImageRow row) {
    MenuItem start = new MenuItem("Use as start\tS");
    start.setOnAction(e -> session.startProperty().set(row));
    MenuItem end = new MenuItem("Use as end\tE");
    end.setOnAction(e -> session.endProperty().set(row));
    MenuItem look = new MenuItem("Find similar in appearance\tCtrl+F");
    look.setOnAction(e -> vm.findSimilar(row, SimilarityMode.APPEARANCE));
    MenuItem shape = new MenuItem("Find similar in shape\tCtrl+Shift+F");
    shape.setOnAction(e -> vm.findSimilar(row, SimilarityMode.SHAPE));
    MenuItem partners = new MenuItem("Find partners\tP");
    partners.setOnAction(e -> {
      session.partnersRequestProperty().set(null);
      session.partnersRequestProperty().set(row);
    });
    return new ContextMenu(start, end, look, shape, partners);
  }

  /** One row of tiles; its tiles are reused as the row scrolls in and out. */
  private final class RowCell extends ListCell<List<ImageRow>> {
    private final HBox box = new HBox(GAP);
    private final List<Tile> tiles = new ArrayList<>();

    RowCell() {
      getStyleClass().add("tile-row");
      box.setPadding(new Insets(4, 6, 4, 6));
    }

    @Override
    protected void updateItem(List<ImageRow> items, boolean empty) {
      super.updateItem(items, empty);
      if (empty || items == null) {
        setGraphic(null);
        return;
      }
      while (tiles.size() < items.size()) {
        Tile t = new Tile(TILE);
        wire(t);
        tiles.add(t);
        box.getChildren().add(t);
      }
      Set<Long> selected = new HashSet<>();
      session.selection().forEach(r -> selected.add(r.id()));
      for (int i = 0; i < tiles.size(); i++) {
        Tile t = tiles.get(i);
        ImageRow r = i < items.size() ? items.get(i) : null;
        t.setUserData(r);
        if (r == null) {
          t.show(null, null, null, thumbs);
          continue;
        }
        t.show(r, caption(r), note(r), thumbs);
        t.setSelected(selected.contains(r.id()));
      }
      setGraphic(box);
    }

    private String caption(ImageRow r) {
      double d = vm.distance(r.id());
      String name = java.nio.file.Path.of(r.path()).getFileName().toString();
      // the distance as similar prints it (4 decimals: outlines of one kind lie within a few thousandths)
      return Double.isNaN(d) ? name : String.format(java.util.Locale.ROOT, "%.4f · %s", d, name);
    }

    private Tile.Note note(ImageRow r) {
      return LibraryView.note(vm.findings(r.id()));
    }

    private void wire(Tile t) {
      t.setOnMouseClicked(e -> {
        if (t.getUserData() instanceof ImageRow r && e.getButton() == MouseButton.PRIMARY) {
          select(r, e.isShortcutDown(), e.isShiftDown());
          grid.requestFocus();
        }
      });
      t.setOnContextMenuRequested(e -> {
        if (t.getUserData() instanceof ImageRow r) {
          select(r, false, false);
          menu(r).show(t, e.getScreenX(), e.getScreenY());
        }
      });
      t.setOnDragDetected(e -> {
        if (t.getUserData() instanceof ImageRow r) {
          var db = t.startDragAndDrop(TransferMode.COPY);
          db.setContent(ImageDrag.content(r.id(), r.path()));
          e.consume();
        }
      });
    }
  }

  /**
   * A tile's note: the most important finding (the enum's order) in a word or two, every finding in the tooltip;
   * null when nothing was found.
   */
  static Tile.Note note(Set<ImageFinding> findings) {
    if (findings.isEmpty()) {
      return null;
    }
    ImageFinding first = findings.stream().min(java.util.Comparator.naturalOrder()).orElseThrow();
    String kind = switch (first) {
      case MISSING -> "missing";
      case FAILED -> "failed";
      case UNCERTAIN -> "uncertain";
      default -> "other";
    };
    String text = first == ImageFinding.UNCERTAIN ? "uncertain" : first.label();
    String detail = "Found: " + String.join(", ", findings.stream().sorted().map(ImageFinding::label).toList());
    return new Tile.Note(findings.size() > 1 ? text + " +" + (findings.size() - 1) : text, kind, detail);
  }

  /** For keyboard focus from the main window. */
  public void focusGrid() {
    grid.requestFocus();
  }

}
