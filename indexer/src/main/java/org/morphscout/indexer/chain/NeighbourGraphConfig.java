package org.morphscout.indexer.chain;

/**
 * Settings of {@link NeighbourGraphBuilder}.
 *
 * @param neighbours k, the nearest neighbours kept per image, &gt;= 1. Default 24: enough choice for chains to
 *     find even steps, while a 100,000-image graph stays around 150 MB. Raise it for libraries with many
 *     near-duplicates (they fill the list with trivial steps).
 * @param reverseScan how many of a new image's nearest candidates are checked for whether the new image enters
 *     their own k-nearest list, &gt;= k. Default 2k. An image whose k-th neighbour is farther than the new one but
 *     which is not among the new image's {@code reverseScan} nearest is missed (rare: such reverse neighbours lie
 *     close by); set it to the library size for an exact match with a rebuild.
 */
public record NeighbourGraphConfig(int neighbours, int reverseScan) {

  public static final int DEFAULT_NEIGHBOURS = 24;
  public static final NeighbourGraphConfig DEFAULT = of(DEFAULT_NEIGHBOURS);

  public NeighbourGraphConfig {
    if (neighbours < 1) {
      throw new IllegalArgumentException("neighbours (k) must be >= 1, got " + neighbours);
    }
    if (reverseScan < neighbours) {
      throw new IllegalArgumentException(
          "reverseScan must be >= neighbours (" + neighbours + "), got " + reverseScan);
    }
  }

  /** k neighbours with the default reverse scan of 2k. */
  public static NeighbourGraphConfig of(int neighbours) {
    return new NeighbourGraphConfig(neighbours, 2 * neighbours);
  }
}
