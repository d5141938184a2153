package org.morphscout.indexer.chain;

import java.util.Arrays;
import java.util.Optional;

/**
 * Exact minimum of the sum of squared step costs over walks with a bounded number of steps through ordered
 * waypoints: Dijkstra's algorithm on the layered state graph (stage, node, steps taken), where the stage counts
 * the waypoints already visited. Squaring makes every step's contribution non-negative and convex, so many small
 * even steps win over a few big ones, and Dijkstra stays valid.
 *
 * <p><b>Complexity.</b> With n nodes, m directed steps, S legs (waypoints + 1) and H = maxSteps + 1 layers there are
 * at most S·n·H states and S·m·H relaxations, each O(log) on a primitive binary heap: O(S·H·m·log(S·H·n)) time,
 * O(S·H·n) memory, independent of how many chains exist. Two prunings keep the real work near one plain Dijkstra:
 * <ul>
 *   <li><i>Dominance.</i> A state (v, h) is dominated by an already settled (v, h') of the same stage with
 *       minSteps &lt;= h' &lt;= h: it has no higher cost (settled earlier), needs no more steps to reach minSteps
 *       and has at least as many steps left. So once a node is settled at some h' &gt;= minSteps only states with
 *       fewer steps can still matter; with loose bounds each node is expanded about once.</li>
 *   <li><i>Early stop.</i> The target is never expanded; the search ends when the cheapest open state costs no
 *       less than the best complete chain.</li>
 *   <li><i>A* bound.</i> With plain distances L(v) to the target (see {@link PlainDistances}) and R steps left,
 *       any completion costs at least L²/R (Cauchy-Schwarz). The bound is consistent, because
 *       (c + L')²/R &lt;= c² + L'²/(R-1) for L &lt;= c + L', so states are still settled once, in order of
 *       cost + bound (A*, Hart, Nilsson and Raphael 1968). Dominance then also compares costs explicitly, since
 *       settling order no longer implies lower cost.</li>
 * </ul>
 *
 * <p><b>Simple chains.</b> The optimum above is over walks. A walk that repeats an image can win only when minSteps
 * forces extra steps or when two legs share an image; {@link ChainFinder} then falls back to
 * {@link SimpleChainSearch}, which uses this class's transition rules and costs.
 *
 * <p>Not thread-safe; one instance per search.
 */
final class LayeredChainSearch {
  private final IndexedGraph g;
  private final double wa;
  private final double ws;
  private final double wc;
  private final double[] penalty;
  private final boolean[] blocked;
  private final int minSteps;
  private final int maxSteps;
  private final int layers;
  private final double[][] bound;
  private int[] parentState;

  /** A found walk: node indices and the edge slots between them. */
  record Walk(int[] nodes, int[] edges) {
    boolean isSimple() {
      int[] copy = nodes.clone();
      Arrays.sort(copy);
      for (int i = 1; i < copy.length; i++) {
        if (copy[i] == copy[i - 1]) {
          return false;
        }
      }
      return true;
    }
  }

  /**
   * @param bound per stage, a lower bound on the plain (unsquared, unpenalised) length from each node to the
   *     target through the remaining waypoints, or null for none (plain Dijkstra)
   */
  LayeredChainSearch(IndexedGraph g, StepCostModel model, double[] penalty, boolean[] blocked, int minSteps,
      int maxSteps, double[][] bound) {
    this.bound = bound;
    this.g = g;
    this.wa = (1 - model.shapeWeight()) / model.appearanceScale();
    this.ws = model.shapeWeight();
    this.wc = model.colourWeight() / model.colourScale();
    this.penalty = penalty;
    this.blocked = blocked;
    this.minSteps = minSteps;
    this.maxSteps = maxSteps;
    this.layers = maxSteps + 1;
  }

  /** Step cost of edge slot {@code e} from node {@code u}, penalties included (not squared). */
  double stepCost(int u, int e) {
    int v = g.targets[e];
    return (wa * g.appearance[e] + ws * g.shape[e] + wc * g.colour[e]) * penalty[u] * penalty[v];
  }

  IndexedGraph graph() {
    return g;
  }

  boolean blocked(int v) {
    return blocked[v];
  }

  int minSteps() {
    return minSteps;
  }

  int maxSteps() {
    return maxSteps;
  }

  /** The cheapest walk visiting {@code stops} in order (first = start, last = target), if any. */
  Optional<Walk> search(int[] stops) {
    int n = g.size();
    int legs = stops.length - 1;
    long stateCount = (long) legs * n * layers;
    if (stateCount > Integer.MAX_VALUE - 8) {
      throw new IllegalStateException("chain search state space too large: " + stateCount);
    }
    int[] stopIndex = new int[n];
    Arrays.fill(stopIndex, -1);
    for (int i = 0; i < stops.length; i++) {
      stopIndex[stops[i]] = i;
    }
    int states = (int) stateCount;
    double[] dist = new double[states];
    Arrays.fill(dist, Double.POSITIVE_INFINITY);
    parentState = new int[states];
    int[] parentEdge = new int[states];
    boolean[] settled = new boolean[states];
    int[] bestHop = new int[legs * n]; // per (stage, node): a settled h >= minSteps and its cost (dominance)
    Arrays.fill(bestHop, Integer.MAX_VALUE);
    double[] bestHopCost = new double[legs * n];

    StateHeap heap = new StateHeap(1024);
    int start = state(0, stops[0], 0, n);
    dist[start] = 0;
    parentState[start] = -1;
    heap.push(estimate(0, stops[0], 0), start);
    double bestGoal = Double.POSITIVE_INFINITY;
    int goalParent = -1;
    int goalEdge = -1;
    int target = stops[legs];

    while (!heap.isEmpty() && heap.topKey() < bestGoal) {
      int st = heap.topValue();
      heap.pop();
      if (settled[st]) {
        continue; // with a consistent bound the first pop of a state is its cheapest
      }
      double d = dist[st];
      int h = st % layers;
      int stageNode = st / layers;
      int stage = stageNode / n;
      int u = stageNode % n;
      if (h >= minSteps) {
        if (bestHop[stageNode] <= h && bestHopCost[stageNode] <= d) {
          continue; // dominated by a settled state with fewer (but enough) steps and no higher cost
        }
        if (h < bestHop[stageNode]) {
          bestHop[stageNode] = h;
          bestHopCost[stageNode] = d;
        }
      }
      settled[st] = true;
      int h2 = h + 1;
      if (h2 > maxSteps) {
        continue;
      }
      for (int e = g.offsets[u]; e < g.offsets[u + 1]; e++) {
        int v = g.targets[e];
        if (blocked[v]) {
          continue;
        }
        int si = stopIndex[v];
        if (si >= 0 && si != stage + 1) {
          continue; // waypoints only in order, never twice; the start never again
        }
        int stage2 = si >= 0 ? stage + 1 : stage;
        if (h2 + (legs - stage2) > maxSteps) {
          continue; // not enough steps left for the remaining legs
        }
        double c = stepCost(u, e);
        double d2 = d + c * c;
        if (v == target) {
          if (h2 >= minSteps && d2 < bestGoal) {
            bestGoal = d2;
            goalParent = st;
            goalEdge = e;
          }
          continue;
        }
        int s2 = state(stage2, v, h2, n);
        if (h2 >= minSteps && bestHop[stage2 * n + v] <= h2 && bestHopCost[stage2 * n + v] <= d2) {
          continue;
        }
        if (d2 < dist[s2]) {
          double f = d2 + estimate(stage2, v, h2);
          if (f < bestGoal) {
            dist[s2] = d2;
            parentState[s2] = st;
            parentEdge[s2] = e;
            heap.push(f, s2);
          }
        }
      }
    }
    if (goalParent < 0) {
      return Optional.empty();
    }
    int steps = goalParent % layers + 1;
    int[] nodes = new int[steps + 1];
    int[] edges = new int[steps];
    nodes[steps] = target;
    edges[steps - 1] = goalEdge;
    int st = goalParent;
    for (int i = steps - 1; i >= 0; i--) {
      nodes[i] = (st / layers) % n;
      if (i > 0) {
        edges[i - 1] = parentEdge[st];
      }
      st = parentState[st];
    }
    return Optional.of(new Walk(nodes, edges));
  }

  /** Lower bound on the remaining sum of squares from (stage, node) after h steps: L²/R, R = steps left. */
  private double estimate(int stage, int node, int h) {
    if (bound == null) {
      return 0;
    }
    double l = bound[stage][node];
    int left = maxSteps - h;
    if (left <= 0) {
      return l == 0 ? 0 : Double.POSITIVE_INFINITY;
    }
    return l * l / left;
  }

  private int state(int stage, int node, int h, int n) {
    return (stage * n + node) * layers + h;
  }
}
