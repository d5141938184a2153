package org.morphscout.indexer.chain;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Finds chains of real images between two images on a {@link StepGraph}: the best chain minimises the sum of
 * squared step costs within the query's step bounds (exact, see {@link LayeredChainSearch}), and up to K-1 diverse
 * alternatives follow from the iterative penalty method: after each chain, the costs of steps touching its
 * intermediate images are multiplied by {@link ChainQuery#penalty()} and the search runs again; a new chain is kept
 * only if its intermediate images overlap every kept chain by at most {@link ChainQuery#maxOverlap()} (Jaccard).
 * The penalty method for alternative routes is common practice in route planning (e.g. Bader, Dees, Geisberger and
 * Sanders, "Alternative route graphs in road networks", TAPAS 2011). Reported costs never include penalties.
 *
 * <p>The graph is copied into a compact indexed form when the finder is made; make a new finder after the graph
 * changes. Costs are recomputed from the stored components with each query's cost model, so a different shape
 * weight needs no rebuild. Thread-safe: queries share only the immutable snapshot.
 */
public final class ChainFinder {
  private static final Logger LOG = LoggerFactory.getLogger(ChainFinder.class);
  /** Search rounds per wanted alternative before giving up on finding more diverse chains. */
  private static final int ROUNDS_PER_ALTERNATIVE = 4;

  private final IndexedGraph g;

  public ChainFinder(StepGraph graph) {
    this.g = IndexedGraph.of(graph);
  }

  /**
   * Finds up to {@code query.alternatives()} chains.
   *
   * @param distanceToTarget the cost model's distance of any image to {@code query.to()}, used only to name the
   *     closest reachable image when no chain exists
   * @throws MorphscoutException when an end, waypoint is not in the graph
   */
  public ChainResult find(ChainQuery query, DistanceToTarget distanceToTarget) {
    int n = g.size();
    int[] stops = new int[query.via().size() + 2];
    stops[0] = indexOrThrow(query.from(), "start");
    for (int i = 0; i < query.via().size(); i++) {
      stops[i + 1] = indexOrThrow(query.via().get(i), "waypoint");
    }
    stops[stops.length - 1] = indexOrThrow(query.to(), "target");
    boolean[] blocked = new boolean[n];
    for (long id : query.avoid()) {
      int i = g.index(id);
      if (i >= 0) {
        blocked[i] = true;
      }
    }
    Set<Integer> waypoints = new HashSet<>();
    for (int i = 1; i < stops.length - 1; i++) {
      waypoints.add(stops[i]);
    }
    double[] penalty = new double[n];
    Arrays.fill(penalty, 1.0);

    List<Chain> chains = new ArrayList<>();
    List<Set<Integer>> kept = new ArrayList<>();
    int rounds = ROUNDS_PER_ALTERNATIVE * query.alternatives();
    for (int round = 0; round < rounds && chains.size() < query.alternatives(); round++) {
      LayeredChainSearch search =
          new LayeredChainSearch(g, query.costModel(), penalty, blocked, query.minSteps(), query.maxSteps());
      Optional<LayeredChainSearch.Walk> walk = search.search(stops, false);
      if (walk.isPresent() && !walk.get().isSimple()) {
        walk = search.search(stops, true);
      }
      if (walk.isEmpty() || !walk.get().isSimple()) {
        if (round == 0) {
          return noChain(query, stops, blocked, search.reached(), distanceToTarget);
        }
        break;
      }
      int[] nodes = walk.get().nodes();
      Set<Integer> inner = new HashSet<>();
      for (int i = 1; i < nodes.length - 1; i++) {
        if (!waypoints.contains(nodes[i])) {
          inner.add(nodes[i]);
        }
      }
      double overlap = 0;
      boolean duplicate = false;
      for (int c = 0; c < kept.size(); c++) {
        overlap = Math.max(overlap, jaccard(inner, kept.get(c)));
        duplicate |= Arrays.equals(nodes, chainNodes(chains.get(c)));
      }
      if (!duplicate && (chains.isEmpty() || overlap <= query.maxOverlap())) {
        chains.add(toChain(walk.get(), query.costModel(), overlap));
        kept.add(inner);
      }
      if (inner.isEmpty()) {
        // The direct step has no intermediates to penalise. Penalising both ends scales the direct step by
        // penalty^2 but any longer chain's first and last steps only by penalty, so the next round looks further.
        penalty[nodes[0]] *= query.penalty();
        penalty[nodes[nodes.length - 1]] *= query.penalty();
      }
      for (int v : inner) {
        penalty[v] *= query.penalty();
      }
    }
    LOG.debug("chain {} -> {}: {} chain(s)", query.from(), query.to(), chains.size());
    return ChainResult.found(chains);
  }

  private int[] chainNodes(Chain c) {
    return c.images().stream().mapToInt(g::index).toArray();
  }

  private Chain toChain(LayeredChainSearch.Walk walk, StepCostModel model, double overlap) {
    List<Long> images = new ArrayList<>(walk.nodes().length);
    for (int v : walk.nodes()) {
      images.add(g.ids[v]);
    }
    List<Edge> steps = new ArrayList<>(walk.edges().length);
    for (int i = 0; i < walk.edges().length; i++) {
      int e = walk.edges()[i];
      StepCost c = g.components(e);
      steps.add(new Edge(images.get(i), images.get(i + 1), model.cost(c), c));
    }
    return Chain.of(images, steps, overlap);
  }

  private ChainResult noChain(ChainQuery q, int[] stops, boolean[] blocked, boolean[] reached,
      DistanceToTarget distance) {
    int start = stops[0];
    long best = 0;
    double bestDistance = Double.POSITIVE_INFINITY;
    for (int v = 0; v < reached.length; v++) {
      if (reached[v] && v != start) {
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

  private int indexOrThrow(long id, String role) {
    int i = g.index(id);
    if (i < 0) {
      throw new MorphscoutException("The " + role + " image " + id
          + " is not in the neighbour graph; index it (or rebuild the graph) before asking for chains.");
    }
    return i;
  }

  static double jaccard(Set<Integer> a, Set<Integer> b) {
    if (a.isEmpty() && b.isEmpty()) {
      return 0;
    }
    int common = 0;
    for (int x : a) {
      if (b.contains(x)) {
        common++;
      }
    }
    return (double) common / (a.size() + b.size() - common);
  }
}
