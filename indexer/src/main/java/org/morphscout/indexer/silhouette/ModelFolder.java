package org.morphscout.indexer.silhouette;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;

/**
 * The per-user folder that holds downloaded models, shared by every catalog of that user: the folder given as an
 * option, else {@code $MORPHSCOUT_MODELS}, else {@code $XDG_DATA_HOME/morphscout/models}, else
 * {@code ~/.local/share/morphscout/models} (the XDG base-directory convention, common practice on Linux and used the
 * same way on macOS here).
 *
 * @param dir the folder (it need not exist yet)
 */
public record ModelFolder(Path dir) {
  /** The environment variable that names the folder. */
  public static final String ENV = "MORPHSCOUT_MODELS";

  public ModelFolder {
    if (dir == null) {
      throw new IllegalArgumentException("a model folder needs a path");
    }
    dir = dir.toAbsolutePath().normalize();
  }

  /** The folder for this process: {@code option}, else the environment, else the user's data folder. */
  public static ModelFolder resolve(Optional<Path> option) {
    return resolve(option, System.getenv(), Path.of(System.getProperty("user.home")));
  }

  /** As {@link #resolve(Optional)} with the environment and home folder given (for tests). */
  static ModelFolder resolve(Optional<Path> option, Map<String, String> env, Path home) {
    if (option.isPresent()) {
      return new ModelFolder(option.get());
    }
    String named = env.get(ENV);
    if (named != null && !named.isBlank()) {
      return new ModelFolder(Path.of(named));
    }
    String xdg = env.get("XDG_DATA_HOME");
    if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
      return new ModelFolder(Path.of(xdg, "morphscout", "models"));
    }
    return new ModelFolder(home.resolve(".local").resolve("share").resolve("morphscout").resolve("models"));
  }

  /** Where the salient-object model lives in this folder (whether or not it is there). */
  public Path salientModel() {
    return dir.resolve(SalientModelStore.FILE_NAME);
  }
}
