package org.morphscout.app.gui.pairs;

import java.io.File;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.ListChangeListener;
import javafx.collections.transformation.SortedList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.image.ImageView;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import org.morphscout.app.gui.common.MaskImages;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.PairVerdict;
import org.morphscout.indexer.pairing.PairComponent;

/** Suggested pairs in a sortable table beside the chosen pair's images and aligned silhouettes. */
public final class PairsView extends BorderPane {
  private final PairsViewModel vm;
  private final Session session;
  private final ThumbnailCache thumbs;
  private final TableView<PairRow> table = new TableView<>();
  private final List<String> componentColumns = new ArrayList<>();
  private final TextField note = new TextField();

  public PairsView(PairsViewModel vm, ThumbnailCache thumbs) {
    this.vm = vm;
    this.session = vm.session();
    this.thumbs = thumbs;
    getStyleClass().add("pairs-view");
    setTop(new VBox(toolbar(), MessageLine.error(vm.messageProperty())));

    table.setId("pairs-table");
    SortedList<PairRow> sorted = new SortedList<>(vm.rows());
    sorted.comparatorProperty().bind(table.comparatorProperty());
    table.setItems(sorted);
    table.setPlaceholder(new Label("Suggest pairs for the whole library, or pick an image and press P."));
    table.setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
    table.setRowFactory(t -> new TableRow<>() {
      @Override
      protected void updateItem(PairRow r, boolean empty) {
        super.updateItem(r, empty);
        getStyleClass().removeAll("decided-approved", "decided-rejected");
        if (!empty && r != null && !r.decisionProperty().get().isEmpty()) {
          getStyleClass().add("decided-" + r.decisionProperty().get());
        }
      }
    });
    vm.rows().addListener((ListChangeListener<PairRow>) c -> columns());
    // a decision restyles its row; the view learns of it through the info line the view-model updates
    vm.infoProperty().addListener((o, a, b) -> table.refresh());
    columns();
    table.getSelectionModel().selectedItemProperty().addListener((o, a, r) -> {
      vm.selectedProperty().set(r);
      note.setText(r == null ? "" : r.noteProperty().get());
    });

    SplitPane split = new SplitPane(table, detail());
    split.setDividerPositions(0.73);
    setCenter(split);
  }

  private HBox toolbar() {
    Label scope = new Label();
    scope.getStyleClass().add("search-title");
    scope.textProperty().bind(vm.scopeProperty());
    Button library = new Button("Whole library");
    library.setId("pairs-library");
    library.setOnAction(e -> vm.showLibrary());
    Button selected = new Button("Partners of selected image");
    selected.setOnAction(e -> {
      if (session.selectedProperty().get() != null) {
        vm.showFor(session.selectedProperty().get());
      }
    });
    selected.disableProperty().bind(session.selectedProperty().isNull());
    Button refresh = new Button("Refresh");
    refresh.setOnAction(e -> vm.refresh());
    refresh.disableProperty().bind(vm.runningProperty());
    Button cancel = new Button("Cancel");
    cancel.setId("cancel-pairs");
    cancel.setOnAction(e -> vm.cancel());
    cancel.visibleProperty().bind(vm.runningProperty());
    cancel.managedProperty().bind(cancel.visibleProperty());
    javafx.scene.control.ProgressIndicator busy = new javafx.scene.control.ProgressIndicator();
    busy.setPrefSize(18, 18);
    busy.visibleProperty().bind(vm.runningProperty());
    busy.managedProperty().bind(busy.visibleProperty());
    Button export = new Button("Export approved…");
    export.setId("export-approved");
    export.setOnAction(e -> {
      FileChooser fc = new FileChooser();
      fc.setTitle("Export approved pairs");
      fc.getExtensionFilters().addAll(new FileChooser.ExtensionFilter("CSV", "*.csv"),
          new FileChooser.ExtensionFilter("JSON", "*.json"));
      fc.setInitialFileName("approved-pairs.csv");
      File f = fc.showSaveDialog(getScene().getWindow());
      if (f != null) {
        vm.exportApproved(f.toPath());
      }
    });
    Label info = new Label();
    info.getStyleClass().add("summary");
    info.textProperty().bind(vm.infoProperty());
    Region spacer = new Region();
    HBox.setHgrow(spacer, Priority.ALWAYS);
    HBox bar = new HBox(10, scope, library, selected, refresh, cancel, busy, spacer, info, export);
    bar.getStyleClass().add("toolbar");
    bar.setAlignment(Pos.CENTER_LEFT);
    return bar;
  }

  private void columns() {
    List<String> keys = vm.rows().isEmpty() ? List.of()
        : List.copyOf(vm.rows().get(0).suggestion().components().keySet());
    if (!table.getColumns().isEmpty() && keys.equals(componentColumns)) {
      return;
    }
    componentColumns.clear();
    componentColumns.addAll(keys);
    List<TableColumn<PairRow, ?>> cols = new ArrayList<>();
    cols.add(text("First", r -> r.nameA(), 104));
    cols.add(text("Second", r -> r.nameB(), 104));
    TableColumn<PairRow, Number> score = number("Score", r -> r.suggestion().score());
    cols.add(score);
    for (String k : keys) {
      TableColumn<PairRow, Number> col = number(header(k), r -> r.suggestion().components().getOrDefault(k,
          Double.NaN));
      col.setUserData(k);
      cols.add(col);
    }
    TableColumn<PairRow, PairVerdict> verdict = new TableColumn<>("Verdict");
    verdict.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue().suggestion().verdict()));
    verdict.setCellFactory(c -> new TableCell<>() {
      @Override
      protected void updateItem(PairVerdict v, boolean empty) {
        super.updateItem(v, empty);
        getStyleClass().removeAll("verdict-pass", "verdict-warn", "verdict-fail");
        setText(empty || v == null ? null : v.name().toLowerCase(Locale.ROOT));
        if (!empty && v != null) {
          getStyleClass().add("verdict-" + v.name().toLowerCase(Locale.ROOT));
        }
      }
    });
    verdict.setPrefWidth(62);
    cols.add(verdict);
    TableColumn<PairRow, String> decision = new TableColumn<>("Decision");
    decision.setCellValueFactory(c -> c.getValue().decisionProperty());
    decision.setPrefWidth(78);
    cols.add(decision);
    TableColumn<PairRow, String> reasons = text("Reasons", r -> String.join("; ", r.suggestion().reasons()), 300);
    cols.add(reasons);
    table.getColumns().setAll(cols);
    table.getSortOrder().setAll(score);
    score.setSortType(TableColumn.SortType.DESCENDING);
  }

  private static TableColumn<PairRow, String> text(String title, java.util.function.Function<PairRow, String> f,
      double width) {
    TableColumn<PairRow, String> c = new TableColumn<>(title);
    c.setCellValueFactory(d -> new ReadOnlyStringWrapper(f.apply(d.getValue())));
    c.setPrefWidth(width);
    return c;
  }

  private static TableColumn<PairRow, Number> number(String title, java.util.function.ToDoubleFunction<PairRow> f) {
    TableColumn<PairRow, Number> c = new TableColumn<>(title);
    c.setCellValueFactory(d -> new ReadOnlyObjectWrapper<>(f.applyAsDouble(d.getValue())));
    c.setCellFactory(col -> new TableCell<>() {
      @Override
      protected void updateItem(Number v, boolean empty) {
        super.updateItem(v, empty);
        setText(empty || v == null || Double.isNaN(v.doubleValue()) ? null
            : String.format(Locale.ROOT, Math.abs(v.doubleValue()) >= 10 ? "%.1f" : "%.2f", v.doubleValue()));
      }
    });
    // wide enough for the whole title and the sort arrow: titles are never cut at the default window size
    double titleWidth = 8.5 * title.length() + 26;
    c.setPrefWidth(Math.max(56, titleWidth));
    c.setMinWidth(Math.max(48, titleWidth));
    c.getStyleClass().add("numeric");
    return c;
  }

  /** Column headers of the sub-scores shown as numbers: each component's own title (see {@link PairComponent}). */
  static String header(String component) {
    return PairComponent.byKey(component).map(PairComponent::title).orElseGet(() -> {
      String h = component.length() > 10 ? component.substring(0, 10) : component;
      return h.isEmpty() ? h : Character.toUpperCase(h.charAt(0)) + h.substring(1);
    });
  }

  /** Shows the first (or second) image of {@code pair} in the inspector. */
  private void inspect(PairRow pair, boolean first) {
    if (pair != null) {
      session.row(first ? pair.suggestion().a() : pair.suggestion().b()).ifPresent(session.selectedProperty()::set);
    }
  }

  private VBox detail() {
    Tile a = new Tile(150);
    Tile b = new Tile(150);
    a.show(null, null, null, thumbs);
    b.show(null, null, null, thumbs);
    HBox both = new HBox(10, a, b);
    both.setAlignment(Pos.CENTER);
    ImageView overlay = new ImageView();
    overlay.setId("pair-overlay");
    overlay.setFitWidth(220);
    overlay.setFitHeight(220);
    overlay.setPreserveRatio(true);
    overlay.setSmooth(false);
    Label iou = new Label();
    iou.getStyleClass().add("summary");
    vm.overlayProperty().addListener((o, x, m) -> {
      overlay.setImage(m == null ? null : MaskImages.pair(m));
      iou.setText(m == null ? "" : String.format(Locale.ROOT, "Aligned IoU %.2f, as the reasons measure it",
          m.iou()));
    });
    Label legend = new Label("orange: first only · blue: second only · dark: both");
    legend.getStyleClass().add("legend");
    a.setOnMouseClicked(e -> inspect(vm.selectedProperty().get(), true));
    b.setOnMouseClicked(e -> inspect(vm.selectedProperty().get(), false));
    vm.selectedProperty().addListener((o, x, r) -> {
      a.show(r == null ? null : session.row(r.suggestion().a()).orElse(null), r == null ? null : r.nameA(), null,
          thumbs);
      b.show(r == null ? null : session.row(r.suggestion().b()).orElse(null), r == null ? null : r.nameB(), null,
          thumbs);
    });

    Button approve = new Button("Approve");
    approve.setId("approve");
    approve.getStyleClass().add("primary");
    approve.setTooltip(new Tooltip("Approve the pair (A)"));
    approve.setOnAction(e -> vm.approve(vm.selectedProperty().get()));
    Button reject = new Button("Reject");
    reject.setId("reject");
    reject.setTooltip(new Tooltip("Reject the pair (R)"));
    reject.setOnAction(e -> vm.reject(vm.selectedProperty().get()));
    Button forget = new Button("Clear decision");
    forget.setId("clear-decision");
    forget.setTooltip(new Tooltip("Clear your decision on the pair (as decide FIRST SECOND --clear does)"));
    forget.setOnAction(e -> vm.clearDecision(vm.selectedProperty().get()));
    note.setId("pair-note");
    note.setPromptText("Note (N), Enter to save");
    note.setOnAction(e -> vm.note(vm.selectedProperty().get(), note.getText()));
    HBox.setHgrow(note, Priority.ALWAYS);
    HBox actions = new HBox(8, approve, reject, forget);
    VBox box = new VBox(10, both, overlay, iou, legend, actions, note);
    box.disableProperty().bind(Bindings.isNull(vm.selectedProperty()));
    box.setAlignment(Pos.TOP_CENTER);
    box.setPadding(new Insets(12));
    box.getStyleClass().add("pair-detail");
    return box;
  }

  /** Approve / reject / note the selected pair from the keyboard (A, R, N). */
  public void approveSelected() {
    vm.approve(vm.selectedProperty().get());
    table.refresh();
  }

  public void rejectSelected() {
    vm.reject(vm.selectedProperty().get());
    table.refresh();
  }

  public void focusNote() {
    note.requestFocus();
  }

  /** Moves keyboard focus to the table (and selects its first row when none is). */
  public void focusTable() {
    table.requestFocus();
    if (table.getSelectionModel().isEmpty() && !table.getItems().isEmpty()) {
      table.getSelectionModel().select(0);
    }
  }
}
