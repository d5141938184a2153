package org.morphscout.indexer.pairing;

import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.PixelFingerprint;
import org.morphscout.indexer.feature.ColourStats;

/**
 * Decides whether two analyses show the same picture, resized, recompressed or lightly edited: identical file
 * hashes, or appearance cosine, shape vector distance, object placement, foreground colour difference, aspect ratio and (when both
 * images have one) the pixel fingerprint correlation all within {@link NearDuplicateConfig}. The fingerprint is what
 * tells an edited copy from a neighbouring member of a silhouette family (same glaze, backdrop and light, a slightly
 * different outline), which passes everything else; without fingerprints (features stored before catalog schema
 * version 4) the other conditions decide alone. Such pairs are no morph; the pair finder lists them apart.
 * Immutable, thread-safe.
 */
public final class NearDuplicates {
  private final NearDuplicateConfig config;
  private final ColourDifference colour;

  public NearDuplicates(NearDuplicateConfig config, ColourDifference colour) {
    this.config = config;
    this.colour = colour;
  }

  public NearDuplicateConfig config() {
    return config;
  }

  public boolean areDuplicates(ImageAnalysis a, ImageAnalysis b) {
    if (a.contentHash() != null && !a.contentHash().isEmpty() && a.contentHash().equals(b.contentHash())) {
      return true;
    }
    if (a.appearance() == null || b.appearance() == null || a.appearance().length != b.appearance().length
        || a.appearance().length == 0 || !java.util.Objects.equals(a.modelId(), b.modelId())) {
      return false;
    }
    if (PairMeasures.cosine(a.appearance(), b.appearance()) < config.minCosine()) {
      return false;
    }
    if (a.shape() == null || b.shape() == null) {
      return false;
    }
    float[] sa = a.shape().shapeVector();
    float[] sb = b.shape().shapeVector();
    if (sa == null || sb == null || sa.length != sb.length || sa.length == 0 || distance(sa, sb) > config.maxShapeDistance()) {
      return false;
    }
    double oa = a.shape().aspect();
    double ob = b.shape().aspect();
    // A small copy's outline is measured on fewer pixels: allow about 4 pixels of bounding-box error on top.
    double objectPixels = Math.min(
        Math.min(a.shape().bboxW() * a.width(), a.shape().bboxH() * a.height()),
        Math.min(b.shape().bboxW() * b.width(), b.shape().bboxH() * b.height()));
    double tolerance = config.maxObjectAspectGap() + (objectPixels > 0 ? 4.0 / objectPixels : 1);
    if (!(oa > 0 && ob > 0) || Math.abs(oa / ob - 1) > tolerance) {
      return false;
    }
    if (Math.hypot(a.shape().centroidX() - b.shape().centroidX(), a.shape().centroidY() - b.shape().centroidY())
        > config.maxCentroidOffset()) {
      return false; // the object sits elsewhere in the frame: another shot, not the same picture
    }
    double ra = a.width() / (double) a.height();
    double rb = b.width() / (double) b.height();
    if (Math.abs(ra / rb - 1) > config.maxAspectGap()) {
      return false;
    }
    ColourStats ca = a.colour();
    ColourStats cb = b.colour();
    if (ca == null || cb == null || ca.foregroundMean() == null || cb.foregroundMean() == null) {
      return false;
    }
    double d = colour.deltaE(ca.foregroundMean(), cb.foregroundMean());
    if (!(d <= config.maxDeltaE())) {
      return false; // NaN (no foreground colour) is never a duplicate
    }
    if (ca.backgroundMean() == null || cb.backgroundMean() == null || Double.isNaN(ca.backgroundMean()[0])
        || Double.isNaN(cb.backgroundMean()[0])) {
      return samePixels(a, b); // cut-outs without background: the object decides alone
    }
    double bg = colour.deltaE(ca.backgroundMean(), cb.backgroundMean());
    double texture = Math.abs(ca.backgroundStd()[0] - cb.backgroundStd()[0]);
    return bg <= config.maxBackgroundDeltaE() && texture <= config.maxBackgroundStdGap() && samePixels(a, b);
  }

  /**
   * Whether the pixel fingerprints correlate well enough; true when either is unknown (or flat, or of another
   * length), so that the other conditions decide alone as before fingerprints existed.
   */
  private boolean samePixels(ImageAnalysis a, ImageAnalysis b) {
    double r = PixelFingerprint.correlation(a.fingerprint(), b.fingerprint());
    return Double.isNaN(r) || r >= config.minFingerprintCorrelation();
  }

  /** Euclidean distance of two vectors after L2 normalisation. */
  static double distance(float[] p, float[] q) {
    double np = 0;
    double nq = 0;
    for (int i = 0; i < p.length; i++) {
      np += (double) p[i] * p[i];
      nq += (double) q[i] * q[i];
    }
    np = np == 0 ? 1 : Math.sqrt(np);
    nq = nq == 0 ? 1 : Math.sqrt(nq);
    double s = 0;
    for (int i = 0; i < p.length; i++) {
      double d = p[i] / np - q[i] / nq;
      s += d * d;
    }
    return Math.sqrt(s);
  }
}
