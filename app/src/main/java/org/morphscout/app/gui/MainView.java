package org.morphscout.app.gui;

import java.io.File;
import java.util.EnumMap;
import java.util.Map;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.stage.DirectoryChooser;
import org.morphscout.app.gui.chains.ChainsView;
import org.morphscout.app.gui.common.MessageLine;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.indexing.IndexingView;
import org.morphscout.app.gui.inspector.InspectorView;
import org.morphscout.app.gui.library.LibraryView;
import org.morphscout.app.gui.pairs.PairsView;
import org.morphscout.app.gui.walk.WalkthroughView;

/** The window's content: menu, one tab per pane, the inspector beside them, and a status line. */
public final class MainView extends BorderPane {
  /** The stylesheet, from the classpath. */
  public static final String CSS = "/org/morphscout/app/gui/morphscout.css";

  private final MainViewModel vm;
  private final TabPane tabs = new TabPane();
  private final SplitPane split;
  private final PairsView pairs;
  private final Map<Pane, Tab> tabByPane = new EnumMap<>(Pane.class);

  public MainView(MainViewModel vm, ThumbnailCache thumbs) {
    this.vm = vm;
    getStyleClass().add("main-view");
    Session session = vm.session();
    session.libraryProperty().addListener((o, a, b) -> thumbs.clear());
    LibraryView library = new LibraryView(vm.library(), thumbs);
    pairs = new PairsView(vm.pairs(), thumbs);
    tab(Pane.LIBRARY, library);
    tab(Pane.CHAINS, new ChainsView(vm.chains(), thumbs));
    tab(Pane.PAIRS, pairs);
    tab(Pane.WALKTHROUGH, new WalkthroughView(vm.walkthrough(), thumbs));
    tab(Pane.INDEXING, new IndexingView(vm.indexing()));
    tabs.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
    tabs.setId("panes");
    tabs.getSelectionModel().select(tabByPane.get(session.paneProperty().get()));
    tabs.getSelectionModel().selectedItemProperty().addListener((o, a, t) -> session.paneProperty().set(
        (Pane) t.getUserData()));
    session.paneProperty().addListener((o, a, p) -> tabs.getSelectionModel().select(tabByPane.get(p)));

    InspectorView inspector = new InspectorView(vm.inspector(), session);
    inspector.setMinWidth(260);
    split = new SplitPane(tabs, inspector);
    split.setDividerPositions(WindowSettings.DEFAULTS.inspectorDivider());
    SplitPane.setResizableWithParent(inspector, false);

    setTop(menu());
    setCenter(split);
    setBottom(statusBar());
  }

  private void tab(Pane pane, javafx.scene.Node content) {
    Tab t = new Tab(pane.title(), content);
    t.setUserData(pane);
    t.setId("tab-" + pane.name().toLowerCase(java.util.Locale.ROOT));
    tabByPane.put(pane, t);
    tabs.getTabs().add(t);
  }

  private MenuBar menu() {
    MenuItem open = new MenuItem("Open a catalog folder…");
    open.setId("catalog-open");
    open.setAccelerator(KeyCombination.keyCombination("Shortcut+O"));
    open.setOnAction(e -> openCatalogDialog(false));
    MenuItem create = new MenuItem("Start a catalog in a folder…");
    create.setId("catalog-start");
    create.setOnAction(e -> openCatalogDialog(true));
    MenuItem quit = new MenuItem("Close Morphscout");
    quit.setAccelerator(KeyCombination.keyCombination("Shortcut+Q"));
    quit.setOnAction(e -> {
      if (getScene() != null && getScene().getWindow() != null) {
        getScene().getWindow().hide();
      }
    });
    Menu catalog = new Menu("Catalog", null, open, create, new javafx.scene.control.SeparatorMenuItem(), quit);
    catalog.setId("catalog-menu");
    MenuItem keys = new MenuItem("Keyboard shortcuts");
    keys.setOnAction(e -> showShortcuts());
    Menu help = new Menu("Help", null, keys);
    return new MenuBar(catalog, help);
  }

  private HBox statusBar() {
    Label catalog = new Label();
    catalog.getStyleClass().add("status-catalog");
    catalog.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(() -> vm.catalogDirProperty()
        .get() == null ? "No catalog open" : "Catalog: " + vm.catalogDirProperty().get(), vm.catalogDirProperty()));
    MessageLine message = MessageLine.error(vm.messageProperty());
    message.setId("main-message");
    Region spacer = new Region();
    HBox.setHgrow(spacer, Priority.ALWAYS);
    Label hint = new Label("F1: keyboard shortcuts");
    hint.getStyleClass().add("summary");
    HBox bar = new HBox(12, catalog, message, spacer, hint);
    bar.getStyleClass().add("status-bar");
    bar.setAlignment(Pos.CENTER_LEFT);
    bar.setPadding(new Insets(4, 10, 4, 10));
    return bar;
  }

  /** Asks for a catalog folder and opens it ({@code create}: make a new empty catalog there). */
  void openCatalogDialog(boolean create) {
    DirectoryChooser dc = new DirectoryChooser();
    dc.setTitle(create ? "Choose a folder for the new catalog" : "Choose a catalog folder");
    if (vm.catalogDirProperty().get() != null && vm.catalogDirProperty().get().getParent() != null) {
      File parent = vm.catalogDirProperty().get().getParent().toFile();
      if (parent.isDirectory()) {
        dc.setInitialDirectory(parent);
      }
    }
    File f = dc.showDialog(getScene().getWindow());
    if (f != null) {
      vm.open(f.toPath(), create);
    }
  }

  void showShortcuts() {
    GridPane grid = new GridPane();
    grid.setHgap(16);
    grid.setVgap(4);
    int row = 0;
    for (Shortcuts.Shortcut s : Shortcuts.ALL) {
      Label k = new Label(s.keys());
      k.getStyleClass().add("fact-label");
      grid.addRow(row++, k, new Label(s.action()));
    }
    Alert a = new Alert(Alert.AlertType.INFORMATION, "", ButtonType.CLOSE);
    a.setTitle("Keyboard shortcuts");
    a.setHeaderText("Keyboard shortcuts");
    a.getDialogPane().setContent(grid);
    a.getDialogPane().getStylesheets().add(MainView.class.getResource(CSS).toExternalForm());
    a.initOwner(getScene().getWindow());
    a.show();
  }

  /** Builds the scene for this view: stylesheet and keyboard shortcuts installed. */
  public Scene scene(double width, double height) {
    Scene scene = new Scene(this, width, height);
    scene.getStylesheets().add(MainView.class.getResource(CSS).toExternalForm());
    Shortcuts.install(scene, this);
    return scene;
  }

  public MainViewModel viewModel() {
    return vm;
  }

  PairsView pairs() {
    return pairs;
  }

  /** The divider between panes and inspector, for saving and restoring the layout. */
  public SplitPane split() {
    return split;
  }
}
