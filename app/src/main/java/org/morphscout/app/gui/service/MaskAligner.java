package org.morphscout.app.gui.service;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Aligns two silhouettes for display and a quick overlap figure: each is translated so its centroid sits at the grid
 * centre and scaled so its area becomes {@link #AREA_FRACTION} of the grid (translation + isotropic scale, the
 * normalisation used for moment-based shape comparison; no rotation). Sampling is nearest-neighbour. Stateless.
 */
public final class MaskAligner {
  /** Object area after alignment, as a fraction of the grid: small enough that elongated shapes stay inside. */
  static final double AREA_FRACTION = 0.18;

  private MaskAligner() {}

  /** Aligns both masks onto a {@code size} x {@code size} grid (size 16..1024). */
  public static AlignedMasks align(Mask a, Mask b, int size) {
    if (size < 16 || size > 1024) {
      throw new IllegalArgumentException("grid size must be 16..1024, got " + size);
    }
    Mask ga = normalise(a, size);
    Mask gb = normalise(b, size);
    return new AlignedMasks(ga, gb, ga.iou(gb));
  }

  static Mask normalise(Mask m, int size) {
    int area = m.area();
    if (area == 0) {
      return Mask.empty(size, size);
    }
    double cx = 0;
    double cy = 0;
    for (int y = 0; y < m.height(); y++) {
      for (int x = 0; x < m.width(); x++) {
        if (m.get(x, y)) {
          cx += x + 0.5;
          cy += y + 0.5;
        }
      }
    }
    cx /= area;
    cy /= area;
    // grid px per source px, so that area * scale^2 = AREA_FRACTION * size^2
    double scale = Math.sqrt(AREA_FRACTION * size * size / area);
    byte[] out = new byte[size * size];
    double half = size / 2.0;
    for (int gy = 0; gy < size; gy++) {
      int sy = (int) Math.floor((gy + 0.5 - half) / scale + cy);
      if (sy < 0 || sy >= m.height()) {
        continue;
      }
      for (int gx = 0; gx < size; gx++) {
        int sx = (int) Math.floor((gx + 0.5 - half) / scale + cx);
        if (sx >= 0 && sx < m.width() && m.get(sx, sy)) {
          out[gy * size + gx] = 1;
        }
      }
    }
    return new Mask(size, size, out);
  }
}
