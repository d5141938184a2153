package org.morphscout.app.gui.inspector;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.service.CatalogFindings;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.text.HumanTime;
import org.morphscout.indexer.values.ImageRow;

/** The selected image's details and the actions on it. Follows the session's selection. */
public final class InspectorViewModel {
  private final Session session;
  private final TaskRunner runner;
  private TaskHandle pending;

  private final ReadOnlyObjectWrapper<ImageRow> image = new ReadOnlyObjectWrapper<>(this, "image");
  private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "No image selected");
  private final ReadOnlyObjectWrapper<Path> file = new ReadOnlyObjectWrapper<>(this, "file");
  private final ReadOnlyObjectWrapper<Path> thumbnail = new ReadOnlyObjectWrapper<>(this, "thumbnail");
  private final ReadOnlyObjectWrapper<Mask> mask = new ReadOnlyObjectWrapper<>(this, "mask");
  private final BooleanProperty overlay = new SimpleBooleanProperty(this, "overlay", false);
  private final ObservableList<Fact> facts = FXCollections.observableArrayList();
  private final ObservableList<String> swatches = FXCollections.observableArrayList();
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyStringWrapper uncertain = new ReadOnlyStringWrapper(this, "uncertain", "");

  public InspectorViewModel(Session session, TaskRunner runner) {
    this.session = session;
    this.runner = runner;
    session.selectedProperty().addListener((o, a, row) -> show(row));
  }

  private record Details(Optional<ImageAnalysis> analysis, Optional<String> failure, Optional<Path> thumbnail) {}

  void show(ImageRow row) {
    if (pending != null) {
      pending.cancel();
    }
    image.set(row);
    mask.set(null);
    uncertain.set("");
    thumbnail.set(null);
    facts.clear();
    swatches.clear();
    message.set("");
    if (row == null) {
      title.set("No image selected");
      file.set(null);
      return;
    }
    title.set(session.name(row.id()));
    file.set(Path.of(row.path()));
    facts.setAll(basicFacts(row));
    Library lib = session.library();
    if (lib == null) {
      return;
    }
    pending = runner.submit("inspect image", token -> new Details(lib.analysis(row),
        lib.failureReason(row.id()), lib.thumbnail(row.id())), d -> {
          thumbnail.set(d.thumbnail().orElse(null));
          List<Fact> all = new ArrayList<>(basicFacts(row));
          d.failure().ifPresent(reason -> all.add(new Fact("Failed", reason)));
          d.analysis().ifPresent(a -> {
            mask.set(a.silhouette().mask());
            uncertain.set(uncertainNote(a.silhouette()));
            all.addAll(analysisFacts(a));
            for (ColourStats.DominantColour c : a.colour().dominant()) {
              swatches.add(LabColours.hex(c.lab()));
            }
          });
          if (d.analysis().isEmpty() && d.failure().isEmpty()) {
            all.add(new Fact("Analysis", "not analysed yet"));
          }
          facts.setAll(all);
        }, e -> message.set(Messages.of(e)));
  }

  /** The inspector's marker for a doubtful silhouette ({@link Silhouette#uncertain()}), or "" when it is sound. */
  static String uncertainNote(Silhouette s) {
    return s.uncertain() ? String.format(Locale.ROOT, "Uncertain silhouette: confidence %.2f (below %.2f), so its shape "
        + "figures may be wrong", s.confidence(), Silhouette.UNCERTAIN_BELOW) : "";
  }

  static List<Fact> basicFacts(ImageRow row) {
    List<Fact> f = new ArrayList<>();
    Path p = Path.of(row.path());
    f.add(new Fact("Folder", p.getParent() == null ? "" : p.getParent().toString()));
    f.add(new Fact("Size", row.width() > 0 ? row.width() + " × " + row.height() + " px" : "unknown"));
    f.add(new Fact("File", humanBytes(row.size()) + (row.format() == null ? "" : ", " + row.format().toUpperCase(
        Locale.ROOT))));
    if (row.mtimeMs() > 0) {
      f.add(new Fact("Modified", HumanTime.localMillis(row.mtimeMs())));
    }
    f.add(new Fact("Status", row.status().word()));
    return f;
  }

  static List<Fact> analysisFacts(ImageAnalysis a) {
    List<Fact> f = new ArrayList<>();
    var s = a.silhouette();
    List<String> findings = CatalogFindings.of(s).stream().map(ImageFinding::label).toList();
    f.add(new Fact("Findings", findings.isEmpty() ? "none" : String.join(", ", findings)));
    f.add(new Fact("Silhouette", String.format(Locale.ROOT, "%.0f%% of the frame, confidence %.2f, %d object%s (%s)",
        s.coverage() * 100, s.confidence(), s.components(), s.components() == 1 ? "" : "s", sourceWord(s.source()))));
    f.add(new Fact("Shape", String.format(Locale.ROOT, "aspect %.2f, centroid (%.2f, %.2f), axis %.0f°",
        a.shape().aspect(), a.shape().centroidX(), a.shape().centroidY(), Math.toDegrees(a.shape().orientation()))));
    f.add(new Fact("Object colour", lab(a.colour().foregroundMean(), a.colour().foregroundStd())));
    f.add(new Fact("Background", lab(a.colour().backgroundMean(), a.colour().backgroundStd())));
    f.add(new Fact("Model", a.modelId()));
    return f;
  }

  private static String lab(double[] mean, double[] std) {
    if (mean == null || Double.isNaN(mean[0])) {
      return "none (empty region)";
    }
    return String.format(Locale.ROOT, "L* %.0f ± %.0f, a* %.0f ± %.0f, b* %.0f ± %.0f", mean[0], std[0], mean[1],
        std[1], mean[2], std[2]);
  }

  /** What made a silhouette, in the glossary's words (the library's one rule). */
  static String sourceWord(String stored) {
    return org.morphscout.indexer.silhouette.Silhouette.sourceWord(stored);
  }

  static String humanBytes(long bytes) {
    if (bytes < 1024) {
      return bytes + " B";
    }
    double kb = bytes / 1024.0;
    return kb < 1024 ? String.format(Locale.ROOT, "%.0f KiB", kb) : String.format(Locale.ROOT, "%.1f MiB", kb / 1024);
  }

  public void useAsStart() {
    if (require()) {
      session.startProperty().set(image.get());
    }
  }

  public void useAsEnd() {
    if (require()) {
      session.endProperty().set(image.get());
    }
  }

  public void findPartners() {
    if (require()) {
      session.partnersRequestProperty().set(null);
      session.partnersRequestProperty().set(image.get());
    }
  }

  public void findSimilar(SimilarityMode mode) {
    if (require()) {
      session.similarRequestProperty().set(null);
      session.similarRequestProperty().set(new Session.SimilarRequest(image.get(), mode));
    }
  }

  private boolean require() {
    if (image.get() == null) {
      message.set("Select an image first.");
      return false;
    }
    return true;
  }

  public ReadOnlyObjectProperty<ImageRow> imageProperty() {
    return image.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty titleProperty() {
    return title.getReadOnlyProperty();
  }

  /** The image file to show large (the view decodes it off the UI thread). */
  public ReadOnlyObjectProperty<Path> fileProperty() {
    return file.getReadOnlyProperty();
  }

  /**
   * The catalog's thumbnail of the image, or null: shown when the original is in a format the window cannot decode
   * (TIFF, WebP and others the indexer reads through its own decoders).
   */
  public ReadOnlyObjectProperty<Path> thumbnailProperty() {
    return thumbnail.getReadOnlyProperty();
  }

  /** The stored silhouette (at most 128 px), or null when not analysed. */
  public ReadOnlyObjectProperty<Mask> maskProperty() {
    return mask.getReadOnlyProperty();
  }

  /** Whether the silhouette is drawn over the image. */
  public BooleanProperty overlayProperty() {
    return overlay;
  }

  public ObservableList<Fact> facts() {
    return facts;
  }

  /** Dominant object colours as {@code #rrggbb}, most weighty first. */
  public ObservableList<String> swatches() {
    return swatches;
  }

  /** Says the silhouette is uncertain, or "" when it is not (or nothing is selected). */
  public ReadOnlyStringProperty uncertainProperty() {
    return uncertain.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }
}
