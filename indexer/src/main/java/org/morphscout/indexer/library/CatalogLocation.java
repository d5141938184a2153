package org.morphscout.indexer.library;

import java.nio.file.Path;
import java.util.Map;

/** Where the catalog folder is: {@code --catalog DIR}, else {@code MORPHSCOUT_CATALOG}, else ./morphscout-catalog. */
public final class CatalogLocation {
  /** The environment variable that names the catalog folder. */
  public static final String ENV = "MORPHSCOUT_CATALOG";
  /** The default folder name, relative to the working directory. */
  public static final String DEFAULT_FOLDER = "morphscout-catalog";

  private CatalogLocation() {}

  /** Resolves the folder from an explicit option (may be null) and the environment. */
  public static Path resolve(Path explicit, Map<String, String> env) {
    if (explicit != null) {
      return explicit.toAbsolutePath().normalize();
    }
    String fromEnv = env.get(ENV);
    if (fromEnv != null && !fromEnv.isBlank()) {
      return Path.of(fromEnv).toAbsolutePath().normalize();
    }
    return Path.of(DEFAULT_FOLDER).toAbsolutePath().normalize();
  }
}
