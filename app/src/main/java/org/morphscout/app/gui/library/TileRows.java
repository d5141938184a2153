package org.morphscout.app.gui.library;

import java.util.ArrayList;
import java.util.List;

/** Splits the visible images into rows of {@code columns} tiles for the virtualised grid. */
final class TileRows {
  private TileRows() {}

  static <T> List<List<T>> split(List<T> items, int columns) {
    if (columns < 1) {
      throw new IllegalArgumentException("columns must be >= 1, got " + columns);
    }
    List<List<T>> rows = new ArrayList<>((items.size() + columns - 1) / columns);
    for (int i = 0; i < items.size(); i += columns) {
      rows.add(items.subList(i, Math.min(items.size(), i + columns)));
    }
    return rows;
  }

  /** How many tiles of {@code tile} px with {@code gap} px between fit into {@code width} px (at least 1). */
  static int columns(double width, double tile, double gap) {
    return Math.max(1, (int) Math.floor((width + gap) / (tile + gap)));
  }
}
