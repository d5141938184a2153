package org.morphscout.app.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Bucket grid over points in the unit square for k-nearest-neighbour look-ups when building synthetic graphs. Cells
 * hold about {@code k} points, so the 5x5 block around a point nearly always contains its k nearest; near the
 * border or in sparse spots the result may be approximate, which is fine for a synthetic graph.
 */
final class SpatialGrid {
  private final double[] x;
  private final double[] y;
  private final int side;
  private final int[][] cells;

  SpatialGrid(double[] x, double[] y, int k) {
    this.x = x;
    this.y = y;
    this.side = Math.max(1, (int) Math.sqrt((double) x.length / k));
    List<List<Integer>> lists = new ArrayList<>();
    for (int c = 0; c < side * side; c++) {
      lists.add(new ArrayList<>());
    }
    for (int i = 0; i < x.length; i++) {
      lists.get(cell(x[i], y[i])).add(i);
    }
    cells = new int[side * side][];
    for (int c = 0; c < cells.length; c++) {
      cells[c] = lists.get(c).stream().mapToInt(Integer::intValue).toArray();
    }
  }

  private int cell(double px, double py) {
    int gx = Math.min(side - 1, (int) (px * side));
    int gy = Math.min(side - 1, (int) (py * side));
    return gy * side + gx;
  }

  /** Side of a cell, in unit-square units (about the k-th neighbour distance). */
  double cellSize() {
    return 1.0 / side;
  }

  /** The k nearest points to point {@code i} among the surrounding 5x5 cells, not including {@code i}. */
  int[] nearest(int i, int k) {
    int cx = Math.min(side - 1, (int) (x[i] * side));
    int cy = Math.min(side - 1, (int) (y[i] * side));
    List<Integer> candidates = new ArrayList<>();
    for (int gy = Math.max(0, cy - 2); gy <= Math.min(side - 1, cy + 2); gy++) {
      for (int gx = Math.max(0, cx - 2); gx <= Math.min(side - 1, cx + 2); gx++) {
        for (int j : cells[gy * side + gx]) {
          if (j != i) {
            candidates.add(j);
          }
        }
      }
    }
    double[] d = new double[candidates.size()];
    Integer[] order = new Integer[candidates.size()];
    for (int c = 0; c < d.length; c++) {
      int j = candidates.get(c);
      d[c] = (x[i] - x[j]) * (x[i] - x[j]) + (y[i] - y[j]) * (y[i] - y[j]);
      order[c] = c;
    }
    Arrays.sort(order, (a, b) -> Double.compare(d[a], d[b]));
    int[] out = new int[Math.min(k, order.length)];
    for (int c = 0; c < out.length; c++) {
      out[c] = candidates.get(order[c]);
    }
    return out;
  }

  /** The point nearest to (px, py) within its cell's 3x3 block, or the first point when that block is empty. */
  int closestTo(double px, double py) {
    double cx = Math.max(0, Math.min(0.999999, px));
    double cy = Math.max(0, Math.min(0.999999, py));
    int gx0 = (int) (cx * side);
    int gy0 = (int) (cy * side);
    int best = 0;
    double bestD = Double.POSITIVE_INFINITY;
    for (int gy = Math.max(0, gy0 - 1); gy <= Math.min(side - 1, gy0 + 1); gy++) {
      for (int gx = Math.max(0, gx0 - 1); gx <= Math.min(side - 1, gx0 + 1); gx++) {
        for (int j : cells[gy * side + gx]) {
          double d = (cx - x[j]) * (cx - x[j]) + (cy - y[j]) * (cy - y[j]);
          if (d < bestD) {
            bestD = d;
            best = j;
          }
        }
      }
    }
    return best;
  }
}
