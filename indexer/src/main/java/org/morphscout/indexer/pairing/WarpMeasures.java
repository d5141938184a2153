package org.morphscout.indexer.pairing;

import org.morphscout.indexer.warp.WarpResult;

/**
 * The numbers a pair score takes from the warp between two silhouettes (see {@link WarpResult} for their meaning),
 * without the displacement field, kept at single precision.
 */
public record WarpMeasures(
    double iouBefore,
    double iouAligned,
    double iouWarped,
    double meanDisplacement,
    double maxDisplacement,
    double foldFraction,
    double turnedIou,
    double turnedRotation) {

  public WarpMeasures {
    iouBefore = PairFacts.single(iouBefore);
    iouAligned = PairFacts.single(iouAligned);
    iouWarped = PairFacts.single(iouWarped);
    meanDisplacement = PairFacts.single(meanDisplacement);
    maxDisplacement = PairFacts.single(maxDisplacement);
    foldFraction = PairFacts.single(foldFraction);
    turnedIou = PairFacts.single(turnedIou);
    turnedRotation = PairFacts.single(turnedRotation);
  }

  public static WarpMeasures of(WarpResult w) {
    return new WarpMeasures(w.iouBefore(), w.iouAligned(), w.iouWarped(), w.meanDisplacement(), w.maxDisplacement(),
        w.foldFraction(), w.turnedIou(), w.turnedRotation());
  }
}
