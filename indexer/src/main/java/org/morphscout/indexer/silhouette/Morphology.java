package org.morphscout.indexer.silhouette;

/**
 * Binary erosion, dilation, opening and closing on row-major 0/1 masks.
 *
 * <p>Disk elements are {(dx, dy) : dx^2 + dy^2 <= r^2}; they are applied through an exact squared Euclidean distance
 * transform (P. Felzenszwalb and D. Huttenlocher, "Distance transforms of sampled functions", Theory of Computing 8,
 * 2012), so the cost does not grow with the radius. Square elements ((2r+1) x (2r+1)) are applied separably with
 * running counts. Pixels outside the image are neutral: they neither dilate into the image nor erode it, so an object
 * cut by the frame keeps its cut edge (the same as OpenCV's default border for these operations). Stateless and
 * thread-safe; inputs are not modified.
 */
public final class Morphology {
  /** The shape of the structuring element. */
  public enum Element {
    DISK,
    SQUARE
  }

  private static final float INF = 1e20f;

  private Morphology() {}

  public static byte[] dilate(byte[] mask, int width, int height, Element element, int radius) {
    check(mask, width, height, radius);
    if (radius == 0) {
      return mask.clone();
    }
    return element == Element.DISK
        ? withinDistance(mask, width, height, (byte) 1, radius)
        : squareAny(mask, width, height, radius, (byte) 1);
  }

  public static byte[] erode(byte[] mask, int width, int height, Element element, int radius) {
    check(mask, width, height, radius);
    if (radius == 0) {
      return mask.clone();
    }
    // Erosion of A is the complement of the dilation of the complement of A (outside stays neutral in both).
    byte[] grown =
        element == Element.DISK
            ? withinDistance(mask, width, height, (byte) 0, radius)
            : squareAny(mask, width, height, radius, (byte) 0);
    byte[] out = new byte[mask.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = (byte) (grown[i] == 0 ? 1 : 0);
    }
    return out;
  }

  /** Erosion then dilation: removes specks and thin spurs narrower than the element. */
  public static byte[] open(byte[] mask, int width, int height, Element element, int radius) {
    return dilate(erode(mask, width, height, element, radius), width, height, element, radius);
  }

  /** Dilation then erosion: closes gaps and dents narrower than the element. */
  public static byte[] close(byte[] mask, int width, int height, Element element, int radius) {
    return erode(dilate(mask, width, height, element, radius), width, height, element, radius);
  }

  public static Mask open(Mask mask, Element element, int radius) {
    return new Mask(mask.width(), mask.height(), open(mask.data(), mask.width(), mask.height(), element, radius));
  }

  public static Mask close(Mask mask, Element element, int radius) {
    return new Mask(mask.width(), mask.height(), close(mask.data(), mask.width(), mask.height(), element, radius));
  }

  /**
   * Marks (with 1) every pixel within Euclidean distance {@code radius} of a pixel whose value is {@code feature}.
   */
  private static byte[] withinDistance(byte[] mask, int width, int height, byte feature, int radius) {
    float[] d = squaredDistance(mask, width, height, feature);
    float limit = (float) radius * radius;
    byte[] out = new byte[mask.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = (byte) (d[i] <= limit ? 1 : 0);
    }
    return out;
  }

  /**
   * Squared Euclidean distance from each pixel to the nearest pixel holding {@code feature}; {@code 1e20} when there
   * is none.
   */
  static float[] squaredDistance(byte[] mask, int width, int height, byte feature) {
    float[] g = new float[mask.length];
    for (int i = 0; i < g.length; i++) {
      g[i] = (mask[i] != 0) == (feature != 0) ? 0f : INF;
    }
    int n = Math.max(width, height);
    float[] f = new float[n];
    float[] out = new float[n];
    int[] v = new int[n];
    float[] z = new float[n + 1];
    for (int x = 0; x < width; x++) {
      for (int y = 0; y < height; y++) {
        f[y] = g[y * width + x];
      }
      transform1d(f, height, out, v, z);
      for (int y = 0; y < height; y++) {
        g[y * width + x] = out[y];
      }
    }
    for (int y = 0; y < height; y++) {
      System.arraycopy(g, y * width, f, 0, width);
      transform1d(f, width, out, v, z);
      System.arraycopy(out, 0, g, y * width, width);
    }
    return g;
  }

  /** Felzenszwalb-Huttenlocher lower envelope of parabolas for one line of length {@code n}. */
  private static void transform1d(float[] f, int n, float[] d, int[] v, float[] z) {
    int k = 0;
    int first = 0;
    while (first < n && f[first] >= INF) {
      first++;
    }
    if (first == n) {
      for (int q = 0; q < n; q++) {
        d[q] = INF;
      }
      return;
    }
    v[0] = first;
    z[0] = Float.NEGATIVE_INFINITY;
    z[1] = Float.POSITIVE_INFINITY;
    for (int q = first + 1; q < n; q++) {
      if (f[q] >= INF) {
        continue; // infinite parabolas never form part of the envelope
      }
      float s = intersection(f, q, v[k]);
      while (s <= z[k]) {
        k--;
        s = intersection(f, q, v[k]);
      }
      k++;
      v[k] = q;
      z[k] = s;
      z[k + 1] = Float.POSITIVE_INFINITY;
    }
    k = 0;
    for (int q = 0; q < n; q++) {
      while (z[k + 1] < q) {
        k++;
      }
      float dq = q - v[k];
      d[q] = dq * dq + f[v[k]];
    }
  }

  private static float intersection(float[] f, int q, int p) {
    return ((f[q] + (float) q * q) - (f[p] + (float) p * p)) / (2f * q - 2f * p);
  }

  /** Marks pixels whose (2r+1)-square window holds at least one pixel with value {@code feature}. */
  private static byte[] squareAny(byte[] mask, int width, int height, int r, byte feature) {
    byte[] rows = new byte[mask.length];
    int[] prefix = new int[Math.max(width, height) + 1];
    boolean want = feature != 0;
    for (int y = 0; y < height; y++) {
      int row = y * width;
      for (int x = 0; x < width; x++) {
        prefix[x + 1] = prefix[x] + (((mask[row + x] != 0) == want) ? 1 : 0);
      }
      for (int x = 0; x < width; x++) {
        int lo = Math.max(0, x - r);
        int hi = Math.min(width, x + r + 1);
        rows[row + x] = (byte) (prefix[hi] - prefix[lo] > 0 ? 1 : 0);
      }
    }
    byte[] out = new byte[mask.length];
    for (int x = 0; x < width; x++) {
      for (int y = 0; y < height; y++) {
        prefix[y + 1] = prefix[y] + rows[y * width + x];
      }
      for (int y = 0; y < height; y++) {
        int lo = Math.max(0, y - r);
        int hi = Math.min(height, y + r + 1);
        out[y * width + x] = (byte) (prefix[hi] - prefix[lo] > 0 ? 1 : 0);
      }
    }
    return out;
  }

  private static void check(byte[] mask, int width, int height, int radius) {
    if (width <= 0 || height <= 0 || mask.length != width * height) {
      throw new IllegalArgumentException("mask of " + mask.length + " bytes does not match " + width + "x" + height);
    }
    if (radius < 0) {
      throw new IllegalArgumentException("radius must be >= 0, got " + radius);
    }
  }
}
