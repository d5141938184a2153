package org.morphscout.indexer.warp;

/**
 * Separable Gaussian smoothing of a flat float grid, in place. Near the border the kernel is cut and renormalised,
 * so a constant field (a pure translation) stays constant (up to float rounding). Not thread-safe (holds scratch);
 * make one per registration.
 *
 * <p>Every pixel's sum is taken in a fixed order (rows: the centre, then the pairs at distance 1, 2, ...; columns:
 * the centre, then the taps from the top down), the same as a plain per-pixel loop, so the result is identical to
 * one ({@code ReferenceKernelsTest}). For speed, the interior of each pass runs tap by tap over the whole grid as one
 * long loop (a loop per row of 16 to 64 pixels spends much of its time entering and leaving), and each tap first
 * copies its shifted source into a scratch array so the loop reads and writes the same index: the JIT does not
 * vectorise a loop that reads one array at an offset from where it writes another, since it cannot rule out that
 * they are the same array. The pixels near a row's ends, whose kernel is cut, are then computed column by column.
 */
final class GaussianSmoother {
  private final float[] kernel;
  private final int radius;
  private final int w;
  private final int h;
  private final float[] scratch;
  /** Shifted copies of a pass's source. */
  private final float[] lower;
  private final float[] upper;
  /** 1 / the whole kernel's sum, added in the order of the row pass (centre, then twice each side tap). */
  private final float invRowSum;
  /** 1 / the whole kernel's sum, added in the order of the column pass (centre, then the taps from the top down). */
  private final float invColumnSum;

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
    this.lower = new float[w * h];
    this.upper = new float[w * h];
    float sum = kernel[0];
    for (int k = 1; k <= radius; k++) {
      sum += 2 * kernel[k];
    }
    this.invRowSum = 1f / sum;
    this.invColumnSum = 1f / columnNorm(-radius, radius);
  }

  void smooth(float[] img) {
    if (radius == 0) {
      return;
    }
    smoothRows(img);
    smoothColumns(img);
  }

  /** img's rows into scratch. */
  private void smoothRows(float[] img) {
    int n = w * h;
    // Interior formula over the whole grid; it also writes the pixels within the radius of a row's ends (reading
    // the neighbouring row), which the border loop below then overwrites.
    if (w > 2 * radius) {
      int from = radius;
      int to = n - radius;
      float k0 = kernel[0];
      for (int i = from; i < to; i++) {
        scratch[i] = k0 * img[i];
      }
      for (int k = 1; k <= radius; k++) {
        float kv = kernel[k];
        System.arraycopy(img, from - k, lower, from, to - from);
        System.arraycopy(img, from + k, upper, from, to - from);
        for (int i = from; i < to; i++) {
          scratch[i] += kv * (lower[i] + upper[i]);
        }
      }
      for (int i = from; i < to; i++) {
        scratch[i] *= invRowSum;
      }
    }
    // The pixels whose kernel the row's ends cut, one column at a time: the taps and their sum are the same down a
    // column.
    int lo0 = Math.min(radius, w);
    int hi0 = Math.max(lo0, w - radius);
    for (int x = 0; x < w; x++) {
      if (x == lo0 && hi0 > lo0) {
        x = hi0 - 1;
        continue;
      }
      int lo = Math.max(-radius, -x);
      int hi = Math.min(radius, w - 1 - x);
      float norm = kernel[0];
      for (int k = lo; k < 0; k++) {
        norm += kernel[-k];
      }
      for (int k = 1; k <= hi; k++) {
        norm += kernel[k];
      }
      for (int i = x; i < n; i += w) {
        float acc = kernel[0] * img[i];
        for (int k = lo; k < 0; k++) {
          acc += kernel[-k] * img[i + k];
        }
        for (int k = 1; k <= hi; k++) {
          acc += kernel[k] * img[i + k];
        }
        scratch[i] = acc / norm;
      }
    }
  }

  /** scratch's columns back into img. */
  private void smoothColumns(float[] img) {
    // Rows with the whole kernel inside, as one long loop per tap.
    if (h > 2 * radius) {
      int from = radius * w;
      int to = (h - radius) * w;
      float k0 = kernel[0];
      for (int i = from; i < to; i++) {
        img[i] = k0 * scratch[i];
      }
      for (int k = -radius; k <= radius; k++) {
        if (k == 0) {
          continue;
        }
        float kv = kernel[Math.abs(k)];
        System.arraycopy(scratch, from + k * w, lower, from, to - from);
        for (int i = from; i < to; i++) {
          img[i] += kv * lower[i];
        }
      }
      for (int i = from; i < to; i++) {
        img[i] *= invColumnSum;
      }
    }
    for (int y = 0; y < h; y++) {
      if (y == radius && h > 2 * radius) {
        y = h - radius - 1;
        continue;
      }
      int lo = Math.max(-radius, -y);
      int hi = Math.min(radius, h - 1 - y);
      float inv = 1f / columnNorm(lo, hi);
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

  /** The sum of the taps lo..hi (lo <= 0 <= hi): the centre, then the others from lo up. */
  private float columnNorm(int lo, int hi) {
    float norm = kernel[0];
    for (int k = lo; k <= hi; k++) {
      if (k != 0) {
        norm += kernel[Math.abs(k)];
      }
    }
    return norm;
  }
}
