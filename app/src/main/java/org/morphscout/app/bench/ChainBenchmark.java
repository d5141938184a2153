package org.morphscout.app.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.morphscout.indexer.chain.ChainFinder;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.chain.ChainResult;
import org.morphscout.indexer.chain.InMemoryStepGraph;
import org.morphscout.indexer.chain.StepCost;
import org.morphscout.indexer.chain.StepCostModel;

/**
 * Chain queries ({@link ChainFinder}, default {@link ChainQuery}: 3 alternatives, up to 12 steps) on a synthetic
 * neighbour graph shaped like the catalog's: each image linked to its {@code k} nearest images (the indexer keeps
 * 24). Images are random points in the unit square; the appearance distance of a step grows with the points'
 * distance, the shape and colour components are random. A two-dimensional layout is the hard case for chain
 * search (long chains, no shortcuts): real appearance spaces have higher intrinsic dimension and shorter paths.
 * Query ends are drawn a few neighbour radii apart, so chains of several steps exist.
 */
public final class ChainBenchmark {

  /**
   * @param nodes images in the graph
   * @param edges undirected steps
   * @param buildSeconds time to build the graph and the finder's compact copy
   * @param query latency of one {@link ChainFinder#find} call
   * @param queryCpu CPU time of the querying thread per call
   * @param found queries that returned at least one chain
   */
  public record Result(int nodes, int edges, double buildSeconds, Latencies query, Latencies queryCpu,
      int found) {}

  private ChainBenchmark() {}

  /**
   * @param nodes at least 100
   * @param k neighbours per image, 1 to 64
   * @param queries timed queries, at least 1 (after 5 untimed ones)
   */
  public static Result run(int nodes, int k, int queries, long seed) {
    if (nodes < 100 || k < 1 || k > 64 || queries < 1) {
      throw new IllegalArgumentException("need nodes >= 100, 1 <= k <= 64, queries >= 1");
    }
    SplittableRandom rnd = new SplittableRandom(seed);
    double[] x = new double[nodes];
    double[] y = new double[nodes];
    for (int i = 0; i < nodes; i++) {
      x[i] = rnd.nextDouble();
      y[i] = rnd.nextDouble();
    }
    long t0 = System.nanoTime();
    SpatialGrid grid = new SpatialGrid(x, y, k);
    // Scale so that a typical step (the k-th neighbour radius) has an appearance distance of about 0.25.
    double scale = 0.25 / grid.cellSize();
    InMemoryStepGraph.Builder builder = InMemoryStepGraph.builder();
    for (int i = 0; i < nodes; i++) {
      for (int j : grid.nearest(i, k)) {
        double d = Math.hypot(x[i] - x[j], y[i] - y[j]);
        StepCost c = StepCostModel.DEFAULT.mix(Math.min(2, d * scale), 0.4 * rnd.nextDouble(),
            8 * rnd.nextDouble());
        builder.addEdge(i, j, c);
      }
    }
    InMemoryStepGraph graph = builder.build();
    ChainFinder finder = new ChainFinder(graph);
    double buildSeconds = (System.nanoTime() - t0) / 1e9;

    List<long[]> ends = new ArrayList<>();
    while (ends.size() < queries + 5) {
      int a = rnd.nextInt(nodes);
      double angle = rnd.nextDouble() * 2 * Math.PI;
      double reach = grid.cellSize() * (2 + 2 * rnd.nextDouble());
      int b = grid.closestTo(x[a] + reach * Math.cos(angle), y[a] + reach * Math.sin(angle));
      if (b != a) {
        ends.add(new long[] {a, b});
      }
    }
    long[] nanos = new long[queries];
    long[] cpu = new long[queries];
    int found = 0;
    for (int q = 0; q < ends.size(); q++) {
      long a = ends.get(q)[0];
      int b = (int) ends.get(q)[1];
      long c0 = CpuClock.threadNanos();
      long start = System.nanoTime();
      ChainResult r = finder.find(ChainQuery.between(a, b),
          id -> Math.min(2, Math.hypot(x[(int) id] - x[b], y[(int) id] - y[b]) * scale));
      long elapsed = System.nanoTime() - start;
      long elapsedCpu = CpuClock.threadNanos() - c0;
      if (q >= 5) {
        nanos[q - 5] = elapsed;
        cpu[q - 5] = elapsedCpu;
        found += r.isEmpty() ? 0 : 1;
      }
    }
    return new Result(nodes, graph.edgeCount(), buildSeconds, Latencies.ofNanos(nanos), Latencies.ofNanos(cpu),
        found);
  }
}
