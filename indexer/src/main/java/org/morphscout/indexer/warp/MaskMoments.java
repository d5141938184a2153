package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Zeroth, first and central second moments of a mask, in continuous pixel coordinates (pixel centres at
 * {@code i + 0.5}), plus the bounding box and the largest distance of an object pixel from the centroid.
 */
record MaskMoments(
    int area, double cx, double cy, double mu20, double mu02, double mu11, double minX, double minY, double maxX,
    double maxY, double radius) {

  static MaskMoments of(Mask mask) {
    int w = mask.width();
    int h = mask.height();
    byte[] d = mask.data();
    long n = 0;
    double sx = 0;
    double sy = 0;
    int minX = w;
    int minY = h;
    int maxX = -1;
    int maxY = -1;
    for (int y = 0, i = 0; y < h; y++) {
      for (int x = 0; x < w; x++, i++) {
        if (d[i] != 0) {
          n++;
          sx += x;
          sy += y;
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x);
          minY = Math.min(minY, y);
          maxY = Math.max(maxY, y);
        }
      }
    }
    if (n == 0) {
      throw new IllegalArgumentException("mask is empty: no object to align");
    }
    double cx = sx / n + 0.5;
    double cy = sy / n + 0.5;
    double m20 = 0;
    double m02 = 0;
    double m11 = 0;
    double r2 = 0;
    for (int y = minY; y <= maxY; y++) {
      double dy = y + 0.5 - cy;
      for (int x = minX, i = y * w + minX; x <= maxX; x++, i++) {
        if (d[i] != 0) {
          double dx = x + 0.5 - cx;
          m20 += dx * dx;
          m02 += dy * dy;
          m11 += dx * dy;
          r2 = Math.max(r2, dx * dx + dy * dy);
        }
      }
    }
    // +0.71: half a pixel diagonal, so the radius covers the whole of the farthest pixel.
    return new MaskMoments((int) n, cx, cy, m20 / n, m02 / n, m11 / n, minX, minY, maxX + 1.0, maxY + 1.0,
        Math.sqrt(r2) + 0.71);
  }

  /** Principal-axis angle in radians, in (-pi/2, pi/2] (common practice: 0.5 atan2(2 mu11, mu20 - mu02)). */
  double orientation() {
    return 0.5 * Math.atan2(2 * mu11, mu20 - mu02);
  }

  /**
   * How elongated the second moments are: (l1 - l2) / (l1 + l2) of their eigenvalues, in [0, 1]; near 0 the
   * principal axis is ill-defined.
   */
  double anisotropy() {
    double tr = mu20 + mu02;
    double diff = Math.hypot(mu20 - mu02, 2 * mu11);
    return tr <= 0 ? 0 : diff / tr;
  }
}
