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
    // Rows into scratch. The interior needs no renormalisation (kernel sum precomputed); it runs one tap at a time
    // over the whole row, so the loops vectorise, with each pixel's sum taken in the same order as a per-pixel loop
    // (centre, then the pairs at distance 1, 2, ...), which keeps the result identical to the plain version.
    int lo0 = Math.min(radius, w);
    int hi0 = Math.max(lo0, w - radius);
    for (int y = 0; y < h; y++) {
      int row = y * w;
      float k0 = kernel[0];
      for (int i = row + lo0; i < row + hi0; i++) {
        scratch[i] = k0 * img[i];
      }
      for (int k = 1; k <= radius; k++) {
        float kv = kernel[k];
        for (int i = row + lo0; i < row + hi0; i++) {
          scratch[i] += kv * (img[i - k] + img[i + k]);
        }
      }
      for (int i = row + lo0; i < row + hi0; i++) {
        scratch[i] *= invSum;
      }
      for (int x = 0; x < w; x++) {
        if (x >= lo0 && x < hi0) {
          x = hi0 - 1;
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
