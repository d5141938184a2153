package org.morphscout.app.gui;

import java.nio.file.Path;

import javafx.application.Application;
import javafx.stage.Stage;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.service.Backends;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.app.gui.task.FxTaskRunner;

/**
 * The desktop browser. Started by {@code morphscout browse} through {@link #launch(Path)}; takes the catalog folder as
 * the named parameter {@code --catalog=<dir>}, else reopens the last catalog.
 */
public final class MorphscoutApp extends Application {
  /** Which implementation serves each job; the one place to wire the library's services in. */
  static final Backends.Factory BACKENDS = LibraryBackends::create;
  /** Thumbnails kept decoded (at {@link #THUMB_SIZE} px about 80 KB each). */
  static final int THUMB_CAPACITY = 1500;
  static final double THUMB_SIZE = 144;

  private FxTaskRunner runner;
  private ThumbnailCache thumbs;
  private MainViewModel vm;
  private SettingsStore settings;

  /** Opens the browser on {@code catalog} and returns when the window is closed. */
  public static void launch(Path catalog) {
    Application.launch(MorphscoutApp.class, "--catalog=" + catalog.toAbsolutePath().normalize());
  }

  @Override
  public void start(Stage stage) {
    settings = new SettingsStore(SettingsStore.defaultFile(System.getenv(), System.getProperty("os.name"),
        Path.of(System.getProperty("user.home"))));
    WindowSettings saved = settings.load();
    runner = new FxTaskRunner(2);
    vm = new MainViewModel(runner, BACKENDS);
    thumbs = new ThumbnailCache(id -> vm.session().thumbnail(id), THUMB_SIZE, THUMB_CAPACITY);
    MainView view = new MainView(vm, thumbs);
    vm.session().paneProperty().set(saved.pane());
    view.split().setDividerPositions(saved.inspectorDivider());
    stage.setScene(view.scene(saved.width(), saved.height()));
    stage.titleProperty().bind(vm.titleProperty());
    if (Double.isFinite(saved.x()) && Double.isFinite(saved.y())) {
      stage.setX(saved.x());
      stage.setY(saved.y());
    }
    stage.setMaximized(saved.maximized());
    stage.setOnHidden(e -> {
      vm.saveSettings(settings, new WindowSettings(saved.lastCatalog(), stage.getX(), stage.getY(),
          stage.getWidth(), stage.getHeight(), stage.isMaximized(), vm.session().paneProperty().get(),
          view.split().getDividers().isEmpty() ? saved.inspectorDivider()
              : view.split().getDividers().get(0).getPosition()));
      stop();
    });
    stage.show();
    String chosen = getParameters().getNamed().get("catalog");
    if (chosen != null && !chosen.isBlank()) {
      vm.open(Path.of(chosen), false);
    } else if (!saved.lastCatalog().isEmpty()) {
      vm.open(Path.of(saved.lastCatalog()), false);
    }
  }

  @Override
  public void stop() {
    if (vm != null) {
      vm.close();
      vm = null;
    }
    if (thumbs != null) {
      thumbs.close();
    }
    if (runner != null) {
      runner.close();
    }
  }

}
