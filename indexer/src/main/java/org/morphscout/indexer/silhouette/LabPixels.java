package org.morphscout.indexer.silhouette;

/**
 * sRGB to CIELAB (D65) for the silhouette extractors, kept package-private until the shared colour conversion in
 * {@code feature} is ready to replace it.
 *
 * <p>Transfer function: IEC 61966-2-1 (sRGB) decoding. Matrix: Lindbloom's sRGB (D65) RGB-to-XYZ matrix; white point
 * D65 (0.95047, 1.0, 1.08883); CIE 1976 L*a*b* with the CIE's exact epsilon 216/24389 and kappa 24389/27. Output units:
 * L in [0, 100], a and b roughly in [-128, 128]. Thread-safe (static, tables are immutable).
 */
final class LabPixels {
  private static final double EPSILON = 216.0 / 24389.0;
  private static final double KAPPA = 24389.0 / 27.0;
  private static final double XN = 0.95047;
  private static final double YN = 1.0;
  private static final double ZN = 1.08883;

  /** Linear-light value of each 8-bit sRGB code, in [0, 1]. */
  private static final double[] LINEAR = new double[256];

  static {
    for (int i = 0; i < 256; i++) {
      double c = i / 255.0;
      LINEAR[i] = c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }
  }

  private LabPixels() {}

  /** Linear-light value of an 8-bit sRGB code, in [0, 1]. */
  static double linear(int code) {
    return LINEAR[code & 0xff];
  }

  /**
   * Converts packed (A)RGB pixels to CIELAB planes. Alpha is ignored.
   *
   * @param argb packed pixels, 0xAARRGGBB
   * @param l output L*, same length as {@code argb}
   * @param a output a*
   * @param b output b*
   */
  static void toLab(int[] argb, float[] l, float[] a, float[] b) {
    double[] out = new double[3];
    for (int i = 0; i < argb.length; i++) {
      int p = argb[i];
      toLab(LINEAR[(p >> 16) & 0xff], LINEAR[(p >> 8) & 0xff], LINEAR[p & 0xff], out);
      l[i] = (float) out[0];
      a[i] = (float) out[1];
      b[i] = (float) out[2];
    }
  }

  /** Converts one linear-light RGB triple (each in [0, 1]) to L*, a*, b* written into {@code out}. */
  static void toLab(double r, double g, double bl, double[] out) {
    double x = 0.4124564 * r + 0.3575761 * g + 0.1804375 * bl;
    double y = 0.2126729 * r + 0.7151522 * g + 0.0721750 * bl;
    double z = 0.0193339 * r + 0.1191920 * g + 0.9503041 * bl;
    double fx = f(x / XN);
    double fy = f(y / YN);
    double fz = f(z / ZN);
    out[0] = 116.0 * fy - 16.0;
    out[1] = 500.0 * (fx - fy);
    out[2] = 200.0 * (fy - fz);
  }

  private static double f(double t) {
    return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16.0) / 116.0;
  }
}
