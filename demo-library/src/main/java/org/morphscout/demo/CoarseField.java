package org.morphscout.demo;

/**
 * A slowly varying scalar field sampled every {@value #STEP} pixels and read back with bilinear interpolation:
 * large-scale noise (paper blotches, cloth folds, plaster) costs one evaluation per 64 pixels instead of one per
 * pixel. Only for fields whose finest detail is several times the step.
 */
final class CoarseField {
  static final int STEP = 8;

  @FunctionalInterface
  interface Source {
    /** Field value at pixel coordinates (x, y). */
    double at(double x, double y);
  }

  private final int gw;
  private final double[] grid;

  CoarseField(int width, int height, Source source) {
    this.gw = width / STEP + 2;
    int gh = height / STEP + 2;
    this.grid = new double[gw * gh];
    for (int j = 0; j < gh; j++) {
      for (int i = 0; i < gw; i++) {
        grid[j * gw + i] = source.at(i * STEP, j * STEP);
      }
    }
  }

  double at(int x, int y) {
    int i = x / STEP;
    int j = y / STEP;
    double fx = (x - i * STEP) / (double) STEP;
    double fy = (y - j * STEP) / (double) STEP;
    int k = j * gw + i;
    double top = grid[k] + (grid[k + 1] - grid[k]) * fx;
    double bottom = grid[k + gw] + (grid[k + gw + 1] - grid[k + gw]) * fx;
    return top + (bottom - top) * fy;
  }
}
