package org.morphscout.app.gui;

import javafx.scene.Scene;
import org.morphscout.app.gui.service.Backends;
import javafx.stage.Stage;
import org.morphscout.app.gui.common.ThumbnailCache;
import org.morphscout.app.gui.task.FxTaskRunner;
import org.testfx.util.WaitForAsyncUtils;

/**
 * One browser window for a headless test, built as {@link MorphscoutApp} builds it: a task runner, the main view model
 * on the given backends, a thumbnail cache and the main view, shown on a stage. {@link #close()} takes them down in
 * the order the application does. Call {@link #show} from a TestFX {@code @Start} method (on the FX thread).
 */
final class TestWindow implements AutoCloseable {
  final FxTaskRunner runner;
  final MainViewModel vm;
  final ThumbnailCache thumbs;
  final MainView view;
  final Scene scene;

  private TestWindow(Stage stage, Backends.Factory backends, int thumbCapacity, double width, double height,
      double inspectorDivider) {
    runner = new FxTaskRunner(2);
    vm = new MainViewModel(runner, backends);
    thumbs = new ThumbnailCache(id -> vm.session().thumbnail(id), MorphscoutApp.THUMB_SIZE, thumbCapacity);
    view = new MainView(vm, thumbs);
    if (!Double.isNaN(inspectorDivider)) {
      view.split().setDividerPositions(inspectorDivider);
    }
    scene = view.scene(width, height);
    stage.setScene(scene);
    stage.show();
  }

  /** A window of this size with the view's own divider position. */
  static TestWindow show(Stage stage, Backends.Factory backends, int thumbCapacity, double width, double height) {
    return new TestWindow(stage, backends, thumbCapacity, width, height, Double.NaN);
  }

  /** A window of this size with the inspector's divider at {@code inspectorDivider} (0 to 1). */
  static TestWindow show(Stage stage, Backends.Factory backends, int thumbCapacity, double width, double height,
      double inspectorDivider) {
    return new TestWindow(stage, backends, thumbCapacity, width, height, inspectorDivider);
  }

  /** Runs {@code r} on the FX thread and waits for it and for the events it caused. */
  static void fx(Runnable r) throws Exception {
    WaitForAsyncUtils.asyncFx(r).get();
    WaitForAsyncUtils.waitForFxEvents();
  }

  /** Closes the catalog on the FX thread, then stops the task runner and the thumbnail loader. */
  @Override
  public void close() {
    WaitForAsyncUtils.asyncFx(vm::close);
    WaitForAsyncUtils.waitForFxEvents();
    runner.close();
    thumbs.close();
  }
}
