package org.morphscout.indexer.chain;

/**
 * The measured components of one step between two images, kept apart so a query can re-weight them with another
 * shape weight without rebuilding the graph.
 *
 * @param appearanceDistance cosine distance of the appearance vectors, in [0, 2] (0 = same direction)
 * @param shapeIncompatibility how badly the silhouettes fit, in [0, 1] (for example 1 - shape cosine, or
 *     1 - IoU after alignment); 0 = identical silhouettes
 * @param colourGap CIELAB colour difference ΔE between the two images' foregrounds, &gt;= 0 (0 when unknown)
 * @param mixedCost the step cost under the cost model in force when the graph was built, &gt;= 0
 */
public record StepCost(
    double appearanceDistance, double shapeIncompatibility, double colourGap, double mixedCost) {

  public StepCost {
    check("appearanceDistance", appearanceDistance, 0, 2);
    check("shapeIncompatibility", shapeIncompatibility, 0, 1);
    check("colourGap", colourGap, 0, Double.MAX_VALUE);
    check("mixedCost", mixedCost, 0, Double.MAX_VALUE);
  }

  /** Components with the mixed cost left at 0; use {@link StepCostModel#mix} to fill it in. */
  public static StepCost of(double appearanceDistance, double shapeIncompatibility, double colourGap) {
    return new StepCost(appearanceDistance, shapeIncompatibility, colourGap, 0);
  }

  private static void check(String name, double v, double lo, double hi) {
    if (!(v >= lo && v <= hi)) {
      throw new IllegalArgumentException(name + " must be in [" + lo + ", " + hi + "], got " + v);
    }
  }
}
