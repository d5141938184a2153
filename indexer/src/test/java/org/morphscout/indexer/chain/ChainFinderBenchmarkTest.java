package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/** Timing of chain queries on 100,000-image synthetic graphs (k = 24). Run with -Dgroups=benchmark. */
@Tag("benchmark")
class ChainFinderBenchmarkTest {
  private static final Logger LOG = LoggerFactory.getLogger(ChainFinderBenchmarkTest.class);
  private static final long SEED = 99L;

  @Test
  void latticeGraph() {
    int side = 316; // ~100,000 nodes, each joined to the 24 others of its 5x5 window
    Random r = new Random(SEED);
    InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
    for (int y = 0; y < side; y++) {
      for (int x = 0; x < side; x++) {
        for (int dy = 0; dy <= 2; dy++) {
          for (int dx = -2; dx <= 2; dx++) {
            if ((dy == 0 && dx <= 0) || x + dx < 0 || x + dx >= side || y + dy >= side) {
              continue;
            }
            double d = Math.hypot(dx, dy);
            b.addEdge(y * side + x, (y + dy) * side + x + dx,
                StepCostModel.DEFAULT.mix(Math.min(2, 0.05 * d + 0.02 * r.nextDouble()), 0.3 * r.nextDouble(), 0));
          }
        }
      }
    }
    measure("lattice", b.build(), r, side);
  }

  @Test
  void randomGraph() {
    int n = 100_000;
    Random r = new Random(SEED);
    InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
    for (int u = 0; u < n; u++) {
      for (int j = 0; j < 24; j++) {
        int v = r.nextInt(n);
        if (v != u) {
          b.addEdge(u, v, StepCostModel.DEFAULT.mix(r.nextDouble(), r.nextDouble(), 0));
        }
      }
    }
    measure("random", b.build(), r, 0);
  }

  private void measure(String name, InMemoryStepGraph g, Random r, int side) {
    long t0 = System.nanoTime();
    ChainFinder finder = new ChainFinder(g);
    long prepare = System.nanoTime() - t0;
    int n = g.nodes().size();
    for (int alternatives : new int[] {1, 3}) {
      double[] ms = new double[30];
      double[] cpu = new double[30];
      java.lang.management.ThreadMXBean bean = java.lang.management.ManagementFactory.getThreadMXBean();
      int found = 0;
      for (int q = 0; q < ms.length + 10; q++) {
        long from;
        long to;
        if (side > 0) {
          int x = 2 + r.nextInt(side - 30);
          int y = 2 + r.nextInt(side - 30);
          from = (long) y * side + x;
          to = (long) (y + 14) * side + x + 14; // ~10 steps of at most 2 cells
        } else {
          from = r.nextInt(n);
          to = r.nextInt(n);
          if (from == to) {
            continue;
          }
        }
        long s = System.nanoTime();
        long c = bean.getCurrentThreadCpuTime();
        ChainResult res = finder.find(ChainQuery.between(from, to).withAlternatives(alternatives), id -> 0);
        double elapsed = (System.nanoTime() - s) / 1e6;
        double cpuMs = (bean.getCurrentThreadCpuTime() - c) / 1e6;
        if (q >= 10) { // first 10 are JIT warm-up
          ms[q - 10] = elapsed;
          cpu[q - 10] = cpuMs;
          found += res.isEmpty() ? 0 : 1;
        }
      }
      Arrays.sort(ms);
      Arrays.sort(cpu);
      // Wall time suffers on a shared machine; the thread's CPU time is the better measure of the work done.
      LOG.info("{} graph: {} nodes, {} edges, finder prepared in {} ms; K={}: wall median {} ms (max {}), "
              + "thread CPU median {} ms (max {}), {} of {} found",
          name, n, g.edgeCount(), prepare / 1_000_000, alternatives, String.format("%.1f", ms[ms.length / 2]),
          String.format("%.1f", ms[ms.length - 1]), String.format("%.1f", cpu[cpu.length / 2]),
          String.format("%.1f", cpu[cpu.length - 1]), found, ms.length);
      assertThat(found).isPositive();
    }
  }
}
