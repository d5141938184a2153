package org.morphscout.app.gui;

import java.util.List;
import javafx.scene.Scene;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import org.morphscout.app.gui.common.Pane;

/**
 * The browser's keyboard shortcuts: the one list shown under Help and the handler that acts on them. Single-letter
 * keys act only when no text field has the focus, so typing a note or a filter never triggers them.
 */
public final class Shortcuts {
  /** A documented shortcut. */
  public record Shortcut(String keys, String action) {}

  public static final List<Shortcut> ALL = List.of(
      new Shortcut("Ctrl+O", "Open a catalog"),
      new Shortcut("Ctrl+1 … Ctrl+5", "Show Images, Chains, Pairs, Walk, Indexing"),
      new Shortcut("Arrow keys", "Move the selection in the grid"),
      new Shortcut("Ctrl+click / Shift+click", "Add to / extend the selection (for walks)"),
      new Shortcut("Ctrl+F", "Find images similar in appearance to the selected one"),
      new Shortcut("Ctrl+Shift+F", "Find images similar in shape"),
      new Shortcut("Escape", "Back from a similarity search to the whole library"),
      new Shortcut("S / E", "Use the selected image as chain start / end"),
      new Shortcut("P", "Find partners of the selected image (opens Pairs)"),
      new Shortcut("Space", "Show or hide the silhouette in the inspector"),
      new Shortcut("Ctrl+Enter", "Run: find chains (Chains), order smoothly (Walk)"),
      new Shortcut("A / R", "Approve / reject the chosen pair (Pairs)"),
      new Shortcut("N", "Write a note on the chosen pair (Pairs)"),
      new Shortcut("Alt+Left / Alt+Right", "Move the chosen image in the walk strip"),
      new Shortcut("F1", "Show this list"));

  private Shortcuts() {}

  /** Installs the handler on {@code scene}, acting through {@code view}. */
  static void install(Scene scene, MainView view) {
    scene.addEventHandler(KeyEvent.KEY_PRESSED, e -> {
      if (handle(e, view, scene)) {
        e.consume();
      }
    });
  }

  private static boolean handle(KeyEvent e, MainView view, Scene scene) {
    MainViewModel vm = view.viewModel();
    Pane pane = vm.session().paneProperty().get();
    KeyCode k = e.getCode();
    if (e.isShortcutDown()) {
      if (k.isDigitKey() && k.ordinal() >= KeyCode.DIGIT1.ordinal() && k.ordinal() <= KeyCode.DIGIT5.ordinal()) {
        vm.session().paneProperty().set(Pane.values()[k.ordinal() - KeyCode.DIGIT1.ordinal()]);
        return true;
      }
      switch (k) {
        case F -> {
          vm.inspector().findSimilar(e.isShiftDown() ? org.morphscout.app.gui.service.SimilarityMode.SHAPE
              : org.morphscout.app.gui.service.SimilarityMode.APPEARANCE);
          return true;
        }
        case ENTER -> {
          if (pane == Pane.CHAINS) {
            vm.chains().run();
          } else if (pane == Pane.WALKTHROUGH) {
            vm.walkthrough().order();
          } else {
            return false;
          }
          return true;
        }
        case O -> {
          view.openCatalogDialog(false);
          return true;
        }
        default -> {
          return false;
        }
      }
    }
    if (k == KeyCode.F1) {
      view.showShortcuts();
      return true;
    }
    if (e.isAltDown() || e.isControlDown() || e.isMetaDown()
        || scene.getFocusOwner() instanceof TextInputControl) {
      return false;
    }
    switch (k) {
      case ESCAPE -> {
        if (pane == Pane.LIBRARY && !vm.library().searchTitleProperty().get().isEmpty()) {
          vm.library().clearSimilar();
          return true;
        }
        return false;
      }
      case S -> vm.inspector().useAsStart();
      case E -> vm.inspector().useAsEnd();
      case P -> vm.inspector().findPartners();
      case SPACE -> vm.inspector().overlayProperty().set(!vm.inspector().overlayProperty().get());
      case A, R, N -> {
        if (pane != Pane.PAIRS) {
          return false;
        }
        if (k == KeyCode.A) {
          view.pairs().approveSelected();
        } else if (k == KeyCode.R) {
          view.pairs().rejectSelected();
        } else {
          view.pairs().focusNote();
        }
      }
      default -> {
        return false;
      }
    }
    return true;
  }
}
