package org.morphscout.indexer.feature;

/**
 * The built-in GIST + colour-layout descriptor computed with plain loops, step for step as the graph of
 * {@link GistModelBuilder} does (reflect padding, cross-correlation, 2x2 average pyramid, 4x4 grid means, two
 * L2-normalised parts weighted and normalised again). It exists so tests can check the ONNX graph against something
 * readable; it is far slower than the graph. Stateless and thread-safe.
 */
public final class GistReference {
  private static final int SIZE = GistModelBuilder.SIZE;
  private static final int GRID = GistModelBuilder.GRID;
  private static final int ORIENTATIONS = GaborBank.ORIENTATIONS;

  private GistReference() {}

  /** The unit-length 560-vector of one [4, 128, 128] input tensor (as {@link GistInput} prepares). */
  public static float[] embed(float[] input) {
    if (input.length != GistModelBuilder.CHANNELS * SIZE * SIZE) {
      throw new IllegalArgumentException("input has " + input.length + " values, expected 4 x 128 x 128");
    }
    double[] gist = gistEnergies(input);
    double[] colour = new double[GistModelBuilder.COLOUR_DIMENSION];
    for (int c = 0; c < 3; c++) {
      double[] plane = new double[SIZE * SIZE];
      for (int i = 0; i < plane.length; i++) {
        plane[i] = input[(c + 1) * SIZE * SIZE + i];
      }
      System.arraycopy(gridMeans(plane, SIZE), 0, colour, c * GRID * GRID, GRID * GRID);
    }
    normalise(gist);
    normalise(colour);
    double[] joined = new double[GistModelBuilder.DIMENSION];
    for (int i = 0; i < gist.length; i++) {
      joined[i] = GistModelBuilder.GIST_WEIGHT * gist[i];
    }
    for (int i = 0; i < colour.length; i++) {
      joined[gist.length + i] = GistModelBuilder.COLOUR_WEIGHT * colour[i];
    }
    normalise(joined);
    float[] out = new float[joined.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = (float) joined[i];
    }
    return out;
  }

  /**
   * The 512 grid-pooled Gabor energies of channel 0 before any normalisation, index
   * {@code ((scale * 8 + orientation) * 4 + row) * 4 + column}.
   */
  public static double[] gistEnergies(float[] input) {
    double[] level = new double[SIZE * SIZE];
    for (int i = 0; i < level.length; i++) {
      level[i] = input[i];
    }
    double[][] even = new double[ORIENTATIONS][];
    double[][] odd = new double[ORIENTATIONS][];
    for (int o = 0; o < ORIENTATIONS; o++) {
      double[][] pair = GaborBank.kernelPair(o);
      even[o] = toFloatPrecision(pair[0]);
      odd[o] = toFloatPrecision(pair[1]);
    }
    double[] out = new double[GistModelBuilder.GIST_DIMENSION];
    int size = SIZE;
    for (int s = 0; s < GistModelBuilder.SCALES; s++) {
      if (s > 0) {
        level = halve(level, size);
        size /= 2;
      }
      for (int o = 0; o < ORIENTATIONS; o++) {
        double[] e = correlateReflect(level, size, even[o]);
        double[] q = correlateReflect(level, size, odd[o]);
        double[] energy = new double[size * size];
        for (int i = 0; i < energy.length; i++) {
          energy[i] = Math.sqrt(e[i] * e[i] + q[i] * q[i] + GistModelBuilder.ENERGY_EPS);
        }
        System.arraycopy(gridMeans(energy, size), 0, out, (s * ORIENTATIONS + o) * GRID * GRID, GRID * GRID);
      }
    }
    return out;
  }

  /** The graph stores float32 weights; use the same rounded values so the comparison measures the graph, not that. */
  private static double[] toFloatPrecision(double[] k) {
    double[] r = new double[k.length];
    for (int i = 0; i < k.length; i++) {
      r[i] = (float) k[i];
    }
    return r;
  }

  /** 2x2 average pooling, stride 2. */
  private static double[] halve(double[] plane, int size) {
    int half = size / 2;
    double[] out = new double[half * half];
    for (int y = 0; y < half; y++) {
      for (int x = 0; x < half; x++) {
        int i = 2 * y * size + 2 * x;
        out[y * half + x] = (plane[i] + plane[i + 1] + plane[i + size] + plane[i + size + 1]) / 4.0;
      }
    }
    return out;
  }

  /** Cross-correlation with a centred kernel, borders reflected without repeating the edge (numpy "reflect"). */
  private static double[] correlateReflect(double[] plane, int size, double[] kernel) {
    int r = GaborBank.RADIUS;
    int k = GaborBank.SIZE;
    double[] out = new double[size * size];
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        double s = 0;
        for (int dy = -r; dy <= r; dy++) {
          int yy = reflect(y + dy, size);
          for (int dx = -r; dx <= r; dx++) {
            s += kernel[(dy + r) * k + dx + r] * plane[yy * size + reflect(x + dx, size)];
          }
        }
        out[y * size + x] = s;
      }
    }
    return out;
  }

  private static int reflect(int i, int n) {
    if (i < 0) {
      return -i;
    }
    return i >= n ? 2 * (n - 1) - i : i;
  }

  /** Means over a GRID x GRID tiling, row-major. */
  private static double[] gridMeans(double[] plane, int size) {
    int cell = size / GRID;
    double[] out = new double[GRID * GRID];
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        out[(y / cell) * GRID + x / cell] += plane[y * size + x];
      }
    }
    for (int i = 0; i < out.length; i++) {
      out[i] /= (double) cell * cell;
    }
    return out;
  }

  private static void normalise(double[] v) {
    double s = 0;
    for (double x : v) {
      s += x * x;
    }
    double n = Math.sqrt(s) + GistModelBuilder.NORM_EPS;
    for (int i = 0; i < v.length; i++) {
      v[i] /= n;
    }
  }
}
