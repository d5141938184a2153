package org.morphscout.indexer.walk;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Random;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;

/**
 * Orders a set of items into a smooth walkthrough: an open path (or a closed tour) with a small total of step
 * distances and few large jumps.
 *
 * <p>Method: nearest-neighbour constructions from {@link WalkConfig#starts()} first items, each improved by 2-opt and
 * Or-opt to a local optimum ({@link LocalSearch}); the best is kept. An open path is solved as a closed tour
 * through one extra dummy item at distance 0 from every item allowed at an end (only the fixed start and/or end
 * when given), then cut at the dummy. Large jumps are discouraged by the convex step weight of
 * {@link WalkConfig#jumpPenalty()}.
 *
 * <p>Limits: up to {@link #MAX_ITEMS} items (dense distance matrix). About 1,000 items take well under 2 s on one
 * core. Thread-safe (no shared state).
 */
public final class WalkPlanner {
  /** Largest set accepted: the dense matrix of (n+1)^2 doubles then takes ~72 MB. */
  public static final int MAX_ITEMS = 3000;

  private final WalkConfig config;

  public WalkPlanner(WalkConfig config) {
    if (config == null) {
      throw new IllegalArgumentException("config must not be null");
    }
    this.config = config;
  }

  public WalkPlanner() {
    this(WalkConfig.DEFAULT);
  }

  /** An open path over items 0..n-1 with free ends. */
  public WalkResult planOpen(int n, DistanceFunction d) {
    return planOpen(n, d, OptionalInt.empty(), OptionalInt.empty());
  }

  /** An open path over items 0..n-1, starting at {@code start} and/or ending at {@code end} when given. */
  public WalkResult planOpen(int n, DistanceFunction d, OptionalInt start, OptionalInt end) {
    double[] raw = matrix(n, d);
    int s = checkItem(start, n, "start");
    int e = checkItem(end, n, "end");
    if (s >= 0 && s == e && n > 1) {
      throw new MorphscoutException("A walkthrough cannot start and end at the same item " + s
          + " unless it has only that item; ask for a closed tour instead.");
    }
    if (n == 1) {
      return result(List.of(0), raw, 1, false);
    }
    WeightMatrix wm = WeightMatrix.open(raw, n, config.jumpPenalty(), s, e, config.neighbours());
    int dummy = n;
    int[] best = null;
    double bestLen = Double.POSITIVE_INFINITY;
    for (int first : firstItems(n, s >= 0 ? s : -1)) {
      // dummy -> first -> nearest neighbours ... -> (end held back) -> back to dummy
      int[] tour = NearestNeighbourTour.build(wm, dummy, first, e >= 0 && e != first ? e : -1);
      LocalSearch ls = new LocalSearch(wm, tour);
      ls.run();
      if (ls.length() < bestLen) {
        bestLen = ls.length();
        best = ls.tour();
      }
    }
    List<Integer> order = cutAtDummy(best, dummy);
    if (s >= 0 && order.get(0) != s || e >= 0 && order.get(n - 1) != e) {
      if ((s < 0 || order.get(n - 1) == s) && (e < 0 || order.get(0) == e)) {
        order = order.reversed();
      } else {
        throw new IllegalStateException("fixed ends lost: " + order);
      }
    }
    return result(order, raw, n, false);
  }

  /** A closed tour over items 0..n-1 (starting, by convention, at item 0). */
  public WalkResult planClosed(int n, DistanceFunction d) {
    double[] raw = matrix(n, d);
    if (n <= 3) {
      List<Integer> order = new ArrayList<>();
      for (int i = 0; i < n; i++) {
        order.add(i);
      }
      return result(order, raw, n, true);
    }
    WeightMatrix wm = WeightMatrix.closed(raw, n, config.jumpPenalty(), config.neighbours());
    int[] best = null;
    double bestLen = Double.POSITIVE_INFINITY;
    for (int first : firstItems(n, -1)) {
      LocalSearch ls = new LocalSearch(wm, NearestNeighbourTour.build(wm, first, -1, -1));
      ls.run();
      if (ls.length() < bestLen) {
        bestLen = ls.length();
        best = ls.tour();
      }
    }
    List<Integer> order = new ArrayList<>(n);
    int zero = 0;
    while (best[zero] != 0) {
      zero++;
    }
    for (int k = 0; k < n; k++) {
      order.add(best[(zero + k) % n]);
    }
    return result(order, raw, n, true);
  }

  /** The first items to construct from: the fixed start, or item 0 and seeded random others. */
  private List<Integer> firstItems(int n, int fixed) {
    if (fixed >= 0) {
      return List.of(fixed);
    }
    Set<Integer> firsts = new LinkedHashSet<>();
    firsts.add(0);
    Random r = new Random(config.seed());
    while (firsts.size() < Math.min(n, config.starts())) {
      firsts.add(r.nextInt(n));
    }
    return new ArrayList<>(firsts);
  }

  private static List<Integer> cutAtDummy(int[] tour, int dummy) {
    int at = 0;
    while (tour[at] != dummy) {
      at++;
    }
    List<Integer> order = new ArrayList<>(tour.length - 1);
    for (int k = 1; k < tour.length; k++) {
      order.add(tour[(at + k) % tour.length]);
    }
    return order;
  }

  private static WalkResult result(List<Integer> order, double[] raw, int n, boolean closed) {
    double total = length(order, raw, n, closed);
    double largest = 0;
    int steps = closed ? n : n - 1;
    for (int k = 0; k < steps; k++) {
      largest = Math.max(largest, raw[order.get(k) * n + order.get((k + 1) % n)]);
    }
    List<Integer> identity = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      identity.add(i);
    }
    double input = length(identity, raw, n, closed);
    double improvement = input > 0 ? (input - total) / input : 0;
    return new WalkResult(order, closed, total, largest, input, improvement);
  }

  private static double length(List<Integer> order, double[] raw, int n, boolean closed) {
    double sum = 0;
    int steps = closed ? n : n - 1;
    for (int k = 0; k < steps && n > 1; k++) {
      sum += raw[order.get(k) * n + order.get((k + 1) % n)];
    }
    return sum;
  }

  private static double[] matrix(int n, DistanceFunction d) {
    if (n < 1 || n > MAX_ITEMS) {
      throw new MorphscoutException(
          "A walkthrough needs between 1 and " + MAX_ITEMS + " items, got " + n + "; split the set.");
    }
    double[] raw = new double[n * n];
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        double x = d.distance(i, j);
        if (!(x >= 0) || Double.isInfinite(x)) {
          throw new IllegalArgumentException("distance(" + i + ", " + j + ") must be finite and >= 0, got " + x);
        }
        raw[i * n + j] = x;
        raw[j * n + i] = x;
      }
    }
    return raw;
  }

  /** The fixed item's index, or -1 when none is given. */
  private static int checkItem(OptionalInt item, int n, String role) {
    if (item.isEmpty()) {
      return -1;
    }
    int i = item.getAsInt();
    if (i < 0 || i >= n) {
      throw new MorphscoutException("The walkthrough's " + role + " item " + i + " is not among the " + n
          + " items (0.." + (n - 1) + ").");
    }
    return i;
  }
}
