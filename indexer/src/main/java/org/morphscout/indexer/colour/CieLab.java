package org.morphscout.indexer.colour;

/**
 * Conversions between 8-bit sRGB and CIELAB (D65): sRGB (IEC 61966-2-1 transfer curve) to linear RGB, to CIE XYZ with
 * Bruce Lindbloom's published sRGB matrix, to CIELAB with Lindbloom's D65 reference white (0.95047, 1, 1.08883) and the
 * exact CIE constants epsilon = 216/24389, kappa = 24389/27 (Lindbloom, "Useful Color Equations",
 * brucelindbloom.com). Lab values: L* in [0, 100], a* and b* roughly in [-128, 128].
 *
 * <p>{@link #toLab(int)} is the plain per-pixel version (calls {@code Math.pow}); {@link #toLab(int[], float[])} is the
 * fast whole-image path, which looks the transfer curve up in a 256-entry table and is checked against the plain one in
 * tests. Stateless and thread-safe.
 */
public final class CieLab {
  /** Lindbloom's sRGB (D65) linear RGB to XYZ matrix, row-major. */
  static final double[][] RGB_TO_XYZ = {
    {0.4124564, 0.3575761, 0.1804375},
    {0.2126729, 0.7151522, 0.0721750},
    {0.0193339, 0.1191920, 0.9503041}
  };

  /** XYZ to linear RGB: the exact inverse of {@link #RGB_TO_XYZ}, computed once rather than typed. */
  static final double[][] XYZ_TO_RGB = invert(RGB_TO_XYZ);

  /** D65 reference white, Y normalised to 1 (Lindbloom). */
  static final double WHITE_X = 0.95047;
  static final double WHITE_Y = 1.0;
  static final double WHITE_Z = 1.08883;

  private static final double EPSILON = 216.0 / 24389.0;
  private static final double KAPPA = 24389.0 / 27.0;

  /** Linear value of each 8-bit sRGB code, for the fast path. */
  private static final double[] LINEAR = new double[256];

  static {
    for (int i = 0; i < 256; i++) {
      LINEAR[i] = srgbToLinear(i / 255.0);
    }
  }

  private CieLab() {}

  /** IEC 61966-2-1 decoding: non-linear sRGB in [0, 1] to linear light in [0, 1]. */
  public static double srgbToLinear(double c) {
    return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
  }

  /** IEC 61966-2-1 encoding: linear light in [0, 1] to non-linear sRGB in [0, 1]. */
  public static double linearToSrgb(double l) {
    return l <= 0.0031308 ? 12.92 * l : 1.055 * Math.pow(l, 1.0 / 2.4) - 0.055;
  }

  /** Plain version: one packed RGB pixel (alpha ignored) to {L*, a*, b*}. */
  public static double[] toLab(int rgb) {
    double r = srgbToLinear(((rgb >> 16) & 0xFF) / 255.0);
    double g = srgbToLinear(((rgb >> 8) & 0xFF) / 255.0);
    double b = srgbToLinear((rgb & 0xFF) / 255.0);
    double[] lab = new double[3];
    linearToLab(r, g, b, lab);
    return lab;
  }

  /** Plain version from 8-bit channels in [0, 255]. */
  public static double[] toLab(int r, int g, int b) {
    return toLab((r & 0xFF) << 16 | (g & 0xFF) << 8 | (b & 0xFF));
  }

  /**
   * Fast path: packed (A)RGB pixels to interleaved Lab, {@code out[3i..3i+2]}; alpha is ignored. {@code out} must hold
   * {@code 3 * pixels.length} values. The transfer curve comes from a 256-entry table.
   */
  public static void toLab(int[] pixels, float[] out) {
    if (out.length < 3 * pixels.length) {
      throw new IllegalArgumentException("output holds " + out.length + " values, need " + 3 * pixels.length);
    }
    double[] lab = new double[3];
    for (int i = 0; i < pixels.length; i++) {
      int p = pixels[i];
      linearToLab(LINEAR[(p >> 16) & 0xFF], LINEAR[(p >> 8) & 0xFF], LINEAR[p & 0xFF], lab);
      out[3 * i] = (float) lab[0];
      out[3 * i + 1] = (float) lab[1];
      out[3 * i + 2] = (float) lab[2];
    }
  }

  /** Linear-light value of an 8-bit sRGB code (table lookup; only the low 8 bits of {@code code} are used). */
  public static double linear(int code) {
    return LINEAR[code & 0xFF];
  }

  /** Linear RGB (each in [0, 1]) to Lab, written into {@code lab}. */
  public static void linearToLab(double r, double g, double b, double[] lab) {
    double x = RGB_TO_XYZ[0][0] * r + RGB_TO_XYZ[0][1] * g + RGB_TO_XYZ[0][2] * b;
    double y = RGB_TO_XYZ[1][0] * r + RGB_TO_XYZ[1][1] * g + RGB_TO_XYZ[1][2] * b;
    double z = RGB_TO_XYZ[2][0] * r + RGB_TO_XYZ[2][1] * g + RGB_TO_XYZ[2][2] * b;
    double fx = f(x / WHITE_X);
    double fy = f(y / WHITE_Y);
    double fz = f(z / WHITE_Z);
    lab[0] = 116.0 * fy - 16.0;
    lab[1] = 500.0 * (fx - fy);
    lab[2] = 200.0 * (fy - fz);
  }

  private static double f(double t) {
    return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16.0) / 116.0;
  }

  private static double fInverse(double ft) {
    double cube = ft * ft * ft;
    return cube > EPSILON ? cube : (116.0 * ft - 16.0) / KAPPA;
  }

  /**
   * Lab to packed opaque sRGB (0xFFRRGGBB) for display; colours outside the sRGB gamut are clipped per channel.
   */
  public static int toSrgb(double l, double a, double b) {
    double fy = (l + 16.0) / 116.0;
    double fx = fy + a / 500.0;
    double fz = fy - b / 200.0;
    // Lindbloom: Y uses L* directly below the threshold, which equals fInverse(fy) there.
    double y = (l > KAPPA * EPSILON ? fy * fy * fy : l / KAPPA) * WHITE_Y;
    double x = fInverse(fx) * WHITE_X;
    double z = fInverse(fz) * WHITE_Z;
    int argb = 0xFF000000;
    for (int c = 0; c < 3; c++) {
      double lin = XYZ_TO_RGB[c][0] * x + XYZ_TO_RGB[c][1] * y + XYZ_TO_RGB[c][2] * z;
      double s = linearToSrgb(Math.min(1.0, Math.max(0.0, lin)));
      int v = (int) Math.round(s * 255.0);
      argb |= v << (16 - 8 * c);
    }
    return argb;
  }

  private static double[][] invert(double[][] m) {
    double a = m[0][0], b = m[0][1], c = m[0][2];
    double d = m[1][0], e = m[1][1], f = m[1][2];
    double g = m[2][0], h = m[2][1], i = m[2][2];
    double det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
    return new double[][] {
      {(e * i - f * h) / det, (c * h - b * i) / det, (b * f - c * e) / det},
      {(f * g - d * i) / det, (a * i - c * g) / det, (c * d - a * f) / det},
      {(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det}
    };
  }
}
