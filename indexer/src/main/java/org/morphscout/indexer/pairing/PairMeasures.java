package org.morphscout.indexer.pairing;

import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.ColourStats;

/**
 * The cheap measures of a pair (everything but the warp), before they are turned into sub-scores. NaN marks a measure
 * whose inputs are missing (no appearance vectors of the same model, no colour statistics). Kept at single precision,
 * the precision they are stored at.
 *
 * @param appearanceDistance 1 - cosine of the appearance vectors, in [0, 2]
 * @param deltaE00 colour difference of the foreground means (the configured formula, CIEDE2000 in production)
 * @param lightnessA foreground mean L* of A, in [0, 100]
 * @param lightnessB foreground mean L* of B
 * @param stdRatio smaller over larger foreground L* standard deviation, in [0, 1]
 * @param aspectRatioGap |ln(aspect A / aspect B)| of the image aspect ratios (width over height)
 * @param resolutionRatio sqrt(smaller pixel count / larger), in (0, 1]
 * @param scaleRatio sqrt(smaller object area fraction / larger), in [0, 1]
 * @param offset distance between the object centroids in image fractions, in [0, sqrt 2]
 * @param backgroundDeltaE colour difference of the background means
 * @param exposureA mean L* of the whole picture A (object and background weighted by their areas), in [0, 100]
 * @param exposureB mean L* of the whole picture B
 */
public record PairMeasures(
    double appearanceDistance,
    double deltaE00,
    double lightnessA,
    double lightnessB,
    double stdA,
    double stdB,
    double stdRatio,
    double aspectRatioGap,
    double resolutionRatio,
    double scaleRatio,
    double offset,
    double backgroundDeltaE,
    double exposureA,
    double exposureB) {

  public PairMeasures {
    appearanceDistance = PairFacts.single(appearanceDistance);
    deltaE00 = PairFacts.single(deltaE00);
    lightnessA = PairFacts.single(lightnessA);
    lightnessB = PairFacts.single(lightnessB);
    stdA = PairFacts.single(stdA);
    stdB = PairFacts.single(stdB);
    stdRatio = PairFacts.single(stdRatio);
    aspectRatioGap = PairFacts.single(aspectRatioGap);
    resolutionRatio = PairFacts.single(resolutionRatio);
    scaleRatio = PairFacts.single(scaleRatio);
    offset = PairFacts.single(offset);
    backgroundDeltaE = PairFacts.single(backgroundDeltaE);
    exposureA = PairFacts.single(exposureA);
    exposureB = PairFacts.single(exposureB);
  }

  static PairMeasures of(ImageAnalysis a, ImageAnalysis b, ColourDifference colour) {
    double appearance = Double.NaN;
    if (a.appearance() != null && b.appearance() != null && a.appearance().length == b.appearance().length
        && a.appearance().length > 0 && java.util.Objects.equals(a.modelId(), b.modelId())) {
      appearance = 1 - cosine(a.appearance(), b.appearance());
    }
    ColourStats ca = a.colour();
    ColourStats cb = b.colour();
    double deltaE = Double.NaN;
    double la = Double.NaN;
    double lb = Double.NaN;
    double sa = Double.NaN;
    double sb = Double.NaN;
    double stdRatio = Double.NaN;
    double bgDeltaE = Double.NaN;
    if (ca != null && cb != null) {
      if (finite(ca.foregroundMean()) && finite(cb.foregroundMean())) {
        deltaE = colour.deltaE(ca.foregroundMean(), cb.foregroundMean());
        la = ca.foregroundMean()[0];
        lb = cb.foregroundMean()[0];
      }
      if (finite(ca.foregroundStd()) && finite(cb.foregroundStd())) {
        sa = ca.foregroundStd()[0];
        sb = cb.foregroundStd()[0];
        double hi = Math.max(sa, sb);
        stdRatio = hi <= 1e-9 ? 1 : Math.min(sa, sb) / hi;
      }
      if (finite(ca.backgroundMean()) && finite(cb.backgroundMean())) {
        bgDeltaE = colour.deltaE(ca.backgroundMean(), cb.backgroundMean());
      }
    }
    double aspectGap = Math.abs(Math.log((a.width() / (double) a.height()) / (b.width() / (double) b.height())));
    double pa = (double) a.width() * a.height();
    double pb = (double) b.width() * b.height();
    double resolution = Math.sqrt(Math.min(pa, pb) / Math.max(pa, pb));
    double fa = a.shape().areaFraction();
    double fb = b.shape().areaFraction();
    double scale = Math.max(fa, fb) <= 0 ? 0 : Math.sqrt(Math.min(fa, fb) / Math.max(fa, fb));
    double offset = Math.hypot(a.shape().centroidX() - b.shape().centroidX(),
        a.shape().centroidY() - b.shape().centroidY());
    return new PairMeasures(appearance, deltaE, la, lb, sa, sb, stdRatio, aspectGap, resolution, scale, offset,
        bgDeltaE, exposure(a), exposure(b));
  }

  /**
   * Mean L* of the whole picture: the object's and the background's means weighted by the object's area fraction;
   * NaN when the colour statistics are missing.
   */
  static double exposure(ImageAnalysis x) {
    ColourStats c = x.colour();
    if (c == null) {
      return Double.NaN;
    }
    boolean fg = finite(c.foregroundMean());
    boolean bg = finite(c.backgroundMean());
    double f = Math.max(0, Math.min(1, x.shape().areaFraction()));
    if (fg && bg) {
      return f * c.foregroundMean()[0] + (1 - f) * c.backgroundMean()[0];
    }
    return fg ? c.foregroundMean()[0] : bg ? c.backgroundMean()[0] : Double.NaN;
  }

  static double cosine(float[] p, float[] q) {
    double dot = 0;
    double np = 0;
    double nq = 0;
    for (int i = 0; i < p.length; i++) {
      dot += (double) p[i] * q[i];
      np += (double) p[i] * p[i];
      nq += (double) q[i] * q[i];
    }
    return np == 0 || nq == 0 ? 0 : dot / Math.sqrt(np * nq);
  }

  private static boolean finite(double[] v) {
    if (v == null || v.length < 3) {
      return false;
    }
    for (double x : v) {
      if (!Double.isFinite(x)) {
        return false;
      }
    }
    return true;
  }
}
