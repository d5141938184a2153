package org.morphscout.indexer.feature;

import java.util.List;

/**
 * Colour statistics of one image in CIELAB (D65), for the object (foreground) and the background separately: the
 * per-channel mean and standard deviation that adaptive instance normalisation (AdaIN) blends, plus dominant colours.
 * Arrays hold {L*, a*, b*}. Where a region is empty its mean and deviation are NaN.
 *
 * @param dominant up to a few dominant colours of the foreground, most weighty first
 */
public record ColourStats(
    double[] foregroundMean,
    double[] foregroundStd,
    double[] backgroundMean,
    double[] backgroundStd,
    List<DominantColour> dominant) {

  /** One dominant colour, {L*, a*, b*}, with the fraction of foreground pixels it stands for, in [0, 1]. */
  public record DominantColour(double[] lab, double weight) {}
}
