package org.morphscout.demo;

/**
 * Colour helpers: sRGB transfer (IEC 61966-2-1) through lookup tables, so shading can work in linear light without a
 * {@code pow} per pixel, and packing of 0xRRGGBB integers.
 */
final class Colours {
  private static final int LUT_SIZE = 4096;
  private static final double[] TO_LINEAR = new double[256];
  private static final int[] TO_SRGB = new int[LUT_SIZE + 1];

  static {
    for (int i = 0; i < 256; i++) {
      double c = i / 255.0;
      // IEC 61966-2-1 sRGB decoding.
      TO_LINEAR[i] = c <= 0.04045 ? c / 12.92 : StrictMath.pow((c + 0.055) / 1.055, 2.4);
    }
    for (int i = 0; i <= LUT_SIZE; i++) {
      double l = (double) i / LUT_SIZE;
      double c = l <= 0.0031308 ? 12.92 * l : 1.055 * StrictMath.pow(l, 1 / 2.4) - 0.055;
      TO_SRGB[i] = (int) Math.round(Noise.clamp(c, 0, 1) * 255);
    }
  }

  private Colours() {}

  static double toLinear(int channel8) {
    return TO_LINEAR[channel8 & 0xFF];
  }

  /** Linear value (clamped to [0, 1]) to an 8-bit sRGB channel. */
  static int toSrgb(double linear) {
    if (!(linear > 0)) {
      return 0;
    }
    if (linear >= 1) {
      return 255;
    }
    return TO_SRGB[(int) (linear * LUT_SIZE + 0.5)];
  }

  /** Linear RGB of a packed 0xRRGGBB colour, written into {@code out[0..2]}. */
  static void linear(int rgb, double[] out) {
    out[0] = toLinear(rgb >> 16);
    out[1] = toLinear(rgb >> 8);
    out[2] = toLinear(rgb);
  }

  static int pack(double rLinear, double gLinear, double bLinear) {
    return (toSrgb(rLinear) << 16) | (toSrgb(gLinear) << 8) | toSrgb(bLinear);
  }

  static int pack8(int r, int g, int b) {
    return (clamp8(r) << 16) | (clamp8(g) << 8) | clamp8(b);
  }

  static int clamp8(int v) {
    return v < 0 ? 0 : (v > 255 ? 255 : v);
  }

  /** Mixes two packed sRGB colours channel by channel in 8-bit space; {@code t} in [0, 1]. */
  static int mix8(int a, int b, double t) {
    int r = (int) Math.round(((a >> 16) & 0xFF) * (1 - t) + ((b >> 16) & 0xFF) * t);
    int g = (int) Math.round(((a >> 8) & 0xFF) * (1 - t) + ((b >> 8) & 0xFF) * t);
    int bl = (int) Math.round((a & 0xFF) * (1 - t) + (b & 0xFF) * t);
    return pack8(r, g, bl);
  }
}
