package org.morphscout.indexer.pairing;

import java.util.Optional;

/**
 * Everything a pair score is computed from: the facts of each picture, the cheap measures of the pair and, once the
 * warp was estimated, its measures. A score is a pure function of these facts and the {@link ScoreConfig}, so stored
 * facts re-rank under new settings without loading or warping anything. Values are kept at single precision (the
 * precision they are stored at), so a pair scored from stored facts scores exactly like one scored live.
 *
 * @param first the picture the morph starts from (the first)
 * @param second the picture it ends at (the second)
 * @param measures the cheap measures; null when either picture has no object
 * @param warp the warp's measures; null when either picture has no object or the warp was not (yet) estimated
 */
public record PairFacts(ImageFacts first, ImageFacts second, PairMeasures measures, WarpMeasures warp) {

  public PairFacts {
    if (first == null || second == null) {
      throw new IllegalArgumentException("both pictures' facts are needed");
    }
    if (!first.empty() && !second.empty() && measures == null) {
      throw new IllegalArgumentException("a pair of two objects needs its measures");
    }
  }

  /** Whether both pictures have an object; a pair without one scores 0. */
  public boolean measurable() {
    return !first.empty() && !second.empty();
  }

  /** Whether the warp's measures are known (otherwise only an upper bound of the score is). */
  public boolean warped() {
    return warp != null;
  }

  public PairFacts withWarp(WarpMeasures w) {
    return new PairFacts(first, second, measures, w);
  }

  public Optional<WarpMeasures> warpMeasures() {
    return Optional.ofNullable(warp);
  }

  /** The value rounded to single precision (NaN stays NaN). */
  static double single(double v) {
    return (float) v;
  }
}
