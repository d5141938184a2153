package org.morphscout.app.gui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.morphscout.app.gui.chains.ChainsViewModel;
import org.morphscout.app.gui.common.Messages;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.common.Session;
import org.morphscout.app.gui.indexing.IndexingViewModel;
import org.morphscout.app.gui.inspector.InspectorViewModel;
import org.morphscout.app.gui.library.LibraryViewModel;
import org.morphscout.app.gui.pairs.PairsViewModel;
import org.morphscout.app.gui.service.Backends;
import org.morphscout.app.gui.task.TaskRunner;
import org.morphscout.app.gui.walk.WalkthroughViewModel;
import org.morphscout.indexer.library.Library;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * The window's state: which catalog is open, the pane view-models, and cross-pane requests (find partners opens
 * Pairs, find similar opens Library). Opening a catalog happens on a worker thread; the old one is closed after the
 * new one is installed.
 */
public final class MainViewModel implements AutoCloseable {
  private static final Logger LOG = LoggerFactory.getLogger(MainViewModel.class);

  private final Session session = new Session();
  private final TaskRunner runner;
  private final Backends.Factory backends;
  private final LibraryViewModel library;
  private final InspectorViewModel inspector;
  private final ChainsViewModel chains;
  private final PairsViewModel pairs;
  private final WalkthroughViewModel walkthrough;
  private final IndexingViewModel indexing;

  private final ReadOnlyObjectWrapper<Path> catalogDir = new ReadOnlyObjectWrapper<>(this, "catalogDir");
  private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "Morphscout");
  private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
  private final ReadOnlyBooleanWrapper opening = new ReadOnlyBooleanWrapper(this, "opening");

  public MainViewModel(TaskRunner runner, Backends.Factory backends) {
    this.runner = runner;
    this.backends = backends;
    this.library = new LibraryViewModel(session, runner);
    this.inspector = new InspectorViewModel(session, runner);
    this.chains = new ChainsViewModel(session, runner);
    this.pairs = new PairsViewModel(session, runner);
    this.walkthrough = new WalkthroughViewModel(session, runner);
    this.indexing = new IndexingViewModel(session, runner, this::afterIndexing);
    session.partnersRequestProperty().addListener((o, a, r) -> {
      if (r != null) {
        session.paneProperty().set(Pane.PAIRS);
      }
    });
    session.similarRequestProperty().addListener((o, a, r) -> {
      if (r != null) {
        session.paneProperty().set(Pane.LIBRARY);
      }
    });
  }

  private record Opened(Library library, Backends backends) {}

  /**
   * Opens the catalog in {@code dir}; with {@code create} an empty one is made when none is there. On failure the
   * current catalog stays open and the message says why.
   */
  public void open(Path dir, boolean create) {
    Path folder = dir.toAbsolutePath().normalize();
    if (!create && !Files.exists(folder.resolve("catalog.db"))) {
      message.set("No catalog in " + folder + " yet. Create one there with File ▸ New catalog…, then add a "
          + "folder in Indexing.");
      return;
    }
    opening.set(true);
    message.set("Opening " + folder + "…");
    runner.submit("open catalog", token -> {
      Library lib = create ? Library.open(folder) : Library.openExisting(folder);
      try {
        return new Opened(lib, backends.create(lib));
      } catch (RuntimeException e) {
        lib.close();
        throw e;
      }
    }, opened -> {
      opening.set(false);
      Library old = session.library();
      Backends oldBackends = session.backends();
      session.install(opened.library(), opened.backends());
      if (oldBackends != null) {
        oldBackends.close();
      }
      catalogDir.set(opened.library().dir());
      title.set("Morphscout — " + opened.library().dir());
      message.set("");
      if (old != null) {
        closeQuietly(old);
      }
    }, e -> {
      opening.set(false);
      message.set(Messages.of(e));
    });
  }

  /**
   * After indexing, the backends are rebuilt (their cached vectors and the vector index reader predate the new
   * images) and the grid reloads.
   */
  private void afterIndexing() {
    Library lib = session.library();
    if (lib == null) {
      return;
    }
    runner.submit("refresh services", token -> backends.create(lib), fresh -> {
      Backends old = session.backends();
      if (session.library() == lib) {
        session.refreshBackends(fresh);
        library.reload();
      } else {
        fresh.close();
        return;
      }
      if (old != null) {
        old.close();
      }
    }, e -> message.set(Messages.of(e)));
  }

  /** Shows a message in the window's message line (for view-level problems such as a failed file dialog). */
  public void say(String text) {
    message.set(text);
  }

  @Override
  public void close() {
    Library lib = session.library();
    Backends b = session.backends();
    session.install(null, null);
    if (b != null) {
      b.close();
    }
    if (lib != null) {
      closeQuietly(lib);
    }
  }

  private static void closeQuietly(Library lib) {
    try {
      lib.close();
    } catch (RuntimeException e) {
      LOG.warn("closing catalog: {}", e.getMessage());
    }
  }

  /** Saves the window settings, logging (not showing) a failure: losing them is not worth interrupting a close. */
  public void saveSettings(SettingsStore store, WindowSettings settings) {
    Path dir = catalogDir.get();
    try {
      store.save(dir == null ? settings : settings.withLastCatalog(dir.toString()));
    } catch (IOException e) {
      LOG.warn("cannot save browser settings to {}: {}", store.file(), e.getMessage());
    }
  }

  public Session session() {
    return session;
  }

  public TaskRunner runner() {
    return runner;
  }

  public LibraryViewModel library() {
    return library;
  }

  public InspectorViewModel inspector() {
    return inspector;
  }

  public ChainsViewModel chains() {
    return chains;
  }

  public PairsViewModel pairs() {
    return pairs;
  }

  public WalkthroughViewModel walkthrough() {
    return walkthrough;
  }

  public IndexingViewModel indexing() {
    return indexing;
  }

  public ReadOnlyObjectProperty<Path> catalogDirProperty() {
    return catalogDir.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty titleProperty() {
    return title.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty messageProperty() {
    return message.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty openingProperty() {
    return opening.getReadOnlyProperty();
  }
}
