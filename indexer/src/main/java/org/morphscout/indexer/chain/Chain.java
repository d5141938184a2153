package org.morphscout.indexer.chain;

import java.util.List;

/**
 * One chain of real images.
 *
 * @param images image ids from the first to the last, no repeats
 * @param steps the steps between consecutive images, costs under the query's cost model (no diversity penalty)
 * @param total the objective: sum of squared step costs
 * @param maxStep the largest step cost
 * @param evenness coefficient of variation of the step costs (population standard deviation / mean); 0 = all
 *     steps equal, and 0 for a single step
 * @param sharedImages largest Jaccard index of this chain's intermediate images (waypoints excluded) with those of any
 *     earlier chain in the same result, in [0, 1]; 0 for the first chain
 */
public record Chain(
    List<Long> images, List<Edge> steps, double total, double maxStep, double evenness, double sharedImages) {

  public Chain {
    images = List.copyOf(images);
    steps = List.copyOf(steps);
    if (images.size() != steps.size() + 1 || steps.isEmpty()) {
      throw new IllegalArgumentException("a chain needs n >= 2 images and n - 1 steps");
    }
  }

  /** Builds the summary numbers from the steps. */
  public static Chain of(List<Long> images, List<Edge> steps, double sharedImages) {
    double sum = 0;
    double sumSq = 0;
    double max = 0;
    for (Edge e : steps) {
      sum += e.cost();
      sumSq += e.cost() * e.cost();
      max = Math.max(max, e.cost());
    }
    int n = steps.size();
    double mean = sum / n;
    double var = Math.max(0, sumSq / n - mean * mean);
    double cv = mean > 0 ? Math.sqrt(var) / mean : 0;
    return new Chain(images, steps, sumSq, max, cv, sharedImages);
  }

  /** Number of steps. */
  public int length() {
    return steps.size();
  }
}
