package org.morphscout.app.gui.indexing;

import java.io.File;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.indexer.text.HumanTime;
import org.morphscout.indexer.values.ImageFailure;

/** Add a folder, watch progress, cancel; failures with their reasons below. */
public final class IndexingView extends BorderPane {

  public IndexingView(IndexingViewModel vm) {
    getStyleClass().add("indexing-view");
    Button add = new Button("Add folder…");
    add.setId("add-folder");
    add.getStyleClass().add("primary");
    add.setOnAction(e -> {
      DirectoryChooser dc = new DirectoryChooser();
      dc.setTitle("Choose a folder of images to add");
      File f = dc.showDialog(getScene().getWindow());
      if (f != null) {
        vm.add(f.toPath());
      }
    });
    add.disableProperty().bind(vm.runningProperty());
    Button cancel = new Button("Cancel");
    cancel.setId("cancel-indexing");
    cancel.setOnAction(e -> vm.cancel());
    cancel.disableProperty().bind(vm.runningProperty().not());
    ProgressBar bar = new ProgressBar();
    bar.setId("indexing-progress");
    bar.progressProperty().bind(vm.progressProperty());
    bar.setMaxWidth(Double.MAX_VALUE);
    HBox.setHgrow(bar, Priority.ALWAYS);
    Label phase = new Label();
    phase.textProperty().bind(vm.phaseProperty());
    Label item = new Label();
    item.getStyleClass().add("summary");
    item.textProperty().bind(vm.itemProperty());
    Label summary = new Label();
    summary.getStyleClass().add("search-title");
    summary.textProperty().bind(vm.summaryProperty());
    for (Label l : java.util.List.of(phase, item, summary)) {
      l.visibleProperty().bind(l.textProperty().isNotEmpty());
      l.managedProperty().bind(l.visibleProperty());
    }
    Label explain = new Label("Adds a folder (and its subfolders) to the catalog and analyses every image in it. "
        + "Finished images are kept when you cancel; files that cannot be read are listed below with the reason.");
    explain.setWrapText(true);
    explain.getStyleClass().add("summary");
    HBox controls = new HBox(10, add, cancel, bar);
    controls.setAlignment(Pos.CENTER_LEFT);
    VBox top = new VBox(8, explain, controls, phase, item, summary, MessageLine.error(vm.messageProperty()));
    top.getStyleClass().add("toolbar");
    top.setPadding(new Insets(12));
    setTop(top);

    TableView<ImageFailure> failures = new TableView<>(vm.failures());
    failures.setId("failures");
    failures.setPlaceholder(new Label("No failures: every file found so far could be read."));
    TableColumn<ImageFailure, String> path = new TableColumn<>("File");
    path.setCellValueFactory(c -> new ReadOnlyStringWrapper(c.getValue().path()));
    path.setPrefWidth(420);
    path.setCellFactory(c -> new javafx.scene.control.TableCell<>() {
      @Override
      protected void updateItem(String p, boolean empty) {
        super.updateItem(p, empty);
        setText(empty ? null : p);
        setTextOverrun(javafx.scene.control.OverrunStyle.LEADING_ELLIPSIS); // a long path keeps its file name
      }
    });
    TableColumn<ImageFailure, String> reason = new TableColumn<>("Why it failed");
    reason.setCellValueFactory(c -> new ReadOnlyStringWrapper(c.getValue().reason()));
    reason.setPrefWidth(420);
    TableColumn<ImageFailure, String> when = new TableColumn<>("When");
    when.setCellValueFactory(c -> new ReadOnlyStringWrapper(HumanTime.localIso(c.getValue().failedAt())));
    when.setPrefWidth(130);
    failures.getColumns().setAll(java.util.List.of(path, reason, when));
    // the inspector follows the selected failure
    failures.getSelectionModel().selectedItemProperty().addListener((o, a, f) -> vm.inspect(f));
    failures.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
    Label heading = new Label("Failures");
    heading.getStyleClass().add("pane-heading");
    VBox center = new VBox(6, heading, failures);
    VBox.setVgrow(failures, Priority.ALWAYS);
    center.setPadding(new Insets(0, 12, 12, 12));
    setCenter(center);
  }
}
