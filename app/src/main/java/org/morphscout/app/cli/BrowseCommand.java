package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.morphscout.app.gui.DisplayCheck;
import org.morphscout.app.gui.MorphscoutApp;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout browse}: the desktop browser on the catalog. */
@Command(
    name = "browse",
    mixinStandardHelpOptions = true,
    header = "Open the desktop browser on the catalog.",
    description = "Opens a window to look through the catalog: a thumbnail grid with filters and similarity search, "
        + "an inspector, chains between two images, pair suggestions to approve or reject (the same decisions the "
        + "decide and decisions commands use), walks, and indexing. Needs a display; press F1 in the window for the "
        + "keyboard shortcuts. When the catalog folder holds no catalog yet, the window says how to make one.")
final class BrowseCommand implements Callable<Integer> {
  private static final Logger LOG = LoggerFactory.getLogger(BrowseCommand.class);

  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Override
  public Integer call() {
    return open(root.catalogDir(), spec.commandLine().getErr());
  }

  /** Opens the browser on {@code catalog} and returns when its window closes; problems go to {@code err}. */
  static int open(Path catalog, PrintWriter err) {
    return open(catalog, err, System.getenv());
  }

  static int open(Path catalog, PrintWriter err, Map<String, String> env) {
    Optional<String> problem = DisplayCheck.problem(env, System.getProperty("os.name", ""),
        System.getProperty("java.awt.headless"));
    if (problem.isPresent()) {
      err.println("browse: cannot open a window: " + problem.get() + ".");
      return ExitCodes.ERROR;
    }
    try {
      MorphscoutApp.launch(catalog);
      return ExitCodes.OK;
    } catch (RuntimeException e) {
      // JavaFX reports a missing or refusing display as an unchecked exception from its startup
      LOG.debug("window startup failed", e);
      String m = String.valueOf(e.getMessage());
      String hint = m.contains("GTK") ? " (JavaFX needs GTK 3 on Linux: install it, for example apt-get install "
          + "libgtk-3-0)" : "";
      err.println("browse: cannot open a window: " + m + hint);
      return ExitCodes.ERROR;
    }
  }
}
