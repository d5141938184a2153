package org.morphscout.app.gui.walk;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.library.WalkTable;
import org.morphscout.indexer.values.ImageRow;

/**
 * A walk: a set of images (the grid's selection, or a folder), ordered smoothly, with the size of each step;
 * the user can move images and the steps follow; the order can be exported.
 */
public final class WalkthroughViewModel {
  /** Most images a walk takes from a folder. */
  static final int MAX_IMAGES = 2000;

  private final Session session;
  private final TaskRunner runner;
  private TaskHandle pending;
  private TaskHandle stepsTask;

  private final ObservableList<ImageRow> strip = FXCollections.observableArrayList();
  private final ObservableList<Double> steps = FXCollections.observableArrayList();
  private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");

  public WalkthroughViewModel(Session session, TaskRunner runner) {
    this.session = session;
    this.runner = runner;
    session.libraryProperty().addListener((o, a, b) -> {
      strip.clear();
      steps.clear();
      summary.set("");
      message.set("");
    });
  }

  /** Takes the images selected in the grid (at least 2). */
  public void useSelection() {
    List<ImageRow> sel = List.copyOf(session.selection());
    if (sel.size() < 2) {
      message.set("Select at least two images in Images (Ctrl+click or Shift+click), then use them here.");
      return;
    }
    load(sel);
  }

  /** Takes the ready images directly inside {@code folder}. */
  public void useFolder(Path folder, List<ImageRow> candidates) {
    String dir = folder.toAbsolutePath().normalize().toString();
    List<ImageRow> in = new ArrayList<>();
    for (ImageRow r : candidates) {
      Path parent = Path.of(r.path()).getParent();
      if (parent != null && parent.toString().equals(dir)
          && r.status() == org.morphscout.indexer.values.ImageStatus.READY) {
        in.add(r);
      }
    }
    if (in.size() < 2) {
      message.set("The folder " + dir + " holds fewer than two analysed images of this catalog.");
      return;
    }
    if (in.size() > MAX_IMAGES) {
      message.set("The folder holds " + in.size() + " images; a walk takes at most " + MAX_IMAGES + ".");
      return;
    }
    load(in);
  }

  private void load(List<ImageRow> rows) {
    message.set("");
    strip.setAll(rows);
    updateSteps();
  }

  /** Orders the strip smoothly. */
  public void order() {
    if (strip.size() < 2) {
      message.set("Add at least two images first.");
      return;
    }
    if (pending != null) {
      pending.cancel();
    }
    List<Long> ids = strip.stream().map(ImageRow::id).toList();
    List<ImageRow> before = List.copyOf(strip);
    running.set(true);
    message.set("");
    pending = runner.submit("order walk", token -> session.backends().walk().order(ids, token), ordered -> {
      running.set(false);
      List<ImageRow> rows = new ArrayList<>();
      for (long id : ordered) {
        before.stream().filter(r -> r.id() == id).findFirst().ifPresent(rows::add);
      }
      strip.setAll(rows);
      updateSteps();
    }, e -> {
      running.set(false);
      message.set(Messages.of(e));
    });
  }

  /** Moves the image at {@code from} to position {@code to} (both 0-based) and re-measures the steps. */
  public void move(int from, int to) {
    if (from < 0 || from >= strip.size() || to < 0 || to >= strip.size() || from == to) {
      return;
    }
    ImageRow r = strip.remove(from);
    strip.add(to, r);
    updateSteps();
  }

  /** Removes one image from the strip. */
  public void remove(int index) {
    if (index >= 0 && index < strip.size()) {
      strip.remove(index);
      updateSteps();
    }
  }

  private void updateSteps() {
    if (stepsTask != null) {
      stepsTask.cancel();
    }
    List<Long> ids = strip.stream().map(ImageRow::id).toList();
    if (ids.size() < 2 || session.backends() == null) {
      steps.clear();
      summary.set(ids.size() + " image" + (ids.size() == 1 ? "" : "s"));
      return;
    }
    stepsTask = runner.submit("measure steps", token -> session.backends().walk().steps(ids, token), s -> {
      steps.setAll(s);
      double total = s.stream().mapToDouble(Double::doubleValue).sum();
      double max = s.stream().mapToDouble(Double::doubleValue).max().orElse(0);
      summary.set(String.format(Locale.ROOT, "%d images · total step cost %.4f · largest step %.4f", ids.size(), total,
          max));
    }, e -> message.set(Messages.of(e)));
  }

  /**
   * Writes the order as CSV in exactly the format of {@code walk --csv} (position, path, step cost FROM the previous
   * image, the first row's empty), by the same library writer, through the library's safe output file.
   */
  public void export(Path file) {
    List<ImageRow> rows = List.copyOf(strip);
    List<Double> s = List.copyOf(steps);
    if (rows.isEmpty()) {
      message.set("Nothing to export yet.");
      return;
    }
    if (s.size() != rows.size() - 1) {
      message.set("The steps are still being measured; export again in a moment.");
      return;
    }
    runner.submit("export walk", token -> {
      WalkTable.write(file, rows.stream().map(ImageRow::path).toList(), s);
      return rows.size();
    }, n -> {
      message.set("");
      summary.set("Exported " + n + " images in order to " + file);
    }, e -> message.set(Messages.of(e)));
  }

  public ObservableList<ImageRow> strip() {
    return strip;
  }

  /** Step {@code i} is between strip images {@code i} and {@code i + 1}. */
  public ObservableList<Double> steps() {
    return steps;
  }

  public ReadOnlyBooleanProperty runningProperty() {
    return running.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty summaryProperty() {
    return summary.getReadOnlyProperty();
  }

  public Session session() {
    return session;
  }
}
