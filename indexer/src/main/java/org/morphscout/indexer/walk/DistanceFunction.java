package org.morphscout.indexer.walk;

/** A symmetric, non-negative distance between items 0..n-1 (for example a pair's morph cost). */
@FunctionalInterface
public interface DistanceFunction {
  /** Distance &gt;= 0 between items {@code i} and {@code j}; must equal {@code distance(j, i)}. */
  double distance(int i, int j);
}
