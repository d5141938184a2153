package org.morphscout.app.gui.inspector;

import javafx.beans.binding.Bindings;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.Tooltip;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import org.morphscout.app.gui.common.MaskImages;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.indexer.values.ImageRow;

/** The selected image, larger, with its silhouette overlay, facts and actions. */
public final class InspectorView extends ScrollPane {
  static final double IMAGE = 300;

  private final InspectorViewModel vm;
  private final ImageView picture = new ImageView();
  private final ImageView silhouette = new ImageView();
  private final GridPane facts = new GridPane();
  private final HBox swatches = new HBox(6);

  public InspectorView(InspectorViewModel vm, Session session) {
    this.vm = vm;
    getStyleClass().add("inspector");
    setId("inspector");
    setFitToWidth(true);
    setHbarPolicy(ScrollBarPolicy.NEVER);
    Label heading = new Label("Inspector");
    heading.getStyleClass().add("pane-heading");
    Label title = new Label();
    title.getStyleClass().add("inspector-title");
    title.textProperty().bind(vm.titleProperty());
    title.setWrapText(true);

    // the picture follows the inspector's width (the divider can be moved), up to twice the default size
    var side = javafx.beans.binding.Bindings.createDoubleBinding(() -> Math.max(120, Math.min(IMAGE * 2,
        getViewportBounds().getWidth() - 40)), viewportBoundsProperty());
    picture.fitWidthProperty().bind(side);
    picture.fitHeightProperty().bind(side);
    picture.setPreserveRatio(true);
    silhouette.fitWidthProperty().bind(side);
    silhouette.fitHeightProperty().bind(side);
    silhouette.setPreserveRatio(true);
    silhouette.setSmooth(false);
    silhouette.visibleProperty().bind(vm.overlayProperty().and(vm.maskProperty().isNotNull()));
    StackPane stage = new StackPane(picture, silhouette);
    stage.getStyleClass().add("inspector-image");
    stage.minHeightProperty().bind(side.add(12));
    vm.fileProperty().addListener((o, a, f) -> show(f));
    // JavaFX decodes only BMP, GIF, JPEG and PNG: fall back to the catalog's thumbnail for other formats
    vm.thumbnailProperty().addListener((o, a, t) -> {
      if (t != null && picture.getImage() != null && picture.getImage().isError()) {
        picture.setImage(new Image(t.toUri().toString(), IMAGE * 2, IMAGE * 2, true, true, true));
      }
    });
    vm.maskProperty().addListener((o, a, m) -> silhouette.setImage(m == null ? null
        : MaskImages.overlay(m, Color.web("#0e8fa3"))));

    Label uncertain = new Label();
    uncertain.setId("uncertain-note");
    uncertain.getStyleClass().add("uncertain-note");
    uncertain.setWrapText(true);
    uncertain.setMaxWidth(Double.MAX_VALUE);
    uncertain.textProperty().bind(vm.uncertainProperty());
    uncertain.visibleProperty().bind(vm.uncertainProperty().isNotEmpty());
    uncertain.managedProperty().bind(uncertain.visibleProperty());

    ToggleButton overlay = new ToggleButton("Silhouette");
    overlay.setId("overlay-toggle");
    overlay.setTooltip(new Tooltip("Show the detected object over the image (Space)"));
    overlay.selectedProperty().bindBidirectional(vm.overlayProperty());
    overlay.disableProperty().bind(vm.maskProperty().isNull());

    Button start = button("Use as start", "use-start", "S", vm::useAsStart);
    Button end = button("Use as end", "use-end", "E", vm::useAsEnd);
    Button partners = button("Find partners", "find-partners", "P", vm::findPartners);
    Button look = button("Similar appearance", "similar-look", "Ctrl+F", () -> vm.findSimilar(SimilarityMode.APPEARANCE));
    Button shape = button("Similar shape", "similar-shape", "Ctrl+Shift+F",
        () -> vm.findSimilar(SimilarityMode.SHAPE));
    FlowPane actions = new FlowPane(6, 6, overlay, start, end, partners, look, shape);
    actions.disableProperty().bind(vm.imageProperty().isNull());

    Label endpoints = new Label();
    endpoints.getStyleClass().add("endpoints");
    endpoints.textProperty().bind(Bindings.createStringBinding(() -> "Start: " + name(session,
        session.startProperty().get()) + "    End: " + name(session, session.endProperty().get()),
        session.startProperty(), session.endProperty()));

    facts.getStyleClass().add("facts");
    facts.setHgap(10);
    facts.setVgap(4);
    vm.facts().addListener((ListChangeListener<Fact>) c -> fillFacts());
    vm.swatches().addListener((ListChangeListener<String>) c -> fillSwatches());

    VBox box = new VBox(10, heading, title, stage, uncertain, actions, endpoints, MessageLine.error(vm.messageProperty()),
        facts, swatches);
    box.setPadding(new Insets(12));
    box.setAlignment(Pos.TOP_LEFT);
    setContent(box);
  }

  private void show(java.nio.file.Path file) {
    if (file == null) {
      picture.setImage(null);
      return;
    }
    Image img = new Image(file.toUri().toString(), IMAGE * 2, IMAGE * 2, true, true, true);
    img.errorProperty().addListener((o, a, failed) -> {
      java.nio.file.Path t = vm.thumbnailProperty().get();
      if (failed && t != null && picture.getImage() == img) {
        picture.setImage(new Image(t.toUri().toString(), IMAGE * 2, IMAGE * 2, true, true, true));
      }
    });
    picture.setImage(img);
    java.nio.file.Path t = vm.thumbnailProperty().get();
    if (img.isError() && t != null) {
      picture.setImage(new Image(t.toUri().toString(), IMAGE * 2, IMAGE * 2, true, true, true));
    }
  }

  private static String name(Session s, ImageRow r) {
    return r == null ? "—" : s.name(r.id());
  }

  private static Button button(String text, String id, String key, Runnable action) {
    Button b = new Button(text);
    b.setId(id);
    b.setTooltip(new Tooltip(text + " (" + key + ")"));
    b.setOnAction(e -> action.run());
    return b;
  }

  private void fillFacts() {
    facts.getChildren().clear();
    int row = 0;
    for (Fact f : vm.facts()) {
      Label k = new Label(f.label());
      k.getStyleClass().add("fact-label");
      Label v = new Label(f.value());
      v.getStyleClass().add("fact-value");
      v.setWrapText(true);
      v.maxWidthProperty().bind(widthProperty().subtract(130));
      facts.addRow(row++, k, v);
    }
  }

  private void fillSwatches() {
    swatches.getChildren().clear();
    if (!vm.swatches().isEmpty()) {
      Label l = new Label("Dominant colours");
      l.getStyleClass().add("fact-label");
      swatches.getChildren().add(l);
    }
    for (String hex : vm.swatches()) {
      Region r = new Region();
      r.getStyleClass().add("swatch");
      r.setStyle("-fx-background-color: " + hex + ";");
      Tooltip.install(r, new Tooltip(hex));
      swatches.getChildren().add(r);
    }
  }
}
