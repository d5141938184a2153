package org.morphscout.app.gui.indexing;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.ImageFailure;

/** Adding a folder to the catalog: progress, cancel, and the failures with their reasons. */
public final class IndexingViewModel {
  private final Session session;
  private final TaskRunner runner;
  private final Runnable afterIndexing;
  private TaskHandle pending;

  private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
  private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
  private final ReadOnlyStringWrapper phase = new ReadOnlyStringWrapper(this, "phase", "");
  private final ReadOnlyStringWrapper item = new ReadOnlyStringWrapper(this, "item", "");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");
  private final ObservableList<ImageFailure> failures = FXCollections.observableArrayList();

  /** @param afterIndexing runs on the UI thread after a run that changed the catalog (reloads the grid) */
  public IndexingViewModel(Session session, TaskRunner runner, Runnable afterIndexing) {
    this.session = session;
    this.runner = runner;
    this.afterIndexing = afterIndexing;
    session.libraryProperty().addListener((o, a, b) -> refreshFailures());
  }

  /** Indexes {@code folder} into the open catalog. */
  public void add(Path folder) {
    Library lib = session.library();
    if (lib == null) {
      message.set("Open or create a catalog first (File menu).");
      return;
    }
    if (!Files.isDirectory(folder)) {
      message.set(folder + " is not a folder.");
      return;
    }
    if (running.get()) {
      message.set("Indexing is already running; wait for it or cancel it.");
      return;
    }
    running.set(true);
    message.set("");
    summary.set("");
    progress.set(-1);
    phase.set("Starting…");
    item.set("");
    pending = runner.submit("index " + folder.getFileName(), token -> session.backends().indexing().index(folder,
        new UiProgress(runner, progress, phase, item), token), s -> {
          running.set(false);
          progress.set(1);
          phase.set("Done");
          item.set("");
          summary.set(s.found() + " found, " + s.ready() + " ready, " + s.failed() + " failed");
          afterIndexing.run();
          refreshFailures();
        }, e -> {
          running.set(false);
          progress.set(0);
          phase.set("");
          message.set(Messages.of(e));
          refreshFailures();
        });
  }

  /** Stops indexing at the next image; finished images stay in the catalog. */
  public void cancel() {
    if (pending != null && running.get()) {
      pending.cancel();
      running.set(false);
      phase.set("Cancelled; finished images are kept.");
      afterIndexing.run();
      refreshFailures();
    }
  }

  /** Reloads the failure list from the catalog. */
  public void refreshFailures() {
    Library lib = session.library();
    if (lib == null) {
      failures.clear();
      return;
    }
    runner.submit("load failures", token -> lib.failures(), failures::setAll,
        e -> message.set(Messages.of(e)));
  }

  /**
   * Progress from a worker thread, passed to the UI thread at most once per pending update: while one update waits
   * to be shown, newer values just replace its content (so thousands of small steps never flood the UI queue).
   */
  static final class UiProgress implements ProgressListener {
    private final TaskRunner runner;
    private final ReadOnlyDoubleWrapper progress;
    private final ReadOnlyStringWrapper phase;
    private final ReadOnlyStringWrapper item;
    private final AtomicReference<Object[]> latest = new AtomicReference<>();
    private final AtomicBoolean scheduled = new AtomicBoolean();
    private volatile String phaseName = "";
    private volatile long total = -1;

    UiProgress(TaskRunner runner, ReadOnlyDoubleWrapper progress, ReadOnlyStringWrapper phase,
        ReadOnlyStringWrapper item) {
      this.runner = runner;
      this.progress = progress;
      this.phase = phase;
      this.item = item;
    }

    @Override
    public void phase(String name, long total) {
      this.phaseName = name;
      this.total = total;
      post(-1, name, "");
    }

    @Override
    public void progressed(long done, String what) {
      double fraction = total > 0 ? Math.min(1, done / (double) total) : -1;
      String label = total > 0 ? phaseName + " " + done + " / " + total : phaseName + " " + done;
      post(fraction, label, what == null ? "" : what);
    }

    private void post(double fraction, String label, String what) {
      latest.set(new Object[] {fraction, label, what});
      if (scheduled.compareAndSet(false, true)) {
        runner.onUiThread(() -> {
          scheduled.set(false);
          Object[] v = latest.get();
          progress.set((Double) v[0]);
          phase.set((String) v[1]);
          item.set((String) v[2]);
        });
      }
    }
  }

  public ReadOnlyBooleanProperty runningProperty() {
    return running.getReadOnlyProperty();
  }

  /** 0..1, or -1 while the amount of work is unknown. */
  public ReadOnlyDoubleProperty progressProperty() {
    return progress.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty phaseProperty() {
    return phase.getReadOnlyProperty();
  }

  /** The file being worked on. */
  public ReadOnlyStringProperty itemProperty() {
    return item.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty summaryProperty() {
    return summary.getReadOnlyProperty();
  }

  public ObservableList<ImageFailure> failures() {
    return failures;
  }

  /** Shows a failed image in the inspector (the failures table's selection). */
  public void inspect(ImageFailure failure) {
    if (failure != null) {
      session.row(failure.imageId()).ifPresent(session.selectedProperty()::set);
    }
  }
}
