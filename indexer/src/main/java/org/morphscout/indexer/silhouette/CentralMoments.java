package org.morphscout.indexer.silhouette;

/**
 * Area, centroid and central moments up to order 3 of a binary mask, with pixel (x, y) at column x, row y (the same
 * coordinates as OpenCV's {@code moments} with {@code binaryImage = true}).
 *
 * <p>Computed in two passes (centroid first, then sums of centred powers) rather than from raw moments, which avoids
 * the cancellation that raw moments of large images suffer.
 *
 * @param m00 area in pixels
 * @param cx centroid column, in pixels
 * @param cy centroid row, in pixels
 */
record CentralMoments(
    double m00, double cx, double cy, double mu20, double mu11, double mu02, double mu30, double mu21, double mu12,
    double mu03) {

  static CentralMoments of(Mask mask) {
    int w = mask.width();
    int h = mask.height();
    double n = 0;
    double sx = 0;
    double sy = 0;
    for (int y = 0; y < h; y++) {
      int rowCount = 0;
      long rowSx = 0;
      for (int x = 0; x < w; x++) {
        if (mask.get(y * w + x)) {
          rowCount++;
          rowSx += x;
        }
      }
      n += rowCount;
      sx += rowSx;
      sy += (double) y * rowCount;
    }
    if (n == 0) {
      return new CentralMoments(0, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }
    double cx = sx / n;
    double cy = sy / n;
    double mu20 = 0, mu11 = 0, mu02 = 0, mu30 = 0, mu21 = 0, mu12 = 0, mu03 = 0;
    for (int y = 0; y < h; y++) {
      double dy = y - cy;
      for (int x = 0; x < w; x++) {
        if (mask.get(y * w + x)) {
          double dx = x - cx;
          double dx2 = dx * dx;
          double dy2 = dy * dy;
          mu20 += dx2;
          mu11 += dx * dy;
          mu02 += dy2;
          mu30 += dx2 * dx;
          mu21 += dx2 * dy;
          mu12 += dx * dy2;
          mu03 += dy2 * dy;
        }
      }
    }
    return new CentralMoments(n, cx, cy, mu20, mu11, mu02, mu30, mu21, mu12, mu03);
  }

  /**
   * Principal-axis angle in radians, in (-pi/2, pi/2], measured from the +x (column) axis towards +y (down the rows);
   * 0 for a shape without a preferred direction.
   */
  double orientation() {
    double theta = 0.5 * Math.atan2(2 * mu11, mu20 - mu02);
    return theta <= -Math.PI / 2 ? theta + Math.PI : theta;
  }
}
