package org.morphscout.indexer.library;

import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.StepCost;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.vector.VectorMath;

/** The raw components of a step between two analysed images, as the neighbour graph stores them. */
public final class StepFeatures {
  private StepFeatures() {}

  /** Appearance distance (1 - cosine), shape incompatibility (1 - cosine of shape vectors) and CIEDE2000 colour gap. */
  public static StepCost between(ImageAnalysis a, ImageAnalysis b) {
    double appearance = clamp(1 - VectorMath.dot(a.appearance(), b.appearance()), 0, 2);
    double shape = clamp(1 - VectorMath.dot(a.shape().shapeVector(), b.shape().shapeVector()), 0, 1);
    double[] ca = a.colour().foregroundMean();
    double[] cb = b.colour().foregroundMean();
    double colour = Double.isNaN(ca[0]) || Double.isNaN(cb[0]) ? 0 : Ciede2000.difference(ca, cb);
    return StepCost.of(appearance, shape, colour);
  }

  private static double clamp(double v, double lo, double hi) {
    return Math.max(lo, Math.min(hi, v));
  }
}
