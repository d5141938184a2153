package org.morphscout.indexer.chain;

import java.util.Arrays;
import java.util.Optional;

/**
 * Exact cheapest <em>simple</em> chain (no image twice) under the same rules and costs as
 * {@link LayeredChainSearch}, for the rare queries whose cheapest walk repeats an image.
 *
 * <p>A* search (Hart, Nilsson and Raphael, IEEE Trans. SSC 1968) over partial chains, where the heuristic is the
 * exact cost-to-go of the relaxed problem (repeats allowed), computed by a backward Bellman-Ford recurrence over the
 * layered states (stage, node, steps). That bound is admissible and tight, so the search walks straight along the
 * best walk and only branches where that walk would repeat an image. Cost: O(S·H·m) for the bound plus the A*
 * frontier, capped at {@link #MAX_EXPANSIONS} expanded partial chains (then it reports none and
 * {@link ChainFinder} falls back to leg-by-leg search). The cap matters because squared costs make tiny detours
 * nearly free, so many partial chains can share almost the same bound.
 */
final class SimpleChainSearch {
  static final int MAX_EXPANSIONS = 5_000;

  private final LayeredChainSearch rules;

  SimpleChainSearch(LayeredChainSearch rules) {
    this.rules = rules;
  }

  Optional<LayeredChainSearch.Walk> search(int[] stops) {
    IndexedGraph g = rules.graph();
    int n = g.size();
    int legs = stops.length - 1;
    int layers = rules.maxSteps() + 1;
    int target = stops[legs];
    int[] stopIndex = new int[n];
    Arrays.fill(stopIndex, -1);
    for (int i = 0; i < stops.length; i++) {
      stopIndex[stops[i]] = i;
    }
    double[] toGo = costToGo(g, stops, stopIndex, legs, layers);

    // Partial chains as parallel arrays; parent links let each entry check its own images for repeats.
    int cap = 1024;
    int[] node = new int[cap];
    int[] stage = new int[cap];
    int[] steps = new int[cap];
    int[] parent = new int[cap];
    int[] edge = new int[cap];
    double[] cost = new double[cap];
    int count = 0;
    StateHeap open = new StateHeap(1024);
    double h0 = toGo[(0 * n + stops[0]) * layers];
    if (Double.isInfinite(h0)) {
      return Optional.empty();
    }
    node[0] = stops[0];
    parent[0] = -1;
    edge[0] = -1;
    count = 1;
    open.push(h0, 0);
    int expansions = 0;
    while (!open.isEmpty() && expansions++ < MAX_EXPANSIONS) {
      int p = open.topValue();
      open.pop();
      int u = node[p];
      if (u == target) {
        return Optional.of(walk(p, node, parent, edge));
      }
      int h2 = steps[p] + 1;
      if (h2 > rules.maxSteps()) {
        continue;
      }
      for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
        int v = g.targets[e];
        if (rules.blocked(v) || onChain(p, v, node, parent)) {
          continue;
        }
        int si = stopIndex[v];
        if (si >= 0 && si != stage[p] + 1) {
          continue;
        }
        int s2 = si >= 0 ? stage[p] + 1 : stage[p];
        double c = rules.stepCost(u, e);
        double g2 = cost[p] + c * c;
        double bound;
        if (v == target) {
          bound = h2 >= rules.minSteps() ? 0 : Double.POSITIVE_INFINITY;
        } else {
          bound = toGo[(s2 * n + v) * layers + h2];
        }
        if (Double.isInfinite(bound)) {
          continue;
        }
        if (count == node.length) {
          cap = count * 2;
          node = Arrays.copyOf(node, cap);
          stage = Arrays.copyOf(stage, cap);
          steps = Arrays.copyOf(steps, cap);
          parent = Arrays.copyOf(parent, cap);
          edge = Arrays.copyOf(edge, cap);
          cost = Arrays.copyOf(cost, cap);
        }
        node[count] = v;
        stage[count] = s2;
        steps[count] = h2;
        parent[count] = p;
        edge[count] = e;
        cost[count] = g2;
        open.push(g2 + bound, count);
        count++;
      }
    }
    return Optional.empty();
  }

  /** Backward recurrence: least cost from state (stage, node, steps) to the target, repeats allowed. */
  private double[] costToGo(IndexedGraph g, int[] stops, int[] stopIndex, int legs, int layers) {
    int n = g.size();
    int target = stops[legs];
    double[] f = new double[legs * n * layers];
    Arrays.fill(f, Double.POSITIVE_INFINITY);
    for (int h = rules.maxSteps() - 1; h >= 0; h--) {
      int h2 = h + 1;
      for (int s = 0; s < legs; s++) {
        for (int u = 0; u < n; u++) {
          if (rules.blocked(u)) {
            continue;
          }
          double best = Double.POSITIVE_INFINITY;
          for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
            int v = g.targets[e];
            int si = stopIndex[v];
            if (rules.blocked(v) || (si >= 0 && si != s + 1)) {
              continue;
            }
            double rest;
            if (v == target) {
              rest = h2 >= rules.minSteps() ? 0 : Double.POSITIVE_INFINITY;
            } else {
              int s2 = si >= 0 ? s + 1 : s;
              rest = f[(s2 * n + v) * layers + h2];
            }
            if (rest < Double.POSITIVE_INFINITY) {
              double c = rules.stepCost(u, e);
              best = Math.min(best, c * c + rest);
            }
          }
          f[(s * n + u) * layers + h] = best;
        }
      }
    }
    return f;
  }

  private static boolean onChain(int p, int v, int[] node, int[] parent) {
    for (int q = p; q >= 0; q = parent[q]) {
      if (node[q] == v) {
        return true;
      }
    }
    return false;
  }

  private static LayeredChainSearch.Walk walk(int p, int[] node, int[] parent, int[] edge) {
    int len = 0;
    for (int q = p; q >= 0; q = parent[q]) {
      len++;
    }
    int[] nodes = new int[len];
    int[] edges = new int[len - 1];
    int i = len - 1;
    for (int q = p; q >= 0; q = parent[q]) {
      nodes[i] = node[q];
      if (i > 0) {
        edges[i - 1] = edge[q];
      }
      i--;
    }
    return new LayeredChainSearch.Walk(nodes, edges);
  }
}
