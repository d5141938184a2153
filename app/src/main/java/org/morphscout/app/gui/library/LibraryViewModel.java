package org.morphscout.app.gui.library;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.service.CatalogFindings;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.service.Match;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.app.gui.task.TaskHandle;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageRow;

/**
 * The library grid's state: every image of the catalog, the filters and sort, and an optional similarity search
 * whose results replace the full list until cleared. Filtering runs on the UI thread: one pass over the rows
 * (about 10 ms for 100,000 on a laptop), cheaper than shipping the list to a worker and back.
 */
public final class LibraryViewModel {
  /** How many results a similarity search shows. */
  public static final int SIMILAR_LIMIT = 200;

  private final Session session;
  private final TaskRunner runner;
  private List<ImageRow> all = List.of();
  private Map<Long, Set<ImageFinding>> findings = Map.of();
  private List<Match> similar = List.of();
  private Map<Long, Double> distances = Map.of();
  private TaskHandle pending;

  private final ObservableList<ImageRow> visible = FXCollections.observableArrayList();
  private final ObservableList<Folder> roots = FXCollections.observableArrayList();
  private final ObjectProperty<Folder> root = new SimpleObjectProperty<>(this, "root");
  private final StringProperty folder = new SimpleStringProperty(this, "folder", "");
  private final Map<ImageFinding, BooleanProperty> findingFilters = new EnumMap<>(ImageFinding.class);
  private final ObjectProperty<SortKey> sort = new SimpleObjectProperty<>(this, "sort", SortKey.NAME);
  private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "No catalog open");
  private final ReadOnlyStringWrapper searchTitle = new ReadOnlyStringWrapper(this, "searchTitle", "");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(this, "busy");
  private final ReadOnlyBooleanWrapper searching = new ReadOnlyBooleanWrapper(this, "searching");

  public LibraryViewModel(Session session, TaskRunner runner) {
    this.session = session;
    this.runner = runner;
    for (ImageFinding f : ImageFinding.values()) {
      BooleanProperty p = new SimpleBooleanProperty(this, f.name());
      p.addListener((o, a, b) -> apply());
      findingFilters.put(f, p);
    }
    root.addListener((o, a, b) -> apply());
    folder.addListener((o, a, b) -> apply());
    sort.addListener((o, a, b) -> apply());
    session.libraryProperty().addListener((o, a, b) -> reload());
    session.similarRequestProperty().addListener((o, a, r) -> {
      if (r != null) {
        findSimilar(r.source(), r.mode());
      }
    });
  }

  private record Loaded(List<ImageRow> rows, List<Folder> roots, Map<Long, Set<ImageFinding>> findings) {}

  /** Reloads every row and finding from the catalog (after opening it, or after indexing). */
  public void reload() {
    Library lib = session.library();
    clearSimilarState();
    if (lib == null) {
      all = List.of();
      findings = Map.of();
      roots.clear();
      apply();
      summary.set("No catalog open");
      return;
    }
    busy.set(true);
    message.set("");
    summary.set("Loading images…");
    runner.submit("load images", token -> {
      List<ImageRow> rows = lib.allImages();
      return new Loaded(rows, lib.folders(), CatalogFindings.load(lib, rows));
    }, loaded -> {
      busy.set(false);
      show(loaded.rows(), loaded.roots(), loaded.findings());
    }, e -> {
      busy.set(false);
      summary.set("");
      message.set(Messages.of(e));
    });
  }

  /** Installs loaded rows (package-private so the grid's scale test can feed 100,000 rows without a catalog). */
  void show(List<ImageRow> rows, List<Folder> rootList, Map<Long, Set<ImageFinding>> findingMap) {
    all = List.copyOf(rows);
    findings = findingMap;
    session.rows(all);
    roots.setAll(rootList);
    if (root.get() != null && !roots.contains(root.get())) {
      root.set(null);
    }
    apply();
  }

  /** Shows the images most similar to {@code source} (by look or by shape) in place of the full list. */
  public void findSimilar(ImageRow source, SimilarityMode mode) {
    if (source == null) {
      message.set("Select an image first, then search for similar ones (Ctrl+F).");
      return;
    }
    if (session.backends() == null) {
      message.set("Open a catalog first.");
      return;
    }
    if (pending != null) {
      pending.cancel();
    }
    searching.set(true);
    message.set("");
    searchTitle.set("Searching for images similar in " + mode.label() + " to " + session.name(source.id()) + "…");
    pending = runner.submit("find similar", token -> session.backends().similarity().similar(source.id(), mode,
        SIMILAR_LIMIT, token), matches -> showMatches(matches, "Similar in " + mode.label() + " to "
            + session.name(source.id())), e -> {
          searching.set(false);
          searchTitle.set("");
          message.set(Messages.of(e));
        });
  }

  /** Shows the catalog images most similar to an image file, which need not be in the catalog. */
  public void findSimilarToFile(Path file, SimilarityMode mode) {
    if (session.backends() == null) {
      message.set("Open a catalog first.");
      return;
    }
    if (pending != null) {
      pending.cancel();
    }
    String name = file.getFileName() == null ? file.toString() : file.getFileName().toString();
    searching.set(true);
    message.set("");
    searchTitle.set("Analysing " + name + " and searching…");
    pending = runner.submit("find similar to a file", token -> session.backends().similarity().similarToFile(file,
        mode, SIMILAR_LIMIT, token), matches -> showMatches(matches, "Similar in " + mode.label() + " to " + name),
        e -> {
          searching.set(false);
          searchTitle.set("");
          message.set(Messages.of(e));
        });
  }

  private void showMatches(List<Match> matches, String title) {
    searching.set(false);
    similar = matches;
    Map<Long, Double> d = new HashMap<>();
    for (Match m : matches) {
      d.put(m.id(), m.distance());
    }
    distances = d;
    searchTitle.set(title);
    sort.set(SortKey.SCORE);
    apply();
  }

  /** Back to the whole library. */
  public void clearSimilar() {
    clearSimilarState();
    if (sort.get() == SortKey.SCORE) {
      sort.set(SortKey.NAME);
    }
    apply();
  }

  private void clearSimilarState() {
    if (pending != null) {
      pending.cancel();
    }
    searching.set(false);
    similar = List.of();
    distances = Map.of();
    searchTitle.set("");
  }

  /** Recomputes the visible list from the rows, filters and sort. */
  void apply() {
    List<ImageRow> source;
    if (searchTitle.get().isEmpty() || searching.get()) {
      source = all;
    } else {
      source = new ArrayList<>();
      for (Match m : similar) {
        session.row(m.id()).ifPresent(source::add);
      }
    }
    Folder r = root.get();
    String f = folder.get() == null ? "" : folder.get().trim().toLowerCase(Locale.ROOT);
    List<ImageFinding> wanted = new ArrayList<>();
    findingFilters.forEach((finding, p) -> {
      if (p.get()) {
        wanted.add(finding);
      }
    });
    List<ImageRow> out = new ArrayList<>(source.size());
    for (ImageRow row : source) {
      if (r != null && row.rootId() != r.id()) {
        continue;
      }
      if (!f.isEmpty() && !ImageOrdering.folder(row).toLowerCase(Locale.ROOT).contains(f)) {
        continue;
      }
      if (!wanted.isEmpty()) {
        Set<ImageFinding> has = findings.getOrDefault(row.id(), Set.of());
        if (wanted.stream().noneMatch(has::contains)) {
          continue;
        }
      }
      out.add(row);
    }
    SortKey key = sort.get() == SortKey.SCORE && distances.isEmpty() ? SortKey.NAME : sort.get();
    out.sort(ImageOrdering.by(key, distances));
    visible.setAll(out);
    summary.set(String.format(Locale.ROOT, "%,d of %,d images", out.size(), all.size()));
  }

  /** The findings of an image (empty when none). */
  public Set<ImageFinding> findings(long id) {
    return findings.getOrDefault(id, Set.of());
  }

  /** The distance to the search image while a similarity search is shown, else NaN. */
  public double distance(long id) {
    return distances.getOrDefault(id, Double.NaN);
  }

  /** The root a row belongs to, as shown in the root filter. */
  public static String rootLabel(Folder root) {
    return root == null ? "All folders" : Path.of(root.path()).getFileName() + "  (" + root.path() + ")";
  }

  public ObservableList<ImageRow> visible() {
    return visible;
  }

  public ObservableList<Folder> roots() {
    return roots;
  }

  /** The root to show, or null for all. */
  public ObjectProperty<Folder> rootProperty() {
    return root;
  }

  /** A piece of the folder path to match (case-insensitive); empty shows all. */
  public StringProperty folderProperty() {
    return folder;
  }

  /** When any finding is on, only images with at least one of the chosen findings are shown. */
  public BooleanProperty findingProperty(ImageFinding finding) {
    return findingFilters.get(finding);
  }

  public ObjectProperty<SortKey> sortProperty() {
    return sort;
  }

  public ReadOnlyStringProperty summaryProperty() {
    return summary.getReadOnlyProperty();
  }

  /** What a similarity search shows ("Similar in shape to x.jpg"), or "" for the whole library. */
  public ReadOnlyStringProperty searchTitleProperty() {
    return searchTitle.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty busyProperty() {
    return busy.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty searchingProperty() {
    return searching.getReadOnlyProperty();
  }

  public Session session() {
    return session;
  }
}
