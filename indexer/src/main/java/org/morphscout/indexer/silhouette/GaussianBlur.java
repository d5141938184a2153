package org.morphscout.indexer.silhouette;

/**
 * Separable Gaussian blur of a float plane, kernel truncated at 3 sigma and renormalised, borders clamped (edge
 * pixels repeated). In place. Thread-safe (stateless).
 */
final class GaussianBlur {
  private GaussianBlur() {}

  static void blur(float[] plane, int width, int height, double sigma) {
    if (sigma <= 0) {
      return;
    }
    int r = Math.max(1, (int) Math.ceil(3 * sigma));
    float[] k = new float[2 * r + 1];
    double sum = 0;
    for (int i = -r; i <= r; i++) {
      double v = Math.exp(-(i * i) / (2 * sigma * sigma));
      k[i + r] = (float) v;
      sum += v;
    }
    for (int i = 0; i < k.length; i++) {
      k[i] /= (float) sum;
    }
    float[] line = new float[Math.max(width, height)];
    for (int y = 0; y < height; y++) {
      int row = y * width;
      System.arraycopy(plane, row, line, 0, width);
      for (int x = 0; x < width; x++) {
        float acc = 0;
        for (int j = -r; j <= r; j++) {
          int xx = Math.min(width - 1, Math.max(0, x + j));
          acc += k[j + r] * line[xx];
        }
        plane[row + x] = acc;
      }
    }
    for (int x = 0; x < width; x++) {
      for (int y = 0; y < height; y++) {
        line[y] = plane[y * width + x];
      }
      for (int y = 0; y < height; y++) {
        float acc = 0;
        for (int j = -r; j <= r; j++) {
          int yy = Math.min(height - 1, Math.max(0, y + j));
          acc += k[j + r] * line[yy];
        }
        plane[y * width + x] = acc;
      }
    }
  }
}
