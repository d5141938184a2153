package org.morphscout.indexer.feature;

/**
 * The CIEDE2000 colour difference with parametric factors kL = kC = kH = 1, implemented step by step as in Sharma, Wu
 * and Dalal, "The CIEDE2000 colour-difference formula: implementation notes, supplementary test data, and mathematical
 * observations", Color Research and Application 30(1), 2005 (equations 2 to 22). Follows their notes on the hue
 * corner cases: h' = 0 when a' = b' = 0; delta h' = 0 and the mean hue is the plain sum when C1'C2' = 0; hue angles
 * in degrees in [0, 360). Stateless and thread-safe.
 */
public final class Ciede2000 {
  private static final double POW25_7 = Math.pow(25.0, 7.0);

  private Ciede2000() {}

  /** Colour difference between two {L*, a*, b*} triples. */
  public static double difference(double[] lab1, double[] lab2) {
    return difference(lab1[0], lab1[1], lab1[2], lab2[0], lab2[1], lab2[2]);
  }

  /** Colour difference Delta E00 between (L1, a1, b1) and (L2, a2, b2). Symmetric, zero for equal colours. */
  public static double difference(double l1, double a1, double b1, double l2, double a2, double b2) {
    // Eq. 2-6: a' from the mean chroma.
    double c1 = Math.hypot(a1, b1);
    double c2 = Math.hypot(a2, b2);
    double cMean = (c1 + c2) / 2.0;
    double cMean7 = Math.pow(cMean, 7.0);
    double g = 0.5 * (1.0 - Math.sqrt(cMean7 / (cMean7 + POW25_7)));
    double a1p = (1.0 + g) * a1;
    double a2p = (1.0 + g) * a2;
    double c1p = Math.hypot(a1p, b1);
    double c2p = Math.hypot(a2p, b2);
    double h1p = hueDegrees(a1p, b1);
    double h2p = hueDegrees(a2p, b2);

    // Eq. 8-12: differences.
    double dLp = l2 - l1;
    double dCp = c2p - c1p;
    double dhp;
    if (c1p * c2p == 0.0) {
      dhp = 0.0;
    } else {
      dhp = h2p - h1p;
      if (dhp > 180.0) {
        dhp -= 360.0;
      } else if (dhp < -180.0) {
        dhp += 360.0;
      }
    }
    double dHp = 2.0 * Math.sqrt(c1p * c2p) * Math.sin(Math.toRadians(dhp / 2.0));

    // Eq. 13-22: weighting functions.
    double lMean = (l1 + l2) / 2.0;
    double cpMean = (c1p + c2p) / 2.0;
    double hpMean;
    if (c1p * c2p == 0.0) {
      hpMean = h1p + h2p;
    } else if (Math.abs(h1p - h2p) <= 180.0) {
      hpMean = (h1p + h2p) / 2.0;
    } else if (h1p + h2p < 360.0) {
      hpMean = (h1p + h2p + 360.0) / 2.0;
    } else {
      hpMean = (h1p + h2p - 360.0) / 2.0;
    }
    double t =
        1.0
            - 0.17 * Math.cos(Math.toRadians(hpMean - 30.0))
            + 0.24 * Math.cos(Math.toRadians(2.0 * hpMean))
            + 0.32 * Math.cos(Math.toRadians(3.0 * hpMean + 6.0))
            - 0.20 * Math.cos(Math.toRadians(4.0 * hpMean - 63.0));
    double dTheta = 30.0 * Math.exp(-Math.pow((hpMean - 275.0) / 25.0, 2.0));
    double cpMean7 = Math.pow(cpMean, 7.0);
    double rc = 2.0 * Math.sqrt(cpMean7 / (cpMean7 + POW25_7));
    double lm50 = (lMean - 50.0) * (lMean - 50.0);
    double sl = 1.0 + 0.015 * lm50 / Math.sqrt(20.0 + lm50);
    double sc = 1.0 + 0.045 * cpMean;
    double sh = 1.0 + 0.015 * cpMean * t;
    double rt = -Math.sin(Math.toRadians(2.0 * dTheta)) * rc;

    double tl = dLp / sl;
    double tc = dCp / sc;
    double th = dHp / sh;
    return Math.sqrt(tl * tl + tc * tc + th * th + rt * tc * th);
  }

  /** Hue angle in degrees in [0, 360); 0 for the achromatic case a = b = 0 (Sharma et al. eq. 7). */
  private static double hueDegrees(double a, double b) {
    if (a == 0.0 && b == 0.0) {
      return 0.0;
    }
    double h = Math.toDegrees(Math.atan2(b, a));
    return h < 0.0 ? h + 360.0 : h;
  }
}
