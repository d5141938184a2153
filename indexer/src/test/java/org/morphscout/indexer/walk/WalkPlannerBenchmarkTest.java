package org.morphscout.indexer.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/** Timing of walk planning on 1,000 seeded random points. Run with -Dgroups=benchmark. */
@Tag("benchmark")
class WalkPlannerBenchmarkTest {
  private static final Logger LOG = LoggerFactory.getLogger(WalkPlannerBenchmarkTest.class);

  @Test
  void thousandPoints() throws Exception {
    for (String name : new String[] {"berlin52", "kroA100"}) {
      Tsplib p = Tsplib.load(name + ".tsp");
      WalkResult r = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0)).planClosed(p.size(), p::euc2d);
      LOG.info("{}: closed tour {}", name, r.total());
    }
    Random r = new Random(1000);
    int n = 1000;
    double[][] pts = new double[n][2];
    for (double[] q : pts) {
      q[0] = r.nextDouble();
      q[1] = r.nextDouble();
    }
    DistanceFunction d = (i, j) -> Math.hypot(pts[i][0] - pts[j][0], pts[i][1] - pts[j][1]);
    java.lang.management.ThreadMXBean bean = java.lang.management.ManagementFactory.getThreadMXBean();
    for (int rep = 0; rep < 3; rep++) {
      long c0 = bean.getCurrentThreadCpuTime();
      long t0 = System.nanoTime();
      WalkResult open = new WalkPlanner().planOpen(n, d);
      long t1 = System.nanoTime();
      long c1 = bean.getCurrentThreadCpuTime();
      WalkResult closed = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0)).planClosed(n, d);
      long t2 = System.nanoTime();
      long c2 = bean.getCurrentThreadCpuTime();
      LOG.info("thread CPU: open {} ms, closed {} ms", (c1 - c0) / 1_000_000, (c2 - c1) / 1_000_000);
      // Beardwood-Halton-Hammersley: optimal tour of n uniform points in the unit square ~ 0.7124 sqrt(n)
      // (constant from Percus and Martin 1996, from memory).
      LOG.info("n={}: open {} ms (total {}, largest {}), closed {} ms (total {}, BHH estimate {})", n,
          (t1 - t0) / 1_000_000, String.format("%.2f", open.total()), String.format("%.3f", open.largestStep()),
          (t2 - t1) / 1_000_000, String.format("%.2f", closed.total()),
          String.format("%.2f", 0.7124 * Math.sqrt(n)));
      assertThat(open.order()).hasSize(n);
    }
  }
}
