package org.morphscout.app.gui.chains;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.DoubleProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleDoubleProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.service.ChainCandidate;
import org.morphscout.app.gui.service.ChainRequest;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.ImageRow;

/**
 * Chains between two endpoints: the endpoints (shared with the inspector through the session), the search options,
 * images to avoid or require, the candidate chains, and preview frames of a chosen chain.
 */
public final class ChainsViewModel {
  /** Preview frames per step of a chain. */
  static final int FRAMES_PER_STEP = 12;

  private final Session session;
  private final TaskRunner runner;
  private TaskHandle pending;

  private final IntegerProperty alternatives = new SimpleIntegerProperty(this, "alternatives",
      ChainRequest.DEFAULTS.alternatives());
  private final IntegerProperty minSteps = new SimpleIntegerProperty(this, "minSteps",
      ChainRequest.DEFAULTS.minSteps());
  private final IntegerProperty maxSteps = new SimpleIntegerProperty(this, "maxSteps",
      ChainRequest.DEFAULTS.maxSteps());
  private final DoubleProperty shapeWeight = new SimpleDoubleProperty(this, "shapeWeight",
      ChainRequest.DEFAULTS.shapeWeight());
  private final ObservableList<ImageRow> avoid = FXCollections.observableArrayList();
  private final ObservableList<ImageRow> require = FXCollections.observableArrayList();
  private final ObservableList<ChainCandidate> chains = FXCollections.observableArrayList();
  private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyStringWrapper info = new ReadOnlyStringWrapper(this, "info", "");
  private final ReadOnlyObjectWrapper<List<BufferedImage>> preview = new ReadOnlyObjectWrapper<>(this, "preview");
  private final BooleanBinding canRun;

  public ChainsViewModel(Session session, TaskRunner runner) {
    this.session = session;
    this.runner = runner;
    canRun = Bindings.createBooleanBinding(() -> session.startProperty().get() != null
        && session.endProperty().get() != null && !running.get(), session.startProperty(), session.endProperty(),
        running);
    session.libraryProperty().addListener((o, a, b) -> {
      cancel();
      chains.clear();
      avoid.clear();
      require.clear();
      preview.set(null);
      message.set("");
      info.set("");
    });
  }

  /** Finds chains with the current endpoints and options. */
  public void run() {
    ImageRow start = session.startProperty().get();
    ImageRow end = session.endProperty().get();
    if (start == null || end == null) {
      message.set("Choose a start and an end image first (S and E on a selected image, or drop images here).");
      return;
    }
    if (start.id() == end.id()) {
      message.set("Start and end are the same image; choose two different images.");
      return;
    }
    if (minSteps.get() > maxSteps.get()) {
      message.set("The fewest steps (" + minSteps.get() + ") cannot be more than the most steps (" + maxSteps.get()
          + ").");
      return;
    }
    ChainRequest request;
    try {
      request = new ChainRequest(alternatives.get(), minSteps.get(), maxSteps.get(), shapeWeight.get(),
          ids(avoid), ids(require));
    } catch (IllegalArgumentException e) {
      message.set(Messages.of(e));
      return;
    }
    cancel();
    running.set(true);
    message.set("");
    info.set("Searching…");
    chains.clear();
    pending = runner.submit("find chains", token -> session.backends().chains().find(start.id(), end.id(), request,
        token), found -> {
          running.set(false);
          chains.setAll(found);
          info.set(found.isEmpty() ? "" : found.size() + " chain" + (found.size() == 1 ? "" : "s") + " found");
          if (found.isEmpty()) {
            message.set("No chain fits these options; allow more steps, remove a requirement, or pick other "
                + "endpoints.");
          }
        }, e -> {
          running.set(false);
          info.set("");
          message.set(Messages.of(e));
        });
  }

  /** Stops a running search. */
  public void cancel() {
    if (pending != null && !pending.isDone()) {
      pending.cancel();
      running.set(false);
      info.set("Cancelled.");
    }
  }

  /** Excludes an image from every chain and searches again. */
  public void avoid(ImageRow row) {
    require.removeIf(r -> r.id() == row.id());
    if (avoid.stream().noneMatch(r -> r.id() == row.id())) {
      avoid.add(row);
    }
    run();
  }

  /** Demands an image in every chain and searches again. */
  public void require(ImageRow row) {
    avoid.removeIf(r -> r.id() == row.id());
    if (require.stream().noneMatch(r -> r.id() == row.id())) {
      require.add(row);
    }
    run();
  }

  /** Drops every avoid and require constraint (without searching). */
  public void clearConstraints() {
    avoid.clear();
    require.clear();
  }

  /** Sets an endpoint from a dragged catalog image id. */
  public void setEndpoint(long id, boolean start) {
    Optional<ImageRow> row = session.row(id);
    if (row.isEmpty()) {
      message.set("Image #" + id + " is not in the open catalog.");
      return;
    }
    (start ? session.startProperty() : session.endProperty()).set(row.get());
    message.set("");
  }

  /** Sets an endpoint from a file chosen or dropped; it must be in the catalog. */
  public void setEndpoint(Path file, boolean start) {
    Library lib = session.library();
    if (lib == null) {
      message.set("Open a catalog first.");
      return;
    }
    runner.submit("find image", token -> lib.find(file.toString()), row -> {
      if (row.isEmpty()) {
        message.set(file.getFileName() + " is not in the catalog; index its folder first (Indexing pane).");
      } else {
        (start ? session.startProperty() : session.endProperty()).set(row.get());
        message.set("");
      }
    }, e -> message.set(Messages.of(e)));
  }

  /** Swaps start and end. */
  public void swap() {
    ImageRow s = session.startProperty().get();
    session.startProperty().set(session.endProperty().get());
    session.endProperty().set(s);
  }

  /** Makes preview frames of a whole chain, step after step. */
  public void preview(ChainCandidate chain) {
    if (chain == null) {
      return;
    }
    preview.set(null);
    info.set("Making the preview…");
    runner.submit("preview chain", token -> session.backends().preview().chain(chain.images(), FRAMES_PER_STEP,
        token), frames -> {
      info.set("Preview: " + frames.size() + " frames");
      preview.set(frames);
    }, e -> {
      info.set("");
      message.set(Messages.of(e));
    });
  }

  private static Set<Long> ids(List<ImageRow> rows) {
    Set<Long> s = new LinkedHashSet<>();
    rows.forEach(r -> s.add(r.id()));
    return s;
  }

  public ObjectProperty<ImageRow> startProperty() {
    return session.startProperty();
  }

  public ObjectProperty<ImageRow> endProperty() {
    return session.endProperty();
  }

  public IntegerProperty alternativesProperty() {
    return alternatives;
  }

  public IntegerProperty minStepsProperty() {
    return minSteps;
  }

  public IntegerProperty maxStepsProperty() {
    return maxSteps;
  }

  /** 0 = appearance only, 1 = shape only. */
  public DoubleProperty shapeWeightProperty() {
    return shapeWeight;
  }

  public ObservableList<ImageRow> avoided() {
    return avoid;
  }

  public ObservableList<ImageRow> required() {
    return require;
  }

  public ObservableList<ChainCandidate> chains() {
    return chains;
  }

  public ReadOnlyBooleanProperty runningProperty() {
    return running.getReadOnlyProperty();
  }

  public BooleanBinding canRunProperty() {
    return canRun;
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty infoProperty() {
    return info.getReadOnlyProperty();
  }

  /** Frames of the last preview, or null. */
  public ReadOnlyObjectProperty<List<BufferedImage>> previewProperty() {
    return preview.getReadOnlyProperty();
  }

  public Session session() {
    return session;
  }
}
