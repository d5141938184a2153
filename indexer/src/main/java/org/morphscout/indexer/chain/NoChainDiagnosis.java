package org.morphscout.indexer.chain;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.OptionalLong;

/**
 * Explains a failed chain query: why no chain exists (separate parts of the graph, avoided images in the way, too
 * few steps allowed, or only chains that repeat an image) and which reachable image lies closest to the target.
 */
final class NoChainDiagnosis {
  private final IndexedGraph g;

  NoChainDiagnosis(IndexedGraph g) {
    this.g = g;
  }

  ChainResult explain(ChainQuery q, int[] stops, boolean[] blocked, DistanceToTarget distance) {
    // Closest reachable: any image within the step limit of the start, around avoided images.
    int[] depth = depths(stops[0], blocked, q.maxSteps());
    long best = 0;
    double bestDistance = Double.POSITIVE_INFINITY;
    for (int v = 0; v < depth.length; v++) {
      if (depth[v] > 0 && v != stops[stops.length - 1]) {
        double d = distance.distance(g.ids[v]);
        if (d < bestDistance) {
          bestDistance = d;
          best = g.ids[v];
        }
      }
    }
    OptionalLong closest = bestDistance < Double.POSITIVE_INFINITY ? OptionalLong.of(best) : OptionalLong.empty();
    String base = "no chain of " + q.minSteps() + " to " + q.maxSteps() + " steps joins image " + q.from()
        + " to image " + q.to() + (q.via().isEmpty() ? "" : " through " + q.via());
    int unbounded = hopsIgnoringLimit(stops, blocked);
    String why;
    if (unbounded < 0) {
      boolean[] none = new boolean[g.size()];
      why = hopsIgnoringLimit(stops, none) < 0
          ? "they are in separate parts of the neighbour graph (no sequence of similar images links them)"
          : "every link between them passes through an avoided image";
    } else if (unbounded > q.maxSteps()) {
      why = "the shortest link needs " + unbounded + " steps; raise the step limit";
    } else {
      why = "no link has a step count within the bounds without repeating an image";
    }
    String hint = closest.isPresent() ? "; closest reachable image to the target: " + closest.getAsLong() : "";
    return ChainResult.none(base + ": " + why + hint, closest);
  }

  /** Breadth-first step counts from {@code start} up to {@code limit} steps around blocked images; -1 = not met. */
  private int[] depths(int start, boolean[] blocked, int limit) {
    int[] depth = new int[g.size()];
    Arrays.fill(depth, -1);
    ArrayDeque<Integer> queue = new ArrayDeque<>();
    depth[start] = 0;
    queue.add(start);
    while (!queue.isEmpty()) {
      int u = queue.poll();
      if (depth[u] == limit) {
        continue;
      }
      for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
        int v = g.targets[e];
        if (!blocked[v] && depth[v] < 0) {
          depth[v] = depth[u] + 1;
          queue.add(v);
        }
      }
    }
    return depth;
  }

  /** Fewest steps along the stops in order, ignoring the step bounds (breadth-first per leg); -1 if impossible. */
  private int hopsIgnoringLimit(int[] stops, boolean[] blocked) {
    int total = 0;
    for (int leg = 0; leg + 1 < stops.length; leg++) {
      int[] depth = new int[g.size()];
      Arrays.fill(depth, -1);
      ArrayDeque<Integer> queue = new ArrayDeque<>();
      depth[stops[leg]] = 0;
      queue.add(stops[leg]);
      while (!queue.isEmpty() && depth[stops[leg + 1]] < 0) {
        int u = queue.poll();
        for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
          int v = g.targets[e];
          if (!blocked[v] && depth[v] < 0) {
            depth[v] = depth[u] + 1;
            queue.add(v);
          }
        }
      }
      if (depth[stops[leg + 1]] < 0) {
        return -1;
      }
      total += depth[stops[leg + 1]];
    }
    return total;
  }
}
