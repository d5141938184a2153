package org.morphscout.indexer.chain;

/**
 * One directed step of a {@link StepGraph}.
 *
 * @param from source image id
 * @param to target image id
 * @param cost the step cost, &gt;= 0 (the stored mixed cost, or re-weighted by a query's {@link StepCostModel})
 * @param components the measured components the cost came from
 */
public record Edge(long from, long to, double cost, StepCost components) {

  public Edge {
    if (!(cost >= 0) || Double.isInfinite(cost)) {
      throw new IllegalArgumentException("edge cost must be finite and >= 0, got " + cost);
    }
    if (components == null) {
      throw new IllegalArgumentException("components must not be null");
    }
  }

  /** This step with its cost recomputed from the components by {@code model}. */
  public Edge reweighted(StepCostModel model) {
    return new Edge(from, to, model.cost(components), components);
  }
}
