package org.morphscout.demo;

/**
 * Seeded hash noise: SplitMix64 finaliser as an integer hash, value noise (smoothly interpolated lattice values) and
 * cellular (Worley) distances. Pure functions of their arguments, so safe from any thread and independent of order.
 */
final class Noise {
  private Noise() {}

  /** SplitMix64 finaliser (Steele, Lea and Flood, OOPSLA 2014): a good 64-bit mixing function. */
  static long mix(long z) {
    z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
    z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
    return z ^ (z >>> 31);
  }

  /** Hash of a lattice point to a uniform double in [0, 1). */
  static double hash01(long seed, long x, long y) {
    long h = mix(seed ^ mix(x * 0x9E3779B97F4A7C15L + y * 0xC2B2AE3D27D4EB4FL + 0x165667B19E3779F9L));
    return (h >>> 11) * 0x1.0p-53;
  }

  /** Value noise in [0, 1]: lattice values at integer points, blended with a smoothstep. */
  static double value(long seed, double x, double y) {
    double fx = Math.floor(x);
    double fy = Math.floor(y);
    long xi = (long) fx;
    long yi = (long) fy;
    double tx = smooth(x - fx);
    double ty = smooth(y - fy);
    double a = hash01(seed, xi, yi);
    double b = hash01(seed, xi + 1, yi);
    double c = hash01(seed, xi, yi + 1);
    double d = hash01(seed, xi + 1, yi + 1);
    double top = a + (b - a) * tx;
    double bottom = c + (d - c) * tx;
    return top + (bottom - top) * ty;
  }

  /** Sum of {@code octaves} value-noise layers, each twice the frequency and half the weight; in [0, 1]. */
  static double fractal(long seed, double x, double y, int octaves) {
    double sum = 0;
    double weight = 1;
    double total = 0;
    double f = 1;
    for (int o = 0; o < octaves; o++) {
      sum += weight * value(seed + o * 0x51ED27L, x * f, y * f);
      total += weight;
      weight *= 0.5;
      f *= 2.0;
    }
    return sum / total;
  }

  /**
   * Worley cellular noise: the gap {@code F2 - F1} between the distances to the nearest and second-nearest feature
   * points (one jittered point per unit cell). Near zero on the cell borders, which is where crackle lines go.
   */
  static double cellBorder(long seed, double x, double y) {
    long xi = (long) Math.floor(x);
    long yi = (long) Math.floor(y);
    double f1 = Double.MAX_VALUE;
    double f2 = Double.MAX_VALUE;
    for (long j = yi - 1; j <= yi + 1; j++) {
      for (long i = xi - 1; i <= xi + 1; i++) {
        double px = i + hash01(seed, i, j);
        double py = j + hash01(seed ^ 0x5DEECE66DL, i, j);
        double d = Math.sqrt((px - x) * (px - x) + (py - y) * (py - y));
        if (d < f1) {
          f2 = f1;
          f1 = d;
        } else if (d < f2) {
          f2 = d;
        }
      }
    }
    return f2 - f1;
  }

  /**
   * arcsin(x) for x in [-1, 1], absolute error below 7e-5 rad: Abramowitz and Stegun, Handbook of Mathematical
   * Functions (1964), formula 4.4.45. Plain arithmetic, so cheaper than StrictMath.asin and just as reproducible;
   * used only for texture coordinates.
   */
  static double asin(double x) {
    double a = Math.abs(x);
    double p = 1.5707288 + a * (-0.2121144 + a * (0.0742610 + a * -0.0187293));
    double r = Math.PI / 2 - Math.sqrt(Math.max(0, 1 - a)) * p;
    return x < 0 ? -r : r;
  }

  static double smooth(double t) {
    return t * t * (3 - 2 * t);
  }

  static double smoothstep(double edge0, double edge1, double x) {
    double t = clamp((x - edge0) / (edge1 - edge0), 0, 1);
    return smooth(t);
  }

  static double clamp(double v, double lo, double hi) {
    return v < lo ? lo : (v > hi ? hi : v);
  }
}
