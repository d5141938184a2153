package org.morphscout.indexer.pairing;

import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.warp.WarpEstimator;
import org.morphscout.indexer.warp.WarpResult;
import org.morphscout.indexer.warp.WarpShape;

/**
 * Measures a pair of analysed pictures into {@link PairFacts}: the cheap measures on their own (to bound the score
 * before paying for a warp), or with the warp. Immutable and thread-safe.
 */
public final class PairMeasurer {
  /**
   * The version of the measuring code. Stored with every stored pair; raise it whenever a change here (or in what
   * it calls: warp estimation, colour difference, the analysis) would give other facts for the same pictures, so
   * catalogs know which stored pairs are stale.
   */
  public static final int VERSION = 4; // 2: near-duplicates also need the object in the same place; 3: fewer demons
  // iterations at the finer levels (DemonsConfig.DEFAULT); 4: 5 iterations at the finest level and scaling and
  // squaring down to one pixel (DemonsRegistration.EXP_MAX_STEP)

  private final ColourDifference colour;
  private final WarpEstimator warps;

  public PairMeasurer(ColourDifference colour, WarpEstimator warps) {
    this.colour = colour;
    this.warps = warps;
  }

  /** The cheap facts: everything but the warp. */
  public PairFacts cheap(ImageAnalysis a, ImageAnalysis b) {
    ImageFacts fa = ImageFacts.of(a);
    ImageFacts fb = ImageFacts.of(b);
    PairMeasures m = fa.empty() || fb.empty() ? null : PairMeasures.of(a, b, colour);
    return new PairFacts(fa, fb, m, null);
  }

  /** The warp between two pictures that both have an object. */
  public WarpResult warp(ImageAnalysis a, ImageAnalysis b) {
    return warps.estimate(a.silhouette().mask(), b.silhouette().mask());
  }

  /**
   * A picture's silhouette prepared for {@link #warp(WarpShape, WarpShape)}, for a caller that warps one picture
   * with many others.
   *
   * @throws IllegalArgumentException when the picture has no object
   */
  public WarpShape shape(ImageAnalysis a) {
    return warps.shape(a.silhouette().mask());
  }

  /** {@link #warp(ImageAnalysis, ImageAnalysis)} of prepared silhouettes: the same result. */
  public WarpResult warp(WarpShape a, WarpShape b) {
    return warps.estimate(a, b);
  }

  /** All facts, the warp included (when both pictures have an object). */
  public PairFacts measure(ImageAnalysis a, ImageAnalysis b) {
    PairFacts f = cheap(a, b);
    return f.measurable() ? f.withWarp(WarpMeasures.of(warp(a, b))) : f;
  }
}
