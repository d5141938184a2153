package org.morphscout.indexer.feature;

/**
 * The fixed Gabor filters of the built-in GIST descriptor: {@link #ORIENTATIONS} orientations, each as an even
 * (cosine) and an odd (sine) kernel of {@link #SIZE}x{@link #SIZE} pixels, wavelength {@link #WAVELENGTH} px and an
 * isotropic Gaussian envelope of standard deviation {@link #SIGMA} px (about one octave of bandwidth). The four
 * scales of the descriptor apply these same kernels to a 2x2 average-pooled pyramid (128, 64, 32, 16 px), so the
 * effective wavelengths on the 128 px input are 4, 8, 16 and 32 px (32, 16, 8 and 4 cycles per image).
 *
 * <p>Orientation {@code o} has its wave vector at angle {@code o * pi / 8} from the +x (column) axis towards +y (down
 * the rows); a grating whose intensity varies along that direction excites it most. Each even kernel has its DC
 * removed (so flat regions give no response) and every kernel has unit L2 norm (so even and odd responses are
 * comparable and the energy is phase-invariant). The kernels are cross-correlation weights, as ONNX Conv applies them.
 */
final class GaborBank {
  static final int ORIENTATIONS = 8;
  static final int SIZE = 9;
  static final int RADIUS = SIZE / 2;
  static final double WAVELENGTH = 4.0;
  static final double SIGMA = 2.0;

  private GaborBank() {}

  /**
   * Weights of shape [2 * ORIENTATIONS, 1, SIZE, SIZE], row-major: output channel {@code o} is the even kernel of
   * orientation {@code o}, channel {@code ORIENTATIONS + o} the odd one.
   */
  static float[] weights() {
    float[] w = new float[2 * ORIENTATIONS * SIZE * SIZE];
    for (int o = 0; o < ORIENTATIONS; o++) {
      double[][] pair = kernelPair(o);
      for (int p = 0; p < 2; p++) {
        int base = (p * ORIENTATIONS + o) * SIZE * SIZE;
        for (int i = 0; i < SIZE * SIZE; i++) {
          w[base + i] = (float) pair[p][i];
        }
      }
    }
    return w;
  }

  /** {even, odd} kernels of one orientation, row-major SIZE x SIZE, in double precision. */
  static double[][] kernelPair(int orientation) {
    double theta = orientation * Math.PI / ORIENTATIONS;
    double cos = Math.cos(theta);
    double sin = Math.sin(theta);
    double[] even = new double[SIZE * SIZE];
    double[] odd = new double[SIZE * SIZE];
    double[] envelope = new double[SIZE * SIZE];
    double evenSum = 0;
    double envelopeSum = 0;
    for (int y = -RADIUS; y <= RADIUS; y++) {
      for (int x = -RADIUS; x <= RADIUS; x++) {
        int i = (y + RADIUS) * SIZE + (x + RADIUS);
        double g = Math.exp(-(x * x + y * y) / (2.0 * SIGMA * SIGMA));
        double phase = 2.0 * Math.PI * (x * cos + y * sin) / WAVELENGTH;
        envelope[i] = g;
        even[i] = g * Math.cos(phase);
        odd[i] = g * Math.sin(phase);
        evenSum += even[i];
        envelopeSum += g;
      }
    }
    // Remove DC from the even kernel by subtracting a scaled envelope (the usual zero-mean Gabor correction).
    double k = evenSum / envelopeSum;
    for (int i = 0; i < even.length; i++) {
      even[i] -= k * envelope[i];
    }
    normalise(even);
    normalise(odd);
    return new double[][] {even, odd};
  }

  private static void normalise(double[] v) {
    double s = 0;
    for (double x : v) {
      s += x * x;
    }
    double n = Math.sqrt(s);
    for (int i = 0; i < v.length; i++) {
      v[i] /= n;
    }
  }
}
