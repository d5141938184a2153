package org.morphscout.app.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** Placeholder until the browser lands. */
@Command(name = "browse", mixinStandardHelpOptions = true, header = "Open the desktop browser on the catalog.")
final class BrowseCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;

  @Override
  public Integer call() {
    return open(root.catalogDir(), spec.commandLine().getErr());
  }

  static int open(Path catalog, PrintWriter err) {
    err.println("browse: not available in this build");
    return ExitCodes.ERROR;
  }
}
