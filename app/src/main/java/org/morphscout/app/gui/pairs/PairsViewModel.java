package org.morphscout.app.gui.pairs;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.service.AlignedMasks;
import org.morphscout.app.gui.service.MaskAligner;
import org.morphscout.app.gui.service.PairSuggestion;
import org.morphscout.app.gui.service.PairsBackend;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.DecisionTable;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;

/**
 * Suggested pairs for the library or one image, the user's decisions on them (stored in the catalog's decision store,
 * the same the command line reads), the aligned silhouettes of the chosen pair, and export of approved pairs.
 */
public final class PairsViewModel {
  /** Grid side of the aligned-silhouette overlay, in pixels. */
  static final int OVERLAY_SIZE = 160;

  private final Session session;
  private final TaskRunner runner;
  private TaskHandle pending;
  private TaskHandle overlayTask;

  private final ObjectProperty<ImageRow> focus = new SimpleObjectProperty<>(this, "focus");
  private final IntegerProperty limit = new SimpleIntegerProperty(this, "limit", 200);
  private final ObservableList<PairRow> rows = FXCollections.observableArrayList();
  private final ObjectProperty<PairRow> selected = new SimpleObjectProperty<>(this, "selected");
  private final ReadOnlyObjectWrapper<AlignedMasks> overlay = new ReadOnlyObjectWrapper<>(this, "overlay");
  private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
  private final ReadOnlyStringWrapper scope = new ReadOnlyStringWrapper(this, "scope", "Whole library");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyStringWrapper info = new ReadOnlyStringWrapper(this, "info", "");

  public PairsViewModel(Session session, TaskRunner runner) {
    this.session = session;
    this.runner = runner;
    selected.addListener((o, a, row) -> loadOverlay(row));
    // the inspector follows the table: a chosen pair shows its first image there (a click on a tile shows either)
    selected.addListener((o, a, row) -> {
      if (row != null) {
        session.row(row.suggestion().a()).ifPresent(session.selectedProperty()::set);
      }
    });
    focus.addListener((o, a, f) -> scope.set(f == null ? "Whole library" : "Partners of " + session.name(f.id())));
    session.partnersRequestProperty().addListener((o, a, row) -> {
      if (row != null) {
        showFor(row);
      }
    });
    session.libraryProperty().addListener((o, a, b) -> {
      rows.clear();
      focus.set(null);
      message.set("");
      info.set("");
    });
  }

  /** Suggests partners of one image. */
  public void showFor(ImageRow row) {
    focus.set(row);
    refresh();
  }

  /** Suggests pairs across the whole library. */
  public void showLibrary() {
    focus.set(null);
    refresh();
  }

  private record Loaded(List<PairSuggestion> pairs, List<String> notes,
      Map<String, Decision> decisions) {}

  /** Runs the suggestion again with the current scope. */
  public void refresh() {
    Library lib = session.library();
    if (lib == null) {
      message.set("Open a catalog first.");
      return;
    }
    if (pending != null) {
      pending.cancel();
    }
    ImageRow f = focus.get();
    OptionalLong image = f == null ? OptionalLong.empty() : OptionalLong.of(f.id());
    int max = Math.max(1, limit.get());
    running.set(true);
    message.set("");
    info.set("Scoring pairs…");
    pending = runner.submit("suggest pairs", token -> {
      PairsBackend.Suggestions found = session.backends().pairs().suggest(image, max, token);
      Map<String, Decision> decided = new HashMap<>();
      for (Decision d : lib.decisions().all()) {
        decided.put(key(d.imageA(), d.imageB()), d);
      }
      return new Loaded(found.pairs(), found.notes(), decided);
    }, loaded -> {
      running.set(false);
      rows.setAll(loaded.pairs().stream().map(p -> {
        PairRow r = new PairRow(p, session.name(p.a()), session.name(p.b()));
        Decision d = loaded.decisions().get(key(p.a(), p.b()));
        if (d != null) {
          r.decided(d.kind().word(), d.note());
        }
        return r;
      }).toList());
      info.set(rows.size() + " pair" + (rows.size() == 1 ? "" : "s"));
      if (!loaded.notes().isEmpty()) {
        // How the library found them, as the command line says it (for example: scored live, index to speed up).
        message.set(String.join(" ", loaded.notes()));
      } else if (rows.isEmpty()) {
        message.set("No pairs to suggest here yet.");
      }
    }, e -> {
      running.set(false);
      info.set("");
      message.set(Messages.of(e));
    });
  }

  /** Stops a running suggestion; the table keeps what it showed before. */
  public void cancel() {
    if (pending != null && running.get()) {
      pending.cancel();
      running.set(false);
      info.set("Cancelled.");
    }
  }

  public void approve(PairRow row) {
    decide(row, DecisionKind.APPROVED, row == null ? "" : row.noteProperty().get());
  }

  public void reject(PairRow row) {
    decide(row, DecisionKind.REJECTED, row == null ? "" : row.noteProperty().get());
  }

  /** Stores a note with the pair; an undecided pair keeps no note (the catalog stores notes with decisions). */
  public void note(PairRow row, String text) {
    if (row == null) {
      message.set("Choose a pair first.");
      return;
    }
    String verdict = row.decisionProperty().get();
    if (verdict.isEmpty()) {
      message.set("Approve or reject the pair first; the note is kept with the decision.");
      return;
    }
    decide(row, DecisionKind.parse(verdict), text);
  }

  /** Clears the decision on a pair (the library call {@code decide --clear} makes). */
  public void clearDecision(PairRow row) {
    Library lib = session.library();
    if (row == null || lib == null) {
      return;
    }
    PairSuggestion p = row.suggestion();
    runner.submit("clear decision", token -> lib.decisions().clear(p.a(), p.b()), ok -> row.decided("", ""),
        e -> message.set(Messages.of(e)));
  }

  private void decide(PairRow row, DecisionKind verdict, String note) {
    Library lib = session.library();
    if (row == null) {
      message.set("Choose a pair first.");
      return;
    }
    if (lib == null) {
      message.set("Open a catalog first.");
      return;
    }
    PairSuggestion p = row.suggestion();
    String text = note == null || note.isBlank() ? null : note.strip();
    runner.submit("store decision", token -> {
      lib.decisions().decide(p.a(), p.b(), verdict, text);
      return verdict;
    }, v -> {
      row.decided(v.word(), text);
      message.set("");
      info.set(v.word().substring(0, 1).toUpperCase() + v.word().substring(1) + ": " + row.nameA() + " – "
          + row.nameB());
    }, e -> message.set(Messages.of(e)));
  }

  /**
   * Writes every approved pair of the catalog (not only those listed) to {@code file}, in exactly the format of
   * {@code decisions --only approved --csv} ({@code --json} for a {@code .json} name), by the same library writer.
   */
  public void exportApproved(Path file) {
    Library lib = session.library();
    if (lib == null) {
      message.set("Open a catalog first.");
      return;
    }
    runner.submit("export approved pairs", token -> {
      List<Decision> approved = DecisionTable.only(lib.decisions().all(), DecisionKind.APPROVED);
      DecisionTable.write(file, approved);
      return approved.size();
    }, n -> {
      message.set("");
      info.set("Exported " + n + " approved pair" + (n == 1 ? "" : "s") + " to " + file);
    }, e -> message.set(Messages.of(e)));
  }

  private void loadOverlay(PairRow row) {
    if (overlayTask != null) {
      overlayTask.cancel();
    }
    overlay.set(null);
    Library lib = session.library();
    if (row == null || lib == null) {
      return;
    }
    PairSuggestion p = row.suggestion();
    overlayTask = runner.submit("align silhouettes", token -> {
      ImageAnalysis a = analysis(lib, p.a());
      ImageAnalysis b = analysis(lib, p.b());
      return MaskAligner.align(a.silhouette().mask(), b.silhouette().mask(), OVERLAY_SIZE);
    }, overlay::set, e -> message.set(Messages.of(e)));
  }

  private static ImageAnalysis analysis(Library lib, long id) {
    Optional<ImageAnalysis> a = lib.analysis(id);
    return a.orElseThrow(() -> new MorphscoutException("image " + id + " has no stored silhouette"));
  }

  private static String key(long a, long b) {
    return Math.min(a, b) + ":" + Math.max(a, b);
  }

  public ObservableList<PairRow> rows() {
    return rows;
  }

  public ObjectProperty<PairRow> selectedProperty() {
    return selected;
  }

  /** The image whose partners are shown, or null for the whole library. */
  public ObjectProperty<ImageRow> focusProperty() {
    return focus;
  }

  /** Most pairs to list (at least 1). */
  public IntegerProperty limitProperty() {
    return limit;
  }

  /** Aligned silhouettes of the selected pair, or null. */
  public ReadOnlyObjectProperty<AlignedMasks> overlayProperty() {
    return overlay.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty runningProperty() {
    return running.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty scopeProperty() {
    return scope.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty infoProperty() {
    return info.getReadOnlyProperty();
  }

  public Session session() {
    return session;
  }
}
