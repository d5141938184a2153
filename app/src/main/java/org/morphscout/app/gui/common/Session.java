package org.morphscout.app.gui.common;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.service.Backends;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.ImageRow;

/**
 * State shared by the panes: the open library and its backends, the selected image, the chain endpoints, and
 * requests one pane makes of another (find partners, find similar). Lives on the UI thread; not thread-safe.
 */
public final class Session {
  /** A request to search for images similar to {@code source}. */
  public record SimilarRequest(ImageRow source, SimilarityMode mode) {}

  private final ReadOnlyObjectWrapper<Library> library = new ReadOnlyObjectWrapper<>(this, "library");
  private final ReadOnlyObjectWrapper<Backends> backends = new ReadOnlyObjectWrapper<>(this, "backends");
  private final ObjectProperty<ImageRow> selected = new SimpleObjectProperty<>(this, "selected");
  private final ObjectProperty<ImageRow> start = new SimpleObjectProperty<>(this, "start");
  private final ObjectProperty<ImageRow> end = new SimpleObjectProperty<>(this, "end");
  private final ObservableList<ImageRow> selection = FXCollections.observableArrayList();
  private final ObjectProperty<ImageRow> partnersRequest = new SimpleObjectProperty<>(this, "partnersRequest");
  private final ObjectProperty<SimilarRequest> similarRequest = new SimpleObjectProperty<>(this, "similarRequest");
  private final ObjectProperty<Pane> pane = new SimpleObjectProperty<>(this, "pane", Pane.LIBRARY);
  private Map<Long, ImageRow> rowsById = Map.of();

  /** Installs a newly opened library (or null when closed) and its backends; clears everything tied to the old one. */
  public void install(Library lib, Backends b) {
    selected.set(null);
    start.set(null);
    end.set(null);
    selection.clear();
    rowsById = Map.of();
    backends.set(b);
    library.set(lib);
  }

  /** Replaces the backends of the open library (after indexing changed what they hold). */
  public void refreshBackends(Backends b) {
    backends.set(b);
  }

  /** Records the rows the library pane loaded, so other panes can name images by id. */
  public void rows(List<ImageRow> rows) {
    Map<Long, ImageRow> m = new HashMap<>(rows.size() * 2);
    for (ImageRow r : rows) {
      m.put(r.id(), r);
    }
    rowsById = m;
  }

  /** Every row the library pane loaded, in no particular order. */
  public java.util.Collection<ImageRow> rows() {
    return java.util.Collections.unmodifiableCollection(rowsById.values());
  }

  public Optional<ImageRow> row(long id) {
    return Optional.ofNullable(rowsById.get(id));
  }

  /** The file name of an image, or {@code #id} when unknown. */
  public String name(long id) {
    ImageRow r = rowsById.get(id);
    return r == null ? "#" + id : Path.of(r.path()).getFileName().toString();
  }

  /** The thumbnail file of an image; touches the disk, so call it off the UI thread. */
  public Optional<Path> thumbnail(long id) {
    Library lib = library.get();
    return lib == null ? Optional.empty() : lib.thumbnail(id);
  }

  public ReadOnlyObjectProperty<Library> libraryProperty() {
    return library.getReadOnlyProperty();
  }

  public Library library() {
    return library.get();
  }

  public ReadOnlyObjectProperty<Backends> backendsProperty() {
    return backends.getReadOnlyProperty();
  }

  public Backends backends() {
    return backends.get();
  }

  public ObjectProperty<ImageRow> selectedProperty() {
    return selected;
  }

  public ObjectProperty<ImageRow> startProperty() {
    return start;
  }

  public ObjectProperty<ImageRow> endProperty() {
    return end;
  }

  /** The images selected in the grid (several with Ctrl/Shift), in selection order. */
  public ObservableList<ImageRow> selection() {
    return selection;
  }

  public ObjectProperty<ImageRow> partnersRequestProperty() {
    return partnersRequest;
  }

  public ObjectProperty<SimilarRequest> similarRequestProperty() {
    return similarRequest;
  }

  public ObjectProperty<Pane> paneProperty() {
    return pane;
  }
}
