package org.morphscout.indexer.warp;

/**
 * Separable Gaussian smoothing of a flat float grid, in place. Near the border the kernel is cut and renormalised,
 * so a constant field (a pure translation) stays constant (up to float rounding). Not thread-safe (holds scratch);
 * make one per registration.
 */
final class GaussianSmoother {
  private final float[] kernel;
  private final int radius;
  private final int w;
  private final int h;
  private final float[] scratch;
  private final float invSum;

  /**
   * @param sigma standard deviation in pixels; 0 disables smoothing
   */
  GaussianSmoother(double sigma, int w, int h) {
    this.w = w;
    this.h = h;
    this.radius = sigma <= 0 ? 0 : (int) Math.ceil(3 * sigma);
    this.kernel = new float[radius + 1];
    if (radius == 0) {
      kernel[0] = 1;
    } else {
      for (int k = 0; k <= radius; k++) {
        kernel[k] = (float) Math.exp(-0.5 * k * k / (sigma * sigma));
      }
    }
    this.scratch = new float[w * h];
    float sum = kernel[0];
    for (int k = 1; k <= radius; k++) {
      sum += 2 * kernel[k];
    }
    this.invSum = 1f / sum;
  }

  void smooth(float[] img) {
    if (radius == 0) {
      return;
    }
    // Rows into scratch; the interior needs no renormalisation (kernel sum precomputed).
    for (int y = 0; y < h; y++) {
      int row = y * w;
      for (int x = 0; x < w; x++) {
        if (x >= radius && x < w - radius) {
          float acc = kernel[0] * img[row + x];
          for (int k = 1; k <= radius; k++) {
            acc += kernel[k] * (img[row + x - k] + img[row + x + k]);
          }
          scratch[row + x] = acc * invSum;
          continue;
        }
        float acc = kernel[0] * img[row + x];
        float norm = kernel[0];
        int lo = Math.max(-radius, -x);
        int hi = Math.min(radius, w - 1 - x);
        for (int k = lo; k < 0; k++) {
          acc += kernel[-k] * img[row + x + k];
          norm += kernel[-k];
        }
        for (int k = 1; k <= hi; k++) {
          acc += kernel[k] * img[row + x + k];
          norm += kernel[k];
        }
        scratch[row + x] = acc / norm;
      }
    }
    // Columns back into img.
    for (int y = 0; y < h; y++) {
      int lo = Math.max(-radius, -y);
      int hi = Math.min(radius, h - 1 - y);
      float norm = kernel[0];
      for (int k = lo; k <= hi; k++) {
        if (k != 0) {
          norm += kernel[Math.abs(k)];
        }
      }
      float inv = 1f / norm;
      int row = y * w;
      for (int x = 0; x < w; x++) {
        img[row + x] = kernel[0] * scratch[row + x];
      }
      for (int k = lo; k <= hi; k++) {
        if (k == 0) {
          continue;
        }
        float kv = kernel[Math.abs(k)];
        int src = (y + k) * w;
        for (int x = 0; x < w; x++) {
          img[row + x] += kv * scratch[src + x];
        }
      }
      for (int x = 0; x < w; x++) {
        img[row + x] *= inv;
      }
    }
  }
}
