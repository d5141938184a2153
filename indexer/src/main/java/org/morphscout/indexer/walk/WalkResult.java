package org.morphscout.indexer.walk;

import java.util.List;

/**
 * An ordering of items.
 *
 * @param order item indices in walking order (each once)
 * @param closed whether the walk returns to its first item (a tour); totals then include the closing step
 * @param total sum of the plain distances along the order
 * @param largestStep the largest single distance along the order
 * @param inputTotal the same total for the input order 0, 1, ..., n-1
 * @param improvement (inputTotal - total) / inputTotal; 0 when inputTotal is 0; negative if the input was better
 *     (possible only with fixed ends or a jump penalty)
 */
public record WalkResult(
    List<Integer> order, boolean closed, double total, double largestStep, double inputTotal, double improvement) {

  public WalkResult {
    order = List.copyOf(order);
  }
}
