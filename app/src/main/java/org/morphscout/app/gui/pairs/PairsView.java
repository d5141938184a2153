package org.morphscout.app.gui.pairs;

import java.io.File;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
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
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;
import javafx.stage.FileChooser;
import org.morphscout.app.gui.common.MaskImages;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.PairVerdict;
import org.morphscout.indexer.pairing.PairComponent;

/**
 * Suggested pairs in a sortable table beside the chosen pair's images, aligned silhouettes and reasons. At the
 * window's default size the table shows a few columns whole, without scrolling sideways; the others (every sub-score,
 * the reasons) are a click away in the table's column menu (the button right of the headers).
 */
public final class PairsView extends BorderPane {
  /**
   * Sub-score columns shown until the user picks others from the column menu: how well the outlines match and how
   * far the warp must move them, the two a morph depends on most (more do not fit the default window's width).
   */
  static final Set<String> SHOWN_BY_DEFAULT = Set.of(PairComponent.SILHOUETTE_MATCH.key(),
      PairComponent.WARP_EFFORT.key());
  /** Header font as the style sheet sets it (morphscout.css: 13 px, bold), to size columns to their titles. */
  private static final Font HEADER_FONT = Font.font("System", FontWeight.BOLD, 13);
  /** Room beside a title for the header's padding and the sort arrow, in pixels. */
  private static final double HEADER_ROOM = 28;
  /** Room taken by the table's border and its vertical scroll bar, in pixels. */
  private static final double TABLE_CHROME = 20;

  private final PairsViewModel vm;
  private final Session session;
  private final ThumbnailCache thumbs;
  private final TableView<PairRow> table = new TableView<>();
  private final List<String> componentColumns = new ArrayList<>();
  /** Column title -> shown, as the user last chose in the column menu (kept when the columns are rebuilt). */
  private final Map<String, Boolean> chosen = new HashMap<>();
  private TableColumn<PairRow, String> second;
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
    table.setTableMenuButtonVisible(true); // the column chooser
    table.widthProperty().addListener((o, a, b) -> fillWidth());
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

  private VBox toolbar() {
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
    // buttons keep their whole labels at the default window size; the scope title and the line of the last decision
    // below give way (with an ellipsis) when the pane is narrow
    for (Button b : List.of(library, selected, refresh, cancel, export)) {
      b.setMinWidth(Region.USE_PREF_SIZE);
    }
    scope.setMinWidth(80);
    HBox bar = new HBox(10, scope, library, selected, refresh, cancel, busy, spacer, export);
    bar.setAlignment(Pos.CENTER_LEFT);
    info.visibleProperty().bind(info.textProperty().isNotEmpty());
    info.managedProperty().bind(info.visibleProperty());
    VBox box = new VBox(4, bar, info);
    box.getStyleClass().add("toolbar");
    return box;
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
    cols.add(text("First", r -> r.nameA(), 90));
    second = text("Second", r -> r.nameB(), 104);
    cols.add(second);
    TableColumn<PairRow, Number> score = number("Score", r -> r.suggestion().score());
    cols.add(score);
    for (String k : keys) {
      TableColumn<PairRow, Number> col = number(header(k), r -> r.suggestion().components().getOrDefault(k,
          Double.NaN));
      col.setUserData(k);
      col.setVisible(SHOWN_BY_DEFAULT.contains(k));
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
    fitTitle(verdict);
    cols.add(verdict);
    TableColumn<PairRow, String> decision = new TableColumn<>("Decision");
    decision.setCellValueFactory(c -> c.getValue().decisionProperty());
    fitTitle(decision);
    cols.add(decision);
    TableColumn<PairRow, String> reasons = text("Reasons", r -> String.join("; ", r.suggestion().reasons()), 300);
    reasons.setVisible(false); // shown whole beside the table, for the selected pair
    cols.add(reasons);
    for (TableColumn<PairRow, ?> c : cols) {
      c.setVisible(chosen.getOrDefault(c.getText(), c.isVisible()));
      c.visibleProperty().addListener((o, was, now) -> {
        chosen.put(c.getText(), now);
        fillWidth();
      });
    }
    table.getColumns().setAll(cols);
    fillWidth();
    table.getSortOrder().setAll(score);
    score.setSortType(TableColumn.SortType.DESCENDING);
  }

  private static TableColumn<PairRow, String> text(String title, java.util.function.Function<PairRow, String> f,
      double width) {
    TableColumn<PairRow, String> c = new TableColumn<>(title);
    c.setCellValueFactory(d -> new ReadOnlyStringWrapper(f.apply(d.getValue())));
    c.setCellFactory(col -> new TableCell<>() {
      @Override
      protected void updateItem(String s, boolean empty) {
        super.updateItem(s, empty);
        setText(empty ? null : s);
        // a cut name keeps its start and its number: jug-ce…-035.jpg
        setTextOverrun(javafx.scene.control.OverrunStyle.CENTER_ELLIPSIS);
      }
    });
    fitTitle(c);
    c.setPrefWidth(Math.max(width, c.getMinWidth()));
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
    fitTitle(c);
    c.getStyleClass().add("numeric");
    return c;
  }

  /** Makes {@code c} wide enough for its whole title and a sort arrow, and never narrower. */
  private static void fitTitle(TableColumn<PairRow, ?> c) {
    Text t = new Text(c.getText());
    t.setFont(HEADER_FONT);
    double width = Math.ceil(t.getLayoutBounds().getWidth()) + HEADER_ROOM;
    c.setMinWidth(width);
    c.setPrefWidth(width);
  }

  /**
   * Gives the Second column (the partners' names, the longest cells) the width the other shown columns leave, so
   * the table fills its width without a sideways scroll bar until the user shows more columns than fit.
   */
  private void fillWidth() {
    if (second == null || table.getWidth() <= 0) {
      return;
    }
    double others = 0;
    for (TableColumn<PairRow, ?> c : table.getColumns()) {
      if (c != second && c.isVisible()) {
        others += c.getWidth() > 0 ? c.getWidth() : c.getPrefWidth();
      }
    }
    second.setPrefWidth(Math.max(second.getMinWidth(), table.getWidth() - TABLE_CHROME - others));
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
    Label reasons = new Label();
    reasons.setId("pair-reasons");
    reasons.setWrapText(true);
    reasons.setMaxWidth(Double.MAX_VALUE);
    reasons.getStyleClass().add("summary");
    a.setOnMouseClicked(e -> inspect(vm.selectedProperty().get(), true));
    b.setOnMouseClicked(e -> inspect(vm.selectedProperty().get(), false));
    vm.selectedProperty().addListener((o, x, r) -> {
      reasons.setText(r == null ? "" : r.suggestion().reasons().isEmpty() ? "No reasons against this pair."
          : "Why " + r.suggestion().verdict().name().toLowerCase(Locale.ROOT) + ": "
              + String.join("; ", r.suggestion().reasons()) + ".");
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
    VBox box = new VBox(10, both, overlay, iou, legend, reasons, actions, note);
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
