package org.morphscout.indexer.silhouette;

/**
 * The seven moment invariants of M.-K. Hu ("Visual pattern recognition by moment invariants", IRE Trans. Information
 * Theory IT-8, 1962), invariant to translation, scale and rotation (h7 changes sign under reflection).
 *
 * <p>Built from the normalised central moments eta_pq = mu_pq / m00^(1 + (p + q) / 2) of the mask's pixels, exactly as
 * OpenCV's {@code HuMoments} does, so values can be compared with it directly. Stateless and thread-safe.
 */
public final class HuMoments {
  private HuMoments() {}

  /** h1..h7 of the mask's object pixels; all zero for an empty mask. */
  public static double[] of(Mask mask) {
    return of(CentralMoments.of(mask));
  }

  static double[] of(CentralMoments m) {
    if (m.m00() == 0) {
      return new double[7];
    }
    double a = m.m00();
    double s2 = a * a; // m00^(1 + 2/2) for second order
    double s3 = s2 * Math.sqrt(a); // m00^(1 + 3/2) for third order
    double n20 = m.mu20() / s2;
    double n11 = m.mu11() / s2;
    double n02 = m.mu02() / s2;
    double n30 = m.mu30() / s3;
    double n21 = m.mu21() / s3;
    double n12 = m.mu12() / s3;
    double n03 = m.mu03() / s3;

    double t0 = n30 + n12;
    double t1 = n21 + n03;
    double q0 = t0 * t0;
    double q1 = t1 * t1;
    double n4 = 4 * n11;
    double s = n20 + n02;
    double d = n20 - n02;
    double[] hu = new double[7];
    hu[0] = s;
    hu[1] = d * d + n4 * n11;
    hu[3] = q0 + q1;
    hu[5] = d * (q0 - q1) + n4 * t0 * t1;

    double u0 = n30 - 3 * n12;
    double u1 = 3 * n21 - n03;
    hu[2] = u0 * u0 + u1 * u1;
    hu[4] = u0 * t0 * (q0 - 3 * q1) + u1 * t1 * (3 * q0 - q1);
    hu[6] = u1 * t0 * (q0 - 3 * q1) - u0 * t1 * (3 * q0 - q1);
    return hu;
  }
}
