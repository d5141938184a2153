package org.morphscout.indexer.warp;

/**
 * A similarity transform that maps B's mask coordinates onto A's: {@code pA = scale * R(rotation) * F * pB + t},
 * where {@code F} flips x ({@code x -> -x}) when {@code mirror} is set and is the identity otherwise.
 *
 * <p>Coordinates are continuous pixel coordinates of each mask (pixel {@code i} covers {@code [i, i + 1)}).
 *
 * @param scale A pixels per B pixel, positive
 * @param rotation radians in (-pi, pi]; positive turns +x towards +y (clockwise on screen, where y points down)
 * @param mirror whether B is flipped left-right before rotating
 * @param tx translation in A pixels
 * @param ty translation in A pixels
 */
public record Similarity(double scale, double rotation, boolean mirror, double tx, double ty) {

  public Similarity {
    if (!(scale > 0) || !Double.isFinite(scale)) {
      throw new IllegalArgumentException("similarity scale must be positive and finite, got " + scale);
    }
    if (!Double.isFinite(rotation) || !Double.isFinite(tx) || !Double.isFinite(ty)) {
      throw new IllegalArgumentException("similarity parameters must be finite");
    }
  }

  /** The identity transform. */
  public static Similarity identity() {
    return new Similarity(1, 0, false, 0, 0);
  }

  /**
   * The transform that maps B's point {@code (bx, by)} to A's point {@code (ax, ay)} with the given scale, rotation
   * and mirror (used with the two centroids).
   */
  public static Similarity through(double scale, double rotation, boolean mirror, double bx, double by, double ax,
      double ay) {
    double c = Math.cos(rotation);
    double s = Math.sin(rotation);
    double fx = mirror ? -bx : bx;
    double rx = scale * (c * fx - s * by);
    double ry = scale * (s * fx + c * by);
    return new Similarity(scale, normalise(rotation), mirror, ax - rx, ay - ry);
  }

  /** Maps a point of B to A; returns {x, y}. */
  public double[] apply(double x, double y) {
    double c = Math.cos(rotation);
    double s = Math.sin(rotation);
    double fx = mirror ? -x : x;
    return new double[] {scale * (c * fx - s * y) + tx, scale * (s * fx + c * y) + ty};
  }

  /** Maps a point of A back to B; returns {x, y}. */
  public double[] applyInverse(double x, double y) {
    double c = Math.cos(rotation);
    double s = Math.sin(rotation);
    double px = (x - tx) / scale;
    double py = (y - ty) / scale;
    double rx = c * px + s * py;
    double ry = -s * px + c * py;
    return new double[] {mirror ? -rx : rx, ry};
  }

  /**
   * The 2x3 matrix {a, b, c, d, e, f} of {@code x' = a x + b y + c, y' = d x + e y + f} mapping A back to B, for hot
   * loops that must not allocate.
   */
  double[] inverseMatrix() {
    double c = Math.cos(rotation);
    double s = Math.sin(rotation);
    double m = mirror ? -1 : 1;
    double a = m * c / scale;
    double b = m * s / scale;
    double d = -s / scale;
    double e = c / scale;
    return new double[] {a, b, -(a * tx + b * ty), d, e, -(d * tx + e * ty)};
  }

  /**
   * The angle in (-pi, pi]. Angles met here lie within a few turns of zero, so the common cases take a shortcut
   * that gives exactly {@code Math.IEEEremainder(angle, 2 pi)}, which is slow on this JDK: within [-pi, pi] the
   * remainder is the angle itself, and within 2.5 pi one subtraction of 2 pi is exact (Sterbenz's lemma).
   */
  static double normalise(double angle) {
    double twoPi = 2 * Math.PI;
    double abs = Math.abs(angle);
    double a;
    if (abs <= Math.PI) {
      a = angle;
    } else if (abs <= 2.5 * Math.PI) {
      a = angle - Math.copySign(twoPi, angle);
    } else {
      a = Math.IEEEremainder(angle, twoPi);
    }
    return a <= -Math.PI ? a + twoPi : a;
  }
}
