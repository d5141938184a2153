package org.morphscout.indexer.chain;

/**
 * The cost model's direct distance from any image to a chain's target, used to name the closest reachable image
 * when no chain exists (the caller computes it from the catalog, for example the mixed cost of the direct step).
 */
@FunctionalInterface
public interface DistanceToTarget {
  /** Distance &gt;= 0 from {@code id} to the target; smaller is closer. */
  double distance(long id);
}
