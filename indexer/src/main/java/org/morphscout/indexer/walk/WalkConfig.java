package org.morphscout.indexer.walk;

/**
 * Settings of {@link WalkPlanner}.
 *
 * @param neighbours candidate list length of the local search, &gt;= 3. Default 12: moves only join an item to one
 *     of its 12 nearest, which finds nearly every improving 2-opt/Or-opt move at a fraction of the cost (common
 *     practice; Johnson and McGeoch, "The traveling salesman problem: a case study in local optimization", 1997).
 * @param starts how many nearest-neighbour constructions (from different first items) are improved; the best is
 *     kept, &gt;= 1. Default 4.
 * @param jumpPenalty λ &gt;= 0, the "fewest large jumps" preference: the search minimises
 *     {@code d * (1 + λ * d / dMax)} per step, where dMax is the largest distance in the set. A step costs at most
 *     λ more than its distance, and two medium steps are preferred over a short one plus a long one of the same
 *     total. Default 0.05 (at most 5 %); 0 = plain shortest path/tour. Reported totals are always plain distances.
 * @param seed seed for choosing the extra start items (results are reproducible). Default 1.
 */
public record WalkConfig(int neighbours, int starts, double jumpPenalty, long seed) {

  public static final WalkConfig DEFAULT = new WalkConfig(12, 4, 0.05, 1);

  public WalkConfig {
    if (neighbours < 3) {
      throw new IllegalArgumentException("neighbours must be >= 3, got " + neighbours);
    }
    if (starts < 1) {
      throw new IllegalArgumentException("starts must be >= 1, got " + starts);
    }
    if (!(jumpPenalty >= 0 && Double.isFinite(jumpPenalty))) {
      throw new IllegalArgumentException("jumpPenalty must be finite and >= 0, got " + jumpPenalty);
    }
  }

  /** This configuration with another jump penalty (0 for a plain travelling-salesman objective). */
  public WalkConfig withJumpPenalty(double lambda) {
    return new WalkConfig(neighbours, starts, lambda, seed);
  }
}
