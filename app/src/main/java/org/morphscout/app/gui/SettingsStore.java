package org.morphscout.app.gui;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.Map;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Keeps {@link WindowSettings} in a small JSON file in the user's configuration folder ({@code browser.json}). A
 * missing or damaged file gives the defaults; writes go through a temporary file so a crash never leaves half a file.
 */
public final class SettingsStore {
  private static final Logger LOG = LoggerFactory.getLogger(SettingsStore.class);
  private static final ObjectMapper JSON = new ObjectMapper()
      .configure(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES, false)
      .configure(SerializationFeature.INDENT_OUTPUT, true);

  private final Path file;

  public SettingsStore(Path file) {
    this.file = file;
  }

  /**
   * The default location: {@code $XDG_CONFIG_HOME/morphscout} or {@code ~/.config/morphscout} on Linux and other
   * Unix systems, {@code %APPDATA%\Morphscout} on Windows, {@code ~/Library/Application Support/Morphscout} on macOS.
   */
  public static Path defaultFile(Map<String, String> env, String osName, Path home) {
    String os = osName.toLowerCase(Locale.ROOT);
    Path dir;
    if (os.contains("win") && env.get("APPDATA") != null) {
      dir = Path.of(env.get("APPDATA"), "Morphscout");
    } else if (os.contains("mac")) {
      dir = home.resolve("Library").resolve("Application Support").resolve("Morphscout");
    } else if (env.get("XDG_CONFIG_HOME") != null && !env.get("XDG_CONFIG_HOME").isBlank()) {
      dir = Path.of(env.get("XDG_CONFIG_HOME"), "morphscout");
    } else {
      dir = home.resolve(".config").resolve("morphscout");
    }
    return dir.resolve("browser.json");
  }

  public Path file() {
    return file;
  }

  public WindowSettings load() {
    if (!Files.isRegularFile(file)) {
      return WindowSettings.DEFAULTS;
    }
    try {
      return JSON.readValue(file.toFile(), WindowSettings.class);
    } catch (IOException | RuntimeException e) {
      LOG.warn("ignoring unreadable browser settings {}: {}", file, e.getMessage());
      return WindowSettings.DEFAULTS;
    }
  }

  public void save(WindowSettings settings) throws IOException {
    Files.createDirectories(file.toAbsolutePath().getParent());
    Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
    JSON.writeValue(tmp.toFile(), settings);
    Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
  }
}
