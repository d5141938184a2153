package org.morphscout.app.gui.chains;

import java.io.File;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javafx.beans.property.ObjectProperty;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.MenuItem;
import javafx.scene.control.Slider;
import javafx.scene.control.Spinner;
import javafx.scene.control.Tooltip;
import javafx.scene.input.TransferMode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import org.morphscout.app.gui.common.ImageDrag;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.common.Tile;
import org.morphscout.app.gui.service.ChainCandidate;
import org.morphscout.app.gui.service.ChainStep;
import org.morphscout.indexer.values.ImageRow;

/** Endpoints, options, candidate chains as filmstrips, and a preview player. */
public final class ChainsView extends BorderPane {
  static final double TILE = 104;

  private final ChainsViewModel vm;
  private final Session session;
  private final ThumbnailCache thumbs;
  private final ListView<ChainCandidate> list = new ListView<>();
  // kept as fields: bidirectional bindings to asObject() wrappers are weak
  private final ObjectProperty<Integer> alternatives;
  private final ObjectProperty<Integer> minSteps;
  private final ObjectProperty<Integer> maxSteps;

  public ChainsView(ChainsViewModel vm, ThumbnailCache thumbs) {
    this.vm = vm;
    this.session = vm.session();
    this.thumbs = thumbs;
    this.alternatives = vm.alternativesProperty().asObject();
    this.minSteps = vm.minStepsProperty().asObject();
    this.maxSteps = vm.maxStepsProperty().asObject();
    getStyleClass().add("chains-view");

    HBox endpoints = new HBox(16, endpoint("Start", true), endpoint("End", false), options());
    endpoints.getStyleClass().add("toolbar");
    endpoints.setAlignment(Pos.CENTER_LEFT);
    setTop(new VBox(endpoints, constraints(), MessageLine.error(vm.messageProperty())));

    list.setId("chain-list");
    list.setItems(vm.chains());
    list.setCellFactory(l -> new ChainCell());
    list.setPlaceholder(new Label("Choose a start and an end, then Find chains (Ctrl+Enter)."));
    setCenter(list);
    setBottom(previewBar());
  }

  private VBox endpoint(String label, boolean start) {
    ObjectProperty<ImageRow> prop = start ? vm.startProperty() : vm.endProperty();
    Tile tile = new Tile(TILE);
    tile.setVisible(true);
    Label caption = new Label(label);
    caption.getStyleClass().add("slot-heading");
    Runnable refresh = () -> {
      ImageRow r = prop.get();
      if (r == null) {
        tile.show(null, null, null, thumbs);
        tile.setVisible(true);
        tile.caption().setText("drop an image here");
      } else {
        tile.show(r, session.name(r.id()), null, thumbs);
      }
    };
    prop.addListener((o, a, b) -> refresh.run());
    refresh.run();
    Button file = new Button("From file…");
    file.setId(start ? "start-file" : "end-file");
    file.setOnAction(e -> {
      FileChooser fc = new FileChooser();
      fc.setTitle("Choose the " + label.toLowerCase(Locale.ROOT) + " image");
      File f = fc.showOpenDialog(getScene().getWindow());
      if (f != null) {
        vm.setEndpoint(f.toPath(), start);
      }
    });
    VBox slot = new VBox(4, caption, tile, file);
    slot.setId(start ? "start-slot" : "end-slot");
    slot.getStyleClass().add("drop-slot");
    slot.setAlignment(Pos.TOP_CENTER);
    slot.setOnDragOver(e -> {
      if (ImageDrag.accepts(e.getDragboard())) {
        e.acceptTransferModes(TransferMode.COPY);
      }
      e.consume();
    });
    slot.setOnDragDropped(e -> {
      var db = e.getDragboard();
      var id = ImageDrag.id(db);
      if (id.isPresent()) {
        vm.setEndpoint(id.getAsLong(), start);
      } else {
        ImageDrag.file(db).ifPresent(p -> vm.setEndpoint(p, start));
      }
      e.setDropCompleted(true);
      e.consume();
    });
    return slot;
  }

  private VBox options() {
    Spinner<Integer> alt = new Spinner<>(1, 20, vm.alternativesProperty().get());
    alt.getValueFactory().valueProperty().bindBidirectional(alternatives);
    Spinner<Integer> min = new Spinner<>(1, 50, vm.minStepsProperty().get());
    min.getValueFactory().valueProperty().bindBidirectional(minSteps);
    Spinner<Integer> max = new Spinner<>(1, 50, vm.maxStepsProperty().get());
    max.getValueFactory().valueProperty().bindBidirectional(maxSteps);
    for (Spinner<Integer> s : List.of(alt, min, max)) {
      s.setPrefWidth(76);
      s.setEditable(true);
    }
    alt.setId("alternatives");
    alt.setTooltip(new Tooltip("How many chains to find, as chain --count"));
    min.setId("min-steps");
    max.setId("max-steps");
    Slider weight = new Slider(0, 1, vm.shapeWeightProperty().get());
    weight.setId("shape-weight");
    weight.valueProperty().bindBidirectional(vm.shapeWeightProperty());
    weight.setPrefWidth(160);
    weight.setTooltip(new Tooltip("0 = only appearance counts, 1 = only shape counts"));
    HBox row1 = new HBox(8, new Label("Chains"), alt, new Label("Steps from"), min, new Label("to"), max);
    row1.setAlignment(Pos.CENTER_LEFT);
    HBox row2 = new HBox(8, new Label("Appearance"), weight, new Label("Shape"));
    row2.setAlignment(Pos.CENTER_LEFT);
    Button run = new Button("Find chains");
    run.setId("run-chains");
    run.getStyleClass().add("primary");
    run.setTooltip(new Tooltip("Find chains (Ctrl+Enter)"));
    run.setOnAction(e -> vm.run());
    run.disableProperty().bind(vm.canRunProperty().not());
    Button cancel = new Button("Cancel");
    cancel.setOnAction(e -> vm.cancel());
    cancel.disableProperty().bind(vm.runningProperty().not());
    Button swap = new Button("Swap start and end");
    swap.setOnAction(e -> vm.swap());
    Label info = new Label();
    info.getStyleClass().add("summary");
    info.textProperty().bind(vm.infoProperty());
    HBox row3 = new HBox(8, run, cancel, swap, info);
    row3.setAlignment(Pos.CENTER_LEFT);
    VBox box = new VBox(10, row1, row2, row3);
    box.setPadding(new Insets(0, 0, 0, 12));
    return box;
  }

  private FlowPane constraints() {
    FlowPane chips = new FlowPane(6, 6);
    chips.getStyleClass().add("constraints");
    chips.setPadding(new Insets(4, 10, 4, 10));
    Runnable fill = () -> {
      chips.getChildren().clear();
      for (ImageRow r : vm.avoided()) {
        chips.getChildren().add(chip("avoid " + session.name(r.id()), "chip-avoid"));
      }
      for (ImageRow r : vm.required()) {
        chips.getChildren().add(chip("require " + session.name(r.id()), "chip-require"));
      }
      if (!chips.getChildren().isEmpty()) {
        Button clear = new Button("Clear constraints");
        clear.setOnAction(e -> vm.clearConstraints());
        chips.getChildren().add(clear);
      }
    };
    vm.avoided().addListener((ListChangeListener<ImageRow>) c -> fill.run());
    vm.required().addListener((ListChangeListener<ImageRow>) c -> fill.run());
    chips.visibleProperty().bind(javafx.beans.binding.Bindings.isNotEmpty(chips.getChildren()));
    chips.managedProperty().bind(chips.visibleProperty());
    return chips;
  }

  private static Label chip(String text, String style) {
    Label l = new Label(text);
    l.getStyleClass().addAll("chip", style);
    return l;
  }

  private PreviewPlayer previewBar() {
    PreviewPlayer bar = new PreviewPlayer("Preview along the chain (a quick warp and cross-fade, not a final render)");
    bar.visibleProperty().bind(vm.previewProperty().isNotNull());
    bar.managedProperty().bind(bar.visibleProperty());
    vm.previewProperty().addListener((o, a, f) -> bar.play(f));
    return bar;
  }

  /** A chain as a filmstrip: tiles with the step's size between them. */
  private final class ChainCell extends ListCell<ChainCandidate> {
    @Override
    protected void updateItem(ChainCandidate c, boolean empty) {
      super.updateItem(c, empty);
      if (empty || c == null) {
        setGraphic(null);
        return;
      }
      Label head = new Label(String.format(Locale.ROOT, "Chain %d · %d steps · largest step %.4f · unevenness %.2f",
          getIndex() + 1, c.steps().size(), c.maxStep(), c.evenness()));
      head.setTooltip(new Tooltip("Unevenness: coefficient of variation of the step costs (0 = every step costs the "
          + "same), as chain reports it"));
      head.getStyleClass().add("chain-heading");
      Button preview = new Button("Preview");
      preview.getStyleClass().add("small");
      preview.setOnAction(e -> vm.preview(c));
      Region spacer = new Region();
      HBox.setHgrow(spacer, Priority.ALWAYS);
      HBox header = new HBox(10, head, spacer, preview);
      header.setAlignment(Pos.CENTER_LEFT);
      HBox strip = new HBox(4);
      strip.setAlignment(Pos.CENTER_LEFT);
      for (int i = 0; i < c.images().size(); i++) {
        long id = c.images().get(i);
        Tile t = new Tile(TILE);
        ImageRow row = session.row(id).orElse(null);
        if (row != null) {
          t.show(row, session.name(id), null, thumbs);
          t.setOnContextMenuRequested(e -> menu(row).show(t, e.getScreenX(), e.getScreenY()));
          t.setOnMouseClicked(e -> session.selectedProperty().set(row));
        }
        strip.getChildren().add(t);
        if (i < c.steps().size()) {
          strip.getChildren().add(stepLabel(c.steps().get(i), c.maxStep()));
        }
      }
      javafx.scene.control.ScrollPane scroll = new javafx.scene.control.ScrollPane(strip);
      scroll.setFitToHeight(true);
      scroll.setVbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
      scroll.getStyleClass().add("filmstrip");
      setGraphic(new VBox(6, header, scroll));
    }

    private VBox stepLabel(ChainStep s, double max) {
      // four decimals, as chain prints them, so neighbouring steps differ
      Label cost = new Label(String.format(Locale.ROOT, "step cost %.4f", s.cost()));
      cost.getStyleClass().add("step-cost");
      if (s.cost() >= max - 1e-12) {
        cost.getStyleClass().add("step-largest");
      }
      StringBuilder tip = new StringBuilder("Step cost from the image before to the image after: "
          + String.format(Locale.ROOT, "%.4f", s.cost()));
      VBox box = new VBox(2, cost);
      for (Map.Entry<String, Double> e : s.components().entrySet()) {
        tip.append('\n').append(e.getKey()).append(": ").append(String.format(Locale.ROOT, "%.4f", e.getValue()));
        Label part = new Label(String.format(Locale.ROOT, e.getKey().equals("score") ? "%s %.1f" : "%s %.2f",
            abbreviate(e.getKey()), e.getValue()));
        part.getStyleClass().add("step-part");
        box.getChildren().add(part);
      }
      Tooltip.install(box, new Tooltip(tip.toString()));
      box.setAlignment(Pos.CENTER);
      box.getStyleClass().add("step");
      return box;
    }

    private ContextMenu menu(ImageRow row) {
      MenuItem avoid = new MenuItem("Avoid this image and search again");
      avoid.setOnAction(e -> vm.avoid(row));
      MenuItem require = new MenuItem("Require this image and search again");
      require.setOnAction(e -> vm.require(row));
      return new ContextMenu(avoid, require);
    }
  }

  /** A step part's short label under the step cost; the tooltip gives the full key. */
  static String abbreviate(String component) {
    return switch (component) {
      case "appearanceDistance" -> "appearance dist.";
      case "shapeDistance" -> "shape dist.";
      case "colourGap" -> "colour gap";
      case "score" -> "pair score";
      default -> component;
    };
  }
}
