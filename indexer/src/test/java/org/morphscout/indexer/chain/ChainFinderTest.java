package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.junit.jupiter.api.Test;

class ChainFinderTest {
  private static final long SEED = 424242L;

  @Test
  void bestChainFollowsTheHiddenParameterAndBeatsTheDirectJump() {
    SyntheticFamily f = new SyntheticFamily(SEED, 50, 30);
    InMemoryStepGraph knn = f.knnGraph(12);
    // Offer the direct jump too, so the finder must prefer the chain on its own merits.
    InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
    for (long a : knn.nodes()) {
      knn.neighbours(a).forEach(e -> b.addEdge(e.from(), e.to(), e.components()));
    }
    StepCost direct = f.components(0, 1);
    InMemoryStepGraph g = b.addEdge(0, 1, direct).build();

    Chain best = new ChainFinder(g).find(ChainQuery.between(0, 1), id -> 0).best();
    List<Long> images = best.images();
    assertThat(images.get(0)).isZero();
    assertThat(images.get(images.size() - 1)).isOne();
    assertThat(images.size()).as("seed %d", SEED).isGreaterThan(3);
    assertThat(images).as("no distractor on the chain (seed %d)", SEED).noneMatch(f.distractor::get);
    double[] ts = images.stream().mapToDouble(f.t::get).toArray();
    assertThat(spearman(ts)).as("Spearman of position vs t (seed %d)", SEED).isGreaterThanOrEqualTo(0.9);
    assertThat(best.maxStep()).isLessThan(direct.mixedCost() / 3);
    assertThat(best.total()).isLessThan(direct.mixedCost() * direct.mixedCost());
    // Sum of squares recomputed from the reported steps.
    double sum = best.steps().stream().mapToDouble(e -> e.cost() * e.cost()).sum();
    assertThat(best.total()).isCloseTo(sum, within(1e-12));
  }

  @Test
  void sumOfSquaresOptimumMatchesBruteForceOnTinyGraphs() {
    for (int trial = 0; trial < 40; trial++) {
      long seed = SEED + trial;
      Random r = new Random(seed);
      int n = 7;
      InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
      double[][] cost = new double[n][n];
      for (int i = 0; i < n; i++) {
        b.addNode(i);
        for (int j = i + 1; j < n; j++) {
          if (r.nextDouble() < 0.55) {
            StepCost c = StepCostModel.DEFAULT.mix(r.nextDouble() * 1.5, r.nextDouble(), 0);
            b.addEdge(i, j, c);
            cost[i][j] = cost[j][i] = c.mixedCost();
          }
        }
      }
      InMemoryStepGraph g = b.build();
      int min = 1 + r.nextInt(3);
      int max = min + r.nextInt(3);
      ChainResult res = new ChainFinder(g).find(ChainQuery.between(0, n - 1).withSteps(min, max), id -> 0);
      double expected = bruteForce(cost, 0, n - 1, min, max);
      if (Double.isInfinite(expected)) {
        assertThat(res.isEmpty()).as("seed %d: brute force finds no chain", seed).isTrue();
      } else {
        assertThat(res.isEmpty()).as("seed %d", seed).isFalse();
        assertThat(res.best().total()).as("seed %d, steps %d..%d", seed, min, max)
            .isCloseTo(expected, within(1e-9));
      }
    }
  }

  @Test
  void respectsStepBounds() {
    SyntheticFamily f = new SyntheticFamily(SEED + 1, 40, 20);
    ChainFinder finder = new ChainFinder(f.knnGraph(12));
    Chain longOne = finder.find(ChainQuery.between(0, 1).withSteps(9, 12), id -> 0).best();
    assertThat(longOne.length()).isBetween(9, 12);
    assertThat(new HashSet<>(longOne.images())).hasSize(longOne.images().size());
    Chain free = finder.find(ChainQuery.between(0, 1), id -> 0).best();
    int limit = Math.max(1, free.length() - 2);
    ChainResult shortOnes = finder.find(ChainQuery.between(0, 1).withSteps(1, limit), id -> 0);
    if (!shortOnes.isEmpty()) {
      assertThat(shortOnes.best().length()).isLessThanOrEqualTo(limit);
      assertThat(shortOnes.best().total()).isGreaterThanOrEqualTo(free.total() - 1e-12);
    }
  }

  @Test
  void avoidLeavesImagesOutAndViaVisitsWaypointsInOrder() {
    SyntheticFamily f = new SyntheticFamily(SEED + 2, 40, 20);
    ChainFinder finder = new ChainFinder(f.knnGraph(12));
    Chain best = finder.find(ChainQuery.between(0, 1), id -> 0).best();
    Set<Long> inner = new HashSet<>(best.images().subList(1, best.images().size() - 1));
    Chain avoiding = finder.find(ChainQuery.between(0, 1).withAvoid(inner), id -> 0).best();
    assertThat(avoiding.images()).doesNotContainAnyElementsOf(inner);
    assertThat(avoiding.total()).isGreaterThanOrEqualTo(best.total());

    long distractor = f.ids().stream().filter(f.distractor::get).findFirst().orElseThrow();
    long late = f.ids().stream().filter(id -> !f.distractor.get(id) && f.t.get(id) > 0.8 && id > 1)
        .findFirst().orElseThrow();
    ChainResult via = finder.find(ChainQuery.between(0, 1).withSteps(1, 24).withVia(List.of(late, distractor)), id -> 0);
    List<Long> images = via.best().images();
    assertThat(images).contains(late, distractor);
    assertThat(images.indexOf(late)).isLessThan(images.indexOf(distractor));
    assertThat(new HashSet<>(images)).hasSize(images.size());
  }

  @Test
  void disconnectedGraphGivesNoChainAndTheClosestReachableImage() {
    // Two separate paths: 0-2-3-4 and 1-5-6. "Distance to target" is invented: |id - 4.2|.
    StepCost c = StepCostModel.DEFAULT.mix(0.2, 0.2, 0);
    InMemoryStepGraph g = InMemoryStepGraph.builder()
        .addEdge(0, 2, c).addEdge(2, 3, c).addEdge(3, 4, c)
        .addEdge(1, 5, c).addEdge(5, 6, c)
        .build();
    ChainResult res = new ChainFinder(g).find(ChainQuery.between(0, 1), id -> Math.abs(id - 4.2));
    assertThat(res.isEmpty()).isTrue();
    assertThat(res.closestReachable()).hasValue(4);
    assertThat(res.reason()).contains("separate parts");

    ChainResult tooShort = new ChainFinder(g).find(ChainQuery.between(0, 4).withSteps(1, 2), id -> 4 - id);
    assertThat(tooShort.isEmpty()).isTrue();
    assertThat(tooShort.reason()).contains("needs 3 steps");
    assertThat(tooShort.closestReachable()).hasValue(3);

    ChainResult blocked = new ChainFinder(g).find(ChainQuery.between(0, 4).withAvoid(Set.of(3L)), id -> 0);
    assertThat(blocked.reason()).contains("avoided");
  }

  @Test
  void alternativesAreDiverseAndReportTheirOverlap() {
    SyntheticFamily f = new SyntheticFamily(SEED + 3, 60, 20);
    ChainFinder finder = new ChainFinder(f.knnGraph(14));
    double bound = 0.3;
    ChainResult res = finder.find(ChainQuery.between(0, 1).withAlternatives(3).withDiversity(bound, 2), id -> 0);
    assertThat(res.chains()).as("seed %d", SEED + 3).hasSize(3);
    Chain only = finder.find(ChainQuery.between(0, 1).withAlternatives(1), id -> 0).best();
    assertThat(res.best().images()).isEqualTo(only.images());
    assertThat(res.best().sharedImages()).isZero();
    List<Set<Long>> seen = new ArrayList<>();
    for (Chain c : res.chains()) {
      Set<Long> inner = new HashSet<>(c.images().subList(1, c.images().size() - 1));
      double max = 0;
      for (Set<Long> s : seen) {
        Set<Long> common = new HashSet<>(s);
        common.retainAll(inner);
        Set<Long> union = new HashSet<>(s);
        union.addAll(inner);
        max = Math.max(max, union.isEmpty() ? 0 : (double) common.size() / union.size());
      }
      assertThat(c.sharedImages()).isCloseTo(max, within(1e-12)).isLessThanOrEqualTo(bound);
      assertThat(c.total()).isGreaterThanOrEqualTo(res.best().total());
      seen.add(inner);
    }
  }

  @Test
  void shapeWeightReweightsWithoutRebuilding() {
    SyntheticFamily f = new SyntheticFamily(SEED + 4, 40, 10);
    ChainFinder finder = new ChainFinder(f.knnGraph(12));
    StepCostModel shapeHeavy = StepCostModel.withShapeWeight(0.9);
    Chain c = finder.find(ChainQuery.between(0, 1).withCostModel(shapeHeavy), id -> 0).best();
    assertThat(c.steps()).isNotEmpty();
    for (Edge e : c.steps()) {
      assertThat(e.cost()).isCloseTo(shapeHeavy.cost(e.components()), within(1e-12));
    }
  }

  @Test
  void unknownEndpointIsAUserFacingError() {
    InMemoryStepGraph g = InMemoryStepGraph.builder().addEdge(1, 2, StepCost.of(0.1, 0.1, 0)).build();
    assertThatThrownBy(() -> new ChainFinder(g).find(ChainQuery.between(1, 99), id -> 0))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("99");
    assertThatThrownBy(() -> ChainQuery.between(1, 1)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> ChainQuery.between(1, 2).withSteps(3, 2)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> ChainQuery.between(1, 2).withAvoid(Set.of(2L)))
        .isInstanceOf(IllegalArgumentException.class);
  }

  /** Plain reference: minimum sum of squares over all simple paths with min..max steps (exhaustive DFS). */
  private static double bruteForce(double[][] cost, int from, int to, int min, int max) {
    boolean[] used = new boolean[cost.length];
    used[from] = true;
    return dfs(cost, from, to, min, max, 0, 0, used);
  }

  private static double dfs(double[][] cost, int u, int to, int min, int max, int steps, double acc,
      boolean[] used) {
    if (u == to) {
      return steps >= min ? acc : Double.POSITIVE_INFINITY;
    }
    if (steps == max) {
      return Double.POSITIVE_INFINITY;
    }
    double best = Double.POSITIVE_INFINITY;
    for (int v = 0; v < cost.length; v++) {
      if (v != u && cost[u][v] > 0 && !used[v]) {
        used[v] = true;
        best = Math.min(best, dfs(cost, v, to, min, max, steps + 1, acc + cost[u][v] * cost[u][v], used));
        used[v] = false;
      }
    }
    return best;
  }

  /** Spearman's rank correlation between position along the chain and the values (no ties expected). */
  private static double spearman(double[] values) {
    int n = values.length;
    Integer[] order = new Integer[n];
    for (int i = 0; i < n; i++) {
      order[i] = i;
    }
    java.util.Arrays.sort(order, (a, b) -> Double.compare(values[a], values[b]));
    double d2 = 0;
    for (int rank = 0; rank < n; rank++) {
      double d = rank - order[rank];
      d2 += d * d;
    }
    return 1 - 6 * d2 / (n * ((double) n * n - 1));
  }
}
