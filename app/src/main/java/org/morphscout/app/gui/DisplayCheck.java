package org.morphscout.app.gui;

import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/** Decides, before starting JavaFX, whether a window can be shown at all, so the command fails with a clear message. */
public final class DisplayCheck {
  private DisplayCheck() {}

  /**
   * Why no window can be opened, or empty when one can. On Linux and other X11/Wayland systems a display is needed
   * ({@code DISPLAY} or {@code WAYLAND_DISPLAY}); Windows and macOS always have one for a logged-in user.
   *
   * @param awtHeadless the {@code java.awt.headless} system property, set on servers and in CI
   */
  public static Optional<String> problem(Map<String, String> env, String osName, String awtHeadless) {
    if ("true".equalsIgnoreCase(awtHeadless)) {
      return Optional.of("no display: Java runs headless here (java.awt.headless=true), so no window can open");
    }
    String os = osName.toLowerCase(Locale.ROOT);
    if (os.contains("win") || os.contains("mac")) {
      return Optional.empty();
    }
    if (blank(env.get("DISPLAY")) && blank(env.get("WAYLAND_DISPLAY"))) {
      return Optional.of("no display: neither DISPLAY nor WAYLAND_DISPLAY is set (run it on a desktop, or over "
          + "ssh -X; the command-line commands work without one)");
    }
    return Optional.empty();
  }

  private static boolean blank(String s) {
    return s == null || s.isBlank();
  }
}
