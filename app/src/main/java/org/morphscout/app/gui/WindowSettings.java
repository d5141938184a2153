package org.morphscout.app.gui;

import org.morphscout.app.gui.common.Pane;

/**
 * What the window remembers between runs.
 *
 * @param lastCatalog absolute path of the last catalog opened, or "" for none
 * @param x window left, in screen pixels (NaN = let the system place it)
 * @param y window top, in screen pixels (NaN = let the system place it)
 * @param width window width, at least 640 (default 1280)
 * @param height window height, at least 420 (default 820)
 * @param maximized whether the window was maximised
 * @param pane the pane shown last
 * @param inspectorDivider position of the divider between panes and inspector, in (0, 1) (default 0.76)
 */
public record WindowSettings(String lastCatalog, double x, double y, double width, double height, boolean maximized,
    Pane pane, double inspectorDivider) {
  public static final WindowSettings DEFAULTS =
      new WindowSettings("", Double.NaN, Double.NaN, 1280, 820, false, Pane.LIBRARY, 0.76);

  public WindowSettings {
    lastCatalog = lastCatalog == null ? "" : lastCatalog;
    width = Double.isFinite(width) ? Math.max(640, width) : 1280;
    height = Double.isFinite(height) ? Math.max(420, height) : 820;
    pane = pane == null ? Pane.LIBRARY : pane;
    inspectorDivider = inspectorDivider > 0.2 && inspectorDivider < 0.95 ? inspectorDivider : 0.76;
  }

  public WindowSettings withLastCatalog(String dir) {
    return new WindowSettings(dir, x, y, width, height, maximized, pane, inspectorDivider);
  }
}
