package org.morphscout.indexer.chain;

import java.util.Arrays;

/**
 * Plain (not squared) shortest distances to one node under a cost model, by Dijkstra's algorithm on the reversed
 * steps (the graph must be symmetric). {@link LayeredChainSearch} turns them into its A* bound: by the
 * Cauchy-Schwarz inequality any completion with at most R steps and plain length L has a sum of squares of at
 * least L²/R.
 *
 * <p>The backward search is stopped early at a radius: nodes beyond it get the radius itself, which is still a
 * lower bound of their distance and keeps the bound consistent (min(D, r) &lt;= c + min(D', r) when
 * D &lt;= c + D'). The radius is derived from an upper bound on the chain's cost (see {@link #radiusFor}), so the
 * search only pays for the region a chain could use.
 */
final class PlainDistances {
  private final IndexedGraph g;
  private final double wa;
  private final double ws;
  private final double wc;
  private final double[] dist;
  private final int[] next; // next node on a shortest plain path to the target, -1 at the target
  private final boolean[] done;
  private final StateHeap heap = new StateHeap(1024);
  private int settled;

  PlainDistances(IndexedGraph g, StepCostModel model, int target) {
    this.g = g;
    this.wa = (1 - model.shapeWeight()) / model.appearanceScale();
    this.ws = model.shapeWeight();
    this.wc = model.colourWeight() / model.colourScale();
    this.dist = new double[g.size()];
    this.next = new int[g.size()];
    this.done = new boolean[g.size()];
    Arrays.fill(dist, Double.POSITIVE_INFINITY);
    dist[target] = 0;
    next[target] = -1;
    heap.push(0, target);
  }

  /** Runs the backward search until {@code node} is settled or nothing is left; returns its distance. */
  double settle(int node) {
    while (!done[node] && !heap.isEmpty()) {
      step();
    }
    return dist[node];
  }

  /** The plain shortest path's sum of squared step costs from a settled {@code node}, and its step count. */
  double[] squaredPathCost(int node) {
    double sum = 0;
    int steps = 0;
    for (int u = node; next[u] >= 0; u = next[u]) {
      double c = dist[u] - dist[next[u]];
      sum += c * c;
      steps++;
    }
    return new double[] {sum, steps};
  }

  /** A radius past which no node can lie on a chain cheaper than {@code upperBound} with at most maxSteps. */
  static double radiusFor(double upperBound, int maxSteps) {
    return Math.sqrt(upperBound * maxSteps);
  }

  /**
   * Settles everything within {@code radius}, or as much as {@code budget} settled nodes allow (the radius then
   * shrinks to the search's current frontier, below which every node is settled), and returns the distances capped
   * at the radius.
   */
  double[] capped(double radius, int budget) {
    while (!heap.isEmpty() && heap.topKey() <= radius && settled < budget) {
      step();
    }
    if (!heap.isEmpty() && heap.topKey() <= radius) {
      radius = heap.topKey(); // budget spent: every unsettled node is at least this far
    }
    double[] out = dist.clone();
    for (int v = 0; v < out.length; v++) {
      if (!done[v] || out[v] > radius) {
        out[v] = radius;
      }
    }
    return out;
  }

  private void step() {
    double d = heap.topKey();
    int u = heap.topValue();
    heap.pop();
    if (done[u]) {
      return;
    }
    done[u] = true;
    settled++;
    for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
      int v = g.targets[e];
      double d2 = d + wa * g.appearance[e] + ws * g.shape[e] + wc * g.colour[e];
      if (d2 < dist[v]) {
        dist[v] = d2;
        next[v] = u;
        heap.push(d2, v);
      }
    }
  }
}
