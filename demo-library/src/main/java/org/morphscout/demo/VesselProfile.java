package org.morphscout.demo;

import java.util.Arrays;
import java.util.Objects;
import java.util.SplittableRandom;

/**
 * A lathe profile: the radius of a turned vessel as a function of height, through {@value #STATIONS} stations
 * (foot, lower body, belly, shoulder, neck base, neck top, lip), with optional handles on either side.
 *
 * <p>Between stations the radius follows the monotone piecewise cubic Hermite interpolant of Fritsch and Carlson
 * (SIAM J. Numer. Anal. 17(2), 1980): C1-smooth, and it never leaves the range of two neighbouring stations, so a
 * profile cannot grow a bulge or a negative radius that its stations do not have.
 *
 * <p>Because every profile has the same stations, {@link #blend} mixes two of them station by station (heights and
 * radii both linear in {@code t}); the intermediate shapes are real vessels, not cross-fades. Units: centimetres.
 * Immutable and thread-safe.
 */
public final class VesselProfile {
  /** Number of stations every profile has. */
  public static final int STATIONS = 7;

  private final double[] heights;
  private final double[] radii;
  private final double[] tangents;
  private final Handle rightHandle;
  private final Handle leftHandle;

  /**
   * @param heightsCm station heights, strictly increasing, starting at 0 (the foot), {@value #STATIONS} values
   * @param radiiCm station radii, each &gt; 0, {@value #STATIONS} values
   * @param rightHandle handle on the right-hand side, or {@link Handle#NONE}
   * @param leftHandle handle on the left-hand side, or {@link Handle#NONE}
   */
  public VesselProfile(double[] heightsCm, double[] radiiCm, Handle rightHandle, Handle leftHandle) {
    if (heightsCm.length != STATIONS || radiiCm.length != STATIONS) {
      throw new IllegalArgumentException("a profile needs " + STATIONS + " heights and radii, got "
          + heightsCm.length + " and " + radiiCm.length);
    }
    if (heightsCm[0] != 0) {
      throw new IllegalArgumentException("the first station (the foot) must be at height 0, got " + heightsCm[0]);
    }
    for (int i = 0; i < STATIONS; i++) {
      if (!Double.isFinite(heightsCm[i]) || !(radiiCm[i] > 0) || Double.isInfinite(radiiCm[i])) {
        throw new IllegalArgumentException("station " + i + " needs a finite height and a positive radius");
      }
      if (i > 0 && !(heightsCm[i] > heightsCm[i - 1])) {
        throw new IllegalArgumentException("station heights must increase strictly: " + Arrays.toString(heightsCm));
      }
    }
    this.heights = heightsCm.clone();
    this.radii = radiiCm.clone();
    this.rightHandle = Objects.requireNonNull(rightHandle, "rightHandle");
    this.leftHandle = Objects.requireNonNull(leftHandle, "leftHandle");
    this.tangents = fritschCarlsonTangents(heights, radii);
  }

  /** The profile of an archetype (same as {@link Archetype#profile()}). */
  public static VesselProfile of(Archetype archetype) {
    return archetype.profile();
  }

  /**
   * The shape {@code t} of the way from {@code a} (t = 0) to {@code b} (t = 1): station heights and radii mix
   * linearly, handles as in {@link Handle}. Strictly increasing heights stay strictly increasing under a convex mix.
   */
  public static VesselProfile blend(VesselProfile a, VesselProfile b, double t) {
    if (!(t >= 0 && t <= 1)) {
      throw new IllegalArgumentException("blend parameter t must be in [0, 1]: " + t);
    }
    double[] h = new double[STATIONS];
    double[] r = new double[STATIONS];
    for (int i = 0; i < STATIONS; i++) {
      h[i] = Handle.lerp(a.heights[i], b.heights[i], t);
      r[i] = Handle.lerp(a.radii[i], b.radii[i], t);
    }
    h[0] = 0;
    return new VesselProfile(h, r, Handle.blend(a.rightHandle, b.rightHandle, t),
        Handle.blend(a.leftHandle, b.leftHandle, t));
  }

  /** The same shape scaled uniformly by {@code factor} &gt; 0. */
  public VesselProfile scaled(double factor) {
    if (!(factor > 0) || Double.isInfinite(factor)) {
      throw new IllegalArgumentException("scale factor must be positive: " + factor);
    }
    double[] h = heights.clone();
    double[] r = radii.clone();
    for (int i = 0; i < STATIONS; i++) {
      h[i] *= factor;
      r[i] *= factor;
    }
    return new VesselProfile(h, r, rightHandle.scaled(factor), leftHandle.scaled(factor));
  }

  /**
   * A hand-thrown sibling: every radius and every station gap multiplied by its own factor drawn uniformly from
   * [1 - amount, 1 + amount] with the given seed. {@code amount} in [0, 0.3].
   */
  public VesselProfile varied(long seed, double amount) {
    if (!(amount >= 0 && amount <= 0.3)) {
      throw new IllegalArgumentException("variation amount must be in [0, 0.3]: " + amount);
    }
    SplittableRandom rnd = new SplittableRandom(seed);
    double[] h = new double[STATIONS];
    double[] r = new double[STATIONS];
    for (int i = 0; i < STATIONS; i++) {
      r[i] = radii[i] * (1 + amount * (2 * rnd.nextDouble() - 1));
      if (i > 0) {
        h[i] = h[i - 1] + (heights[i] - heights[i - 1]) * (1 + amount * (2 * rnd.nextDouble() - 1));
      }
    }
    return new VesselProfile(h, r, rightHandle, leftHandle);
  }

  /** Radius (cm) at height {@code hCm}; heights outside [0, heightCm] are clamped. */
  public double radiusAt(double hCm) {
    int k = interval(hCm);
    double h0 = heights[k];
    double span = heights[k + 1] - h0;
    double s = Noise.clamp((hCm - h0) / span, 0, 1);
    double s2 = s * s;
    double s3 = s2 * s;
    // Cubic Hermite basis functions.
    return (2 * s3 - 3 * s2 + 1) * radii[k] + (s3 - 2 * s2 + s) * span * tangents[k]
        + (-2 * s3 + 3 * s2) * radii[k + 1] + (s3 - s2) * span * tangents[k + 1];
  }

  /** Slope dr/dh (dimensionless) at height {@code hCm}, clamped to the profile's range. */
  public double slopeAt(double hCm) {
    int k = interval(hCm);
    double h0 = heights[k];
    double span = heights[k + 1] - h0;
    double s = Noise.clamp((hCm - h0) / span, 0, 1);
    double s2 = s * s;
    return ((6 * s2 - 6 * s) * radii[k] + (-6 * s2 + 6 * s) * radii[k + 1]) / span
        + (3 * s2 - 4 * s + 1) * tangents[k] + (3 * s2 - 2 * s) * tangents[k + 1];
  }

  public double heightCm() {
    return heights[STATIONS - 1];
  }

  public double footRadiusCm() {
    return radii[0];
  }

  public double lipRadiusCm() {
    return radii[STATIONS - 1];
  }

  /** Largest station radius; the interpolant never exceeds it (Fritsch-Carlson monotonicity). */
  public double maxRadiusCm() {
    double m = 0;
    for (double r : radii) {
      m = Math.max(m, r);
    }
    return m;
  }

  /** Station heights in cm (a copy). */
  public double[] heightsCm() {
    return heights.clone();
  }

  /** Station radii in cm (a copy). */
  public double[] radiiCm() {
    return radii.clone();
  }

  public Handle rightHandle() {
    return rightHandle;
  }

  public Handle leftHandle() {
    return leftHandle;
  }

  /** How far the vessel reaches right of its axis (cm), handle included. */
  public double rightExtentCm() {
    return extent(rightHandle);
  }

  /** How far the vessel reaches left of its axis (cm), handle included. */
  public double leftExtentCm() {
    return extent(leftHandle);
  }

  /** Area of the profile silhouette seen straight from the side, cm^2, handles excluded (midpoint rule). */
  public double sideAreaCm2() {
    int n = 2000;
    double step = heightCm() / n;
    double sum = 0;
    for (int i = 0; i < n; i++) {
      sum += 2 * radiusAt((i + 0.5) * step) * step;
    }
    return sum;
  }

  private double extent(Handle handle) {
    double body = maxRadiusCm();
    if (!handle.present()) {
      return body;
    }
    double attach = Math.max(radiusAt(handle.upperFraction() * heightCm()),
        radiusAt(handle.lowerFraction() * heightCm()));
    return Math.max(body, attach + handle.reachCm() + handle.thicknessCm() / 2);
  }

  private int interval(double hCm) {
    int k = 0;
    while (k < STATIONS - 2 && hCm > heights[k + 1]) {
      k++;
    }
    return k;
  }

  /**
   * Tangents of the Fritsch-Carlson (1980) monotone interpolant: three-point averages, zeroed at local extrema,
   * then limited so that alpha^2 + beta^2 &lt;= 9 on every interval (their sufficient condition for monotonicity).
   */
  static double[] fritschCarlsonTangents(double[] x, double[] y) {
    int n = x.length;
    double[] d = new double[n - 1];
    for (int k = 0; k < n - 1; k++) {
      d[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
    }
    double[] m = new double[n];
    m[0] = d[0];
    m[n - 1] = d[n - 2];
    for (int k = 1; k < n - 1; k++) {
      m[k] = d[k - 1] * d[k] <= 0 ? 0 : (d[k - 1] + d[k]) / 2;
    }
    for (int k = 0; k < n - 1; k++) {
      if (d[k] == 0) {
        m[k] = 0;
        m[k + 1] = 0;
        continue;
      }
      double alpha = m[k] / d[k];
      double beta = m[k + 1] / d[k];
      if (alpha < 0) {
        m[k] = 0;
        alpha = 0;
      }
      if (beta < 0) {
        m[k + 1] = 0;
        beta = 0;
      }
      double s = alpha * alpha + beta * beta;
      if (s > 9) {
        double tau = 3 / Math.sqrt(s);
        m[k] = tau * alpha * d[k];
        m[k + 1] = tau * beta * d[k];
      }
    }
    return m;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof VesselProfile p && Arrays.equals(heights, p.heights) && Arrays.equals(radii, p.radii)
        && rightHandle.equals(p.rightHandle) && leftHandle.equals(p.leftHandle);
  }

  @Override
  public int hashCode() {
    return Objects.hash(Arrays.hashCode(heights), Arrays.hashCode(radii), rightHandle, leftHandle);
  }

  @Override
  public String toString() {
    return "VesselProfile[h=" + Arrays.toString(heights) + ", r=" + Arrays.toString(radii) + ", right="
        + rightHandle + ", left=" + leftHandle + "]";
  }
}
