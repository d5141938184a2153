package org.morphscout.app.gui.inspector;

import java.util.Locale;

/**
 * CIELAB (D65) to sRGB, for showing stored colour statistics as swatches. Formulas from IEC 61966-2-1 (sRGB) and
 * CIE 15:2004 (L*a*b* inverse), with the D65 white point X=0.95047, Y=1, Z=1.08883.
 */
public final class LabColours {
  private LabColours() {}

  /** sRGB bytes {r, g, b}, each 0..255, clipped when the colour is outside the sRGB gamut. */
  public static int[] toSrgb(double l, double a, double b) {
    double fy = (l + 16) / 116;
    double fx = fy + a / 500;
    double fz = fy - b / 200;
    double x = 0.95047 * inverse(fx);
    double y = 1.00000 * inverse(fy);
    double z = 1.08883 * inverse(fz);
    double rl = 3.2404542 * x - 1.5371385 * y - 0.4985314 * z;
    double gl = -0.9692660 * x + 1.8760108 * y + 0.0415560 * z;
    double bl = 0.0556434 * x - 0.2040259 * y + 1.0572252 * z;
    return new int[] {encode(rl), encode(gl), encode(bl)};
  }

  /** {@code #rrggbb} of a CIELAB colour; "#808080" when any component is NaN (empty region). */
  public static String hex(double[] lab) {
    if (lab == null || lab.length != 3 || Double.isNaN(lab[0]) || Double.isNaN(lab[1]) || Double.isNaN(lab[2])) {
      return "#808080";
    }
    int[] c = toSrgb(lab[0], lab[1], lab[2]);
    return String.format(Locale.ROOT, "#%02x%02x%02x", c[0], c[1], c[2]);
  }

  private static double inverse(double t) {
    double delta = 6.0 / 29;
    return t > delta ? t * t * t : 3 * delta * delta * (t - 4.0 / 29);
  }

  private static int encode(double linear) {
    double v = linear <= 0.0031308 ? 12.92 * linear : 1.055 * Math.pow(linear, 1 / 2.4) - 0.055;
    return (int) Math.round(Math.max(0, Math.min(1, v)) * 255);
  }
}
