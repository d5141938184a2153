package org.morphscout.indexer.chain;

/**
 * Turns a step's components into one cost:
 *
 * <pre>
 *   cost = (1 - w) * appearanceDistance / appearanceScale + w * shapeIncompatibility + c * colourGap / colourScale
 * </pre>
 *
 * <p>The appearance term is divided by {@code appearanceScale} so that both main terms live on comparable ranges:
 * cosine distances between real photographs rarely exceed about 1 (orthogonal vectors), while the shape term is
 * already in [0, 1]. The colour term is off by default because the appearance vector already reacts to colour; turn
 * it on when a user cares about colour continuity (a ΔE of {@code colourScale} then costs {@code c}).
 *
 * @param shapeWeight w in [0, 1]: 0 = appearance only, 1 = silhouette only. Default 0.5.
 * @param appearanceScale &gt; 0, the appearance distance that counts as "fully different". Default 1.0.
 * @param colourWeight c &gt;= 0, weight of the colour term. Default 0 (off).
 * @param colourScale &gt; 0, the ΔE that counts as one unit of colour gap. Default 50 (a large, obvious change).
 */
public record StepCostModel(
    double shapeWeight, double appearanceScale, double colourWeight, double colourScale) {

  public static final double DEFAULT_SHAPE_WEIGHT = 0.5;
  public static final StepCostModel DEFAULT = new StepCostModel(DEFAULT_SHAPE_WEIGHT, 1.0, 0.0, 50.0);

  public StepCostModel {
    if (!(shapeWeight >= 0 && shapeWeight <= 1)) {
      throw new IllegalArgumentException("shape weight must be in [0, 1], got " + shapeWeight);
    }
    if (!(appearanceScale > 0 && Double.isFinite(appearanceScale))) {
      throw new IllegalArgumentException("appearance scale must be > 0, got " + appearanceScale);
    }
    if (!(colourWeight >= 0 && Double.isFinite(colourWeight))) {
      throw new IllegalArgumentException("colour weight must be >= 0, got " + colourWeight);
    }
    if (!(colourScale > 0 && Double.isFinite(colourScale))) {
      throw new IllegalArgumentException("colour scale must be > 0, got " + colourScale);
    }
  }

  /** The default model with another shape weight (the command line's shape-weight option). */
  public static StepCostModel withShapeWeight(double shapeWeight) {
    return DEFAULT.shapeWeight(shapeWeight);
  }

  /** This model with another shape weight. */
  public StepCostModel shapeWeight(double w) {
    return new StepCostModel(w, appearanceScale, colourWeight, colourScale);
  }

  /** The mixed cost of raw components, &gt;= 0. */
  public double cost(double appearanceDistance, double shapeIncompatibility, double colourGap) {
    return (1 - shapeWeight) * appearanceDistance / appearanceScale
        + shapeWeight * shapeIncompatibility
        + colourWeight * colourGap / colourScale;
  }

  /** The mixed cost of a step's components (its stored mixed cost is ignored). */
  public double cost(StepCost c) {
    return cost(c.appearanceDistance(), c.shapeIncompatibility(), c.colourGap());
  }

  /** The same components with the mixed cost computed by this model. */
  public StepCost mix(StepCost c) {
    return new StepCost(c.appearanceDistance(), c.shapeIncompatibility(), c.colourGap(), cost(c));
  }

  /** Components with the mixed cost computed by this model. */
  public StepCost mix(double appearanceDistance, double shapeIncompatibility, double colourGap) {
    return new StepCost(appearanceDistance, shapeIncompatibility, colourGap,
        cost(appearanceDistance, shapeIncompatibility, colourGap));
  }
}
