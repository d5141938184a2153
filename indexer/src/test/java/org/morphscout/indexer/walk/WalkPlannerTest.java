package org.morphscout.indexer.walk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;
import java.util.Random;
import org.morphscout.indexer.MorphscoutException;
import org.junit.jupiter.api.Test;

class WalkPlannerTest {
  private static final long SEED = 5150L;

  private static DistanceFunction euclid(double[][] pts) {
    return (i, j) -> Math.hypot(pts[i][0] - pts[j][0], pts[i][1] - pts[j][1]);
  }

  private static double[][] points(Random r, int n) {
    double[][] p = new double[n][2];
    for (double[] q : p) {
      q[0] = r.nextDouble();
      q[1] = r.nextDouble();
    }
    return p;
  }

  @Test
  void openPathMatchesBruteForceOnSmallSets() {
    WalkPlanner planner = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0));
    for (int trial = 0; trial < 30; trial++) {
      long seed = SEED + trial;
      Random r = new Random(seed);
      int n = 4 + r.nextInt(5); // 4..8
      double[][] pts = points(r, n);
      DistanceFunction d = euclid(pts);
      OptionalInt start = trial % 3 == 1 ? OptionalInt.of(r.nextInt(n)) : OptionalInt.empty();
      OptionalInt end = OptionalInt.empty();
      if (trial % 3 == 2) {
        int s = r.nextInt(n);
        start = OptionalInt.of(s);
        end = OptionalInt.of((s + 1 + r.nextInt(n - 1)) % n);
      }
      WalkResult res = planner.planOpen(n, d, start, end);
      double best = bruteForce(n, d, start.orElse(-1), end.orElse(-1));
      assertThat(res.total()).as("seed %d, n %d", seed, n).isGreaterThanOrEqualTo(best - 1e-9)
          .isLessThanOrEqualTo(best * 1.01 + 1e-9);
    }
  }

  @Test
  void fixedEndsAreRespected() {
    Random r = new Random(SEED);
    double[][] pts = points(r, 60);
    WalkPlanner planner = new WalkPlanner();
    WalkResult both = planner.planOpen(60, euclid(pts), OptionalInt.of(7), OptionalInt.of(33));
    assertThat(both.order().get(0)).isEqualTo(7);
    assertThat(both.order().get(59)).isEqualTo(33);
    WalkResult startOnly = planner.planOpen(60, euclid(pts), OptionalInt.of(12), OptionalInt.empty());
    assertThat(startOnly.order().get(0)).isEqualTo(12);
    WalkResult endOnly = planner.planOpen(60, euclid(pts), OptionalInt.empty(), OptionalInt.of(41));
    assertThat(endOnly.order().get(59)).isEqualTo(41);
    for (WalkResult w : List.of(both, startOnly, endOnly)) {
      assertThat(w.order()).hasSize(60).doesNotHaveDuplicates();
      assertThat(w.closed()).isFalse();
    }
  }

  @Test
  void localSearchNeverWorsensTheConstruction() {
    for (int trial = 0; trial < 10; trial++) {
      long seed = SEED * 7 + trial;
      Random r = new Random(seed);
      int n = 20 + r.nextInt(150);
      double[][] pts = points(r, n);
      double[] raw = new double[n * n];
      for (int i = 0; i < n; i++) {
        for (int j = 0; j < n; j++) {
          raw[i * n + j] = euclid(pts).distance(i, j);
        }
      }
      WeightMatrix wm = trial % 2 == 0
          ? WeightMatrix.closed(raw, n, 0.05, 10)
          : WeightMatrix.open(raw, n, 0.05, 0, n - 1, 10);
      int[] built = trial % 2 == 0
          ? NearestNeighbourTour.build(wm, r.nextInt(n), -1, -1)
          : NearestNeighbourTour.build(wm, n, 0, n - 1);
      LocalSearch ls = new LocalSearch(wm, built);
      double before = ls.length();
      ls.run();
      assertThat(ls.length()).as("seed %d", seed).isLessThanOrEqualTo(before + 1e-9);
      assertThat(java.util.Arrays.stream(ls.tour()).distinct().count()).isEqualTo(wm.m);
      // Local optimum: neither neighbourhood finds another improving move.
      assertThat(ls.twoOpt()).isFalse();
      assertThat(ls.orOpt()).isFalse();
    }
  }

  @Test
  void reportsTotalsOfResultAndInput() {
    // Points on a line given in a scrambled order: the best open path walks them left to right.
    double[] xs = {5, 0, 3, 1, 4, 2};
    DistanceFunction d = (i, j) -> Math.abs(xs[i] - xs[j]);
    WalkResult r = new WalkPlanner().planOpen(xs.length, d);
    assertThat(r.total()).isCloseTo(5, within(1e-12));
    assertThat(r.largestStep()).isCloseTo(1, within(1e-12));
    assertThat(r.inputTotal()).isCloseTo(5 + 3 + 2 + 3 + 2, within(1e-12));
    assertThat(r.improvement()).isCloseTo(1 - 5.0 / 15, within(1e-12));
    List<Double> walked = new ArrayList<>();
    r.order().forEach(i -> walked.add(xs[i]));
    assertThat(walked).isSortedAccordingTo(walked.get(0) == 0 ? Double::compare : (a, b) -> Double.compare(b, a));
  }

  @Test
  void jumpPenaltyTradesALittleTotalForSmallerJumps() {
    // Summed over seeded sets: the penalty must lower the largest steps and cost at most a few per cent of total.
    double plainMax = 0;
    double penalMax = 0;
    double plainTotal = 0;
    double penalTotal = 0;
    for (int trial = 0; trial < 12; trial++) {
      Random r = new Random(SEED + 100 + trial);
      double[][] pts = points(r, 80);
      WalkResult plain = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0)).planOpen(80, euclid(pts));
      WalkResult penal = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0.5)).planOpen(80, euclid(pts));
      plainMax += plain.largestStep();
      penalMax += penal.largestStep();
      plainTotal += plain.total();
      penalTotal += penal.total();
    }
    assertThat(penalMax).isLessThan(plainMax);
    assertThat(penalTotal).isLessThanOrEqualTo(plainTotal * 1.05);
  }

  @Test
  void rejectsBadInput() {
    WalkPlanner p = new WalkPlanner();
    assertThatThrownBy(() -> p.planOpen(0, (i, j) -> 1)).isInstanceOf(MorphscoutException.class);
    assertThatThrownBy(() -> p.planOpen(3, (i, j) -> -1)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> p.planOpen(3, (i, j) -> 1, OptionalInt.of(1), OptionalInt.of(1)))
        .isInstanceOf(MorphscoutException.class);
    assertThatThrownBy(() -> p.planOpen(3, (i, j) -> 1, OptionalInt.of(5), OptionalInt.empty()))
        .isInstanceOf(MorphscoutException.class);
    assertThat(p.planOpen(1, (i, j) -> 1).order()).containsExactly(0);
    assertThat(p.planClosed(3, (i, j) -> 1).total()).isEqualTo(3);
  }

  /** Plain reference: the shortest open path by trying every permutation. */
  private static double bruteForce(int n, DistanceFunction d, int start, int end) {
    int[] perm = new int[n];
    for (int i = 0; i < n; i++) {
      perm[i] = i;
    }
    double[] best = {Double.POSITIVE_INFINITY};
    permute(perm, 0, d, start, end, best);
    return best[0];
  }

  private static void permute(int[] a, int k, DistanceFunction d, int start, int end, double[] best) {
    if (k == a.length) {
      if ((start < 0 || a[0] == start) && (end < 0 || a[a.length - 1] == end)) {
        double sum = 0;
        for (int i = 1; i < a.length; i++) {
          sum += d.distance(a[i - 1], a[i]);
        }
        best[0] = Math.min(best[0], sum);
      }
      return;
    }
    for (int i = k; i < a.length; i++) {
      int t = a[k];
      a[k] = a[i];
      a[i] = t;
      permute(a, k + 1, d, start, end, best);
      a[i] = a[k];
      a[k] = t;
    }
  }
}
