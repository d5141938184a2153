package org.morphscout.indexer.chain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
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
  /** Most layered states per search (about 17 bytes each, so ~700 MB at the limit). */
  private static final long MAX_STATES = 40_000_000L;
  /** Relaxations allowed for the exact simple-chain bound (~0.1 s); beyond it the leg-by-leg heuristic runs. */
  private static final long SIMPLE_SEARCH_BUDGET = 30_000_000L;
  /**
   * Nodes the backward search for the A* bound may settle per leg. On local graphs the radius cut stops it much
   * earlier; on small-world graphs (everything within a few steps) a full backward search would cost more than it
   * saves, so the bound is left flat beyond this many nodes.
   */
  private static final int BOUND_BUDGET = 20_000;

  private final IndexedGraph g;

  public ChainFinder(StepGraph graph) {
    this.g = IndexedGraph.of(graph);
  }

  /**
   * Finds up to {@code query.alternatives()} chains.
   *
   * @param distanceToTarget the cost model's distance of any image to {@code query.to()}, used only to name the
   *     closest reachable image when no chain exists
   * @throws MorphscoutException when an end or waypoint is not in the graph, or the search would be too large
   */
  public ChainResult find(ChainQuery query, DistanceToTarget distanceToTarget) {
    int n = g.size();
    int[] stops = new int[query.via().size() + 2];
    stops[0] = indexOrThrow(query.from(), "start");
    for (int i = 0; i < query.via().size(); i++) {
      stops[i + 1] = indexOrThrow(query.via().get(i), "waypoint");
    }
    stops[stops.length - 1] = indexOrThrow(query.to(), "target");
    long states = (long) (stops.length - 1) * n * (query.maxSteps() + 1);
    if (states > MAX_STATES) {
      throw new MorphscoutException("A chain search over " + n + " images with " + query.maxSteps() + " steps and "
          + query.via().size() + " waypoints needs too much memory; lower the step limit or use fewer waypoints.");
    }
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

    double[][] legDistances = legDistances(stops, query);
    double[][] bound = stageBounds(stops, legDistances);
    List<Chain> chains = new ArrayList<>();
    List<Set<Integer>> kept = new ArrayList<>();
    int rounds = ROUNDS_PER_ALTERNATIVE * query.alternatives();
    boolean exactSimpleGaveUp = false;
    for (int round = 0; round < rounds && chains.size() < query.alternatives(); round++) {
      LayeredChainSearch search = new LayeredChainSearch(
          g, query.costModel(), penalty, blocked, query.minSteps(), query.maxSteps(), bound);
      Optional<LayeredChainSearch.Walk> walk = search.search(stops);
      if (walk.isPresent() && !walk.get().isSimple()) {
        walk = !exactSimpleGaveUp && affordsExactSimple(stops.length - 1, query.maxSteps())
            ? new SimpleChainSearch(search).search(stops)
            : Optional.empty();
        if (walk.isEmpty()) {
          exactSimpleGaveUp = true; // later rounds are penalised variants of the same problem: skip straight on
          walk = legByLeg(query, stops, penalty, blocked, legDistances);
        }
      }
      if (walk.isEmpty()) {
        if (round == 0) {
          return new NoChainDiagnosis(g).explain(query, stops, blocked, distanceToTarget);
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

  /**
   * Heuristic fallback when the exact simple-chain search gives up: one leg at a time (start to first waypoint,
   * and so on), each leg blocking the images earlier legs used and getting an equal share of the steps left
   * (at least one); the last leg also carries what is left of minSteps. Not optimal (an early leg may take
   * an image a later leg needed) but always simple.
   */
  private Optional<LayeredChainSearch.Walk> legByLeg(ChainQuery q, int[] stops, double[] penalty,
      boolean[] blocked, double[][] legDistances) {
    boolean[] used = blocked.clone();
    List<Integer> nodes = new ArrayList<>();
    List<Integer> edges = new ArrayList<>();
    nodes.add(stops[0]);
    int legs = stops.length - 1;
    for (int leg = 0; leg < legs; leg++) {
      int stepsSoFar = edges.size();
      // An equal share of the steps left: with squared costs every leg would otherwise use all it may take.
      int left = q.maxSteps() - stepsSoFar;
      int max = leg == legs - 1 ? left : Math.max(1, left / (legs - leg));
      int min = leg == legs - 1 ? Math.max(1, q.minSteps() - stepsSoFar) : 1;
      if (max < min) {
        return Optional.empty();
      }
      for (int v : nodes) {
        used[v] = true;
      }
      used[stops[leg]] = false; // the leg's own start must stay usable as its start
      double[][] legBound = legDistances == null ? null : new double[][] {legDistances[leg]};
      LayeredChainSearch search = new LayeredChainSearch(g, q.costModel(), penalty, used, min, max, legBound);
      int[] legStops = {stops[leg], stops[leg + 1]};
      Optional<LayeredChainSearch.Walk> part = search.search(legStops);
      if (part.isPresent() && !part.get().isSimple()) {
        part = affordsExactSimple(1, max) ? new SimpleChainSearch(search).search(legStops) : Optional.empty();
      }
      if (part.isEmpty()) {
        return Optional.empty();
      }
      for (int i = 1; i < part.get().nodes().length; i++) {
        nodes.add(part.get().nodes()[i]);
      }
      for (int e : part.get().edges()) {
        edges.add(e);
      }
    }
    return Optional.of(new LayeredChainSearch.Walk(
        nodes.stream().mapToInt(Integer::intValue).toArray(), edges.stream().mapToInt(Integer::intValue).toArray()));
  }

  /**
   * Per leg, plain distances of every node to the leg's end, capped at a radius (null when the graph is not
   * symmetric). The radius comes from the leg's plain shortest path: when its step count fits the query, its sum of
   * squares bounds the optimum from above, and no useful node lies farther than {@link PlainDistances#radiusFor}.
   * Otherwise the whole graph is searched. Any radius gives a valid bound; a good one just saves work.
   */
  private double[][] legDistances(int[] stops, ChainQuery q) {
    if (!g.symmetric) {
      return null;
    }
    int legs = stops.length - 1;
    double[][] d = new double[legs][];
    for (int leg = 0; leg < legs; leg++) {
      PlainDistances plain = new PlainDistances(g, q.costModel(), stops[leg + 1]);
      double radius = Double.POSITIVE_INFINITY;
      if (plain.settle(stops[leg]) < Double.POSITIVE_INFINITY && legs == 1) {
        double[] path = plain.squaredPathCost(stops[leg]);
        if (path[1] >= q.minSteps() && path[1] <= q.maxSteps()) {
          radius = PlainDistances.radiusFor(path[0], q.maxSteps());
        }
      }
      d[leg] = plain.capped(radius, BOUND_BUDGET);
    }
    return d;
  }

  /** Per stage, plain distance to the stage's next stop plus the plain lengths of the legs after it. */
  private static double[][] stageBounds(int[] stops, double[][] legDistances) {
    if (legDistances == null) {
      return null;
    }
    int legs = legDistances.length;
    double[][] bound = new double[legs][];
    double tail = 0;
    for (int s = legs - 1; s >= 0; s--) {
      bound[s] = legDistances[s].clone();
      if (tail > 0) {
        for (int v = 0; v < bound[s].length; v++) {
          bound[s][v] += tail;
        }
      }
      tail += legDistances[s][stops[s]];
    }
    return bound;
  }

  /** Whether {@link SimpleChainSearch}'s bound (legs x layers x steps relaxations) fits the work budget. */
  private boolean affordsExactSimple(int legs, int maxSteps) {
    return (long) legs * (maxSteps + 1) * g.targets.length <= SIMPLE_SEARCH_BUDGET;
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
