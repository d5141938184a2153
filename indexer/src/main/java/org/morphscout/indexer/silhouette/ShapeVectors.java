package org.morphscout.indexer.silhouette;

/**
 * The normalised soft silhouette: the mask resampled into a fixed grid around its centroid, scaled by sqrt(area).
 *
 * <p>Choices: the grid is centred on the centroid, and one grid cell spans sqrt(area) / (SCALE * grid) pixels, so
 * the object always covers about SCALE^2 = 16% of the grid (a 6:1 bar still fits along the grid). Each cell averages
 * SUPERSAMPLE x SUPERSAMPLE bilinear samples of the 0/1 mask; this departs from plain bilinear sampling of one point
 * per cell, which aliases badly when one cell covers tens of pixels. Then the optional Gaussian blur, then L2
 * normalisation (an empty mask gives the zero vector). Thread-safe (stateless).
 */
final class ShapeVectors {
  /** sqrt(area) spans this fraction of the grid side. */
  static final double SCALE = 0.4;

  private static final int SUPERSAMPLE = 4;

  private ShapeVectors() {}

  static float[] of(Mask mask, CentralMoments m, ShapeVectorOptions options) {
    int g = options.grid();
    float[] grid = new float[g * g];
    if (m.m00() == 0) {
      return grid;
    }
    double pixelsPerCell = Math.sqrt(m.m00()) / (SCALE * g);
    // Grid basis vectors in image pixels: ux for one cell along grid x, uy for one cell along grid y.
    double uxX = pixelsPerCell;
    double uxY = 0;
    double uyX = 0;
    double uyY = pixelsPerCell;
    if (options.rotateToPrincipalAxis()) {
      double theta = m.orientation();
      // A proper rotation taking grid y onto the principal axis (cos t, sin t) and grid x onto (sin t, -cos t).
      uxX = Math.sin(theta) * pixelsPerCell;
      uxY = -Math.cos(theta) * pixelsPerCell;
      uyX = Math.cos(theta) * pixelsPerCell;
      uyY = Math.sin(theta) * pixelsPerCell;
    }
    double half = g / 2.0;
    double step = 1.0 / SUPERSAMPLE;
    for (int gy = 0; gy < g; gy++) {
      for (int gx = 0; gx < g; gx++) {
        double sum = 0;
        for (int sy = 0; sy < SUPERSAMPLE; sy++) {
          double v = gy + (sy + 0.5) * step - half;
          for (int sx = 0; sx < SUPERSAMPLE; sx++) {
            double u = gx + (sx + 0.5) * step - half;
            sum += bilinear(mask, m.cx() + u * uxX + v * uyX, m.cy() + u * uxY + v * uyY);
          }
        }
        grid[gy * g + gx] = (float) (sum / (SUPERSAMPLE * SUPERSAMPLE));
      }
    }
    if (options.rotateToPrincipalAxis() && thirdMoment(grid, g, false) < 0) {
      rotate180(grid);
    }
    if (options.canonicalMirror() && thirdMoment(grid, g, true) > 0) {
      mirror(grid, g);
    }
    if (options.blurSigma() > 0) {
      GaussianBlur.blur(grid, g, g, options.blurSigma());
    }
    normalise(grid);
    return grid;
  }

  /** Bilinear value of the 0/1 mask at pixel coordinates (pixel centres at integers); 0 outside the image. */
  static double bilinear(Mask mask, double x, double y) {
    int x0 = (int) Math.floor(x);
    int y0 = (int) Math.floor(y);
    double fx = x - x0;
    double fy = y - y0;
    return (1 - fy) * ((1 - fx) * at(mask, x0, y0) + fx * at(mask, x0 + 1, y0))
        + fy * ((1 - fx) * at(mask, x0, y0 + 1) + fx * at(mask, x0 + 1, y0 + 1));
  }

  private static double at(Mask mask, int x, int y) {
    return x >= 0 && y >= 0 && x < mask.width() && y < mask.height() && mask.get(y * mask.width() + x) ? 1 : 0;
  }

  /** Third central moment of the grid's mass along x ({@code horizontal}) or y. */
  private static double thirdMoment(float[] grid, int g, boolean horizontal) {
    double n = 0;
    double s = 0;
    for (int i = 0; i < grid.length; i++) {
      n += grid[i];
      s += grid[i] * (horizontal ? i % g : i / g);
    }
    if (n == 0) {
      return 0;
    }
    double c = s / n;
    double m3 = 0;
    for (int i = 0; i < grid.length; i++) {
      double d = (horizontal ? i % g : i / g) - c;
      m3 += grid[i] * d * d * d;
    }
    return m3;
  }

  private static void rotate180(float[] grid) {
    for (int i = 0, j = grid.length - 1; i < j; i++, j--) {
      float t = grid[i];
      grid[i] = grid[j];
      grid[j] = t;
    }
  }

  private static void mirror(float[] grid, int g) {
    for (int y = 0; y < g; y++) {
      for (int i = y * g, j = y * g + g - 1; i < j; i++, j--) {
        float t = grid[i];
        grid[i] = grid[j];
        grid[j] = t;
      }
    }
  }

  private static void normalise(float[] v) {
    double ss = 0;
    for (float x : v) {
      ss += x * x;
    }
    if (ss == 0) {
      return;
    }
    float inv = (float) (1.0 / Math.sqrt(ss));
    for (int i = 0; i < v.length; i++) {
      v[i] *= inv;
    }
  }
}
