package org.morphscout.indexer.chain;

import java.util.List;
import java.util.Set;

/**
 * The neighbour graph chains are searched on: images as nodes, short "morphable" steps as edges. Storage-neutral:
 * the catalog, an in-memory build, or a test fixture can all back it.
 *
 * <p>Graphs produced in this package are undirected (every edge is listed from both ends with equal components).
 */
public interface StepGraph {

  /** The steps leaving {@code id} (empty when the id is unknown or isolated); never null. */
  List<Edge> neighbours(long id);

  /** All node ids. */
  Set<Long> nodes();
}
