package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The pruned search (A* bound + dominance) against the plain layered Dijkstra without either shortcut. */
class LayeredChainSearchTest {

  @Test
  void boundedSearchFindsTheSameOptimumAsPlainLayeredDijkstra() {
    for (int trial = 0; trial < 25; trial++) {
      long seed = 777L + trial;
      Random r = new Random(seed);
      int n = 200;
      InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
      for (int u = 0; u < n; u++) {
        b.addNode(u);
        for (int j = 0; j < 3; j++) {
          int v = r.nextInt(n);
          if (v != u) {
            b.addEdge(u, v, StepCostModel.DEFAULT.mix(r.nextDouble(), r.nextDouble(), 30 * r.nextDouble()));
          }
        }
      }
      IndexedGraph g = IndexedGraph.of(b.build());
      StepCostModel model = new StepCostModel(r.nextDouble(), 1, r.nextDouble(), 50);
      int min = 1 + r.nextInt(4);
      int max = min + r.nextInt(8);
      int[] stops = trial % 2 == 0
          ? new int[] {r.nextInt(n), n - 1}
          : new int[] {0, 1 + r.nextInt(n - 2), n - 1};
      if (stops[0] == stops[stops.length - 1]) {
        continue;
      }
      double[] penalty = new double[n];
      Arrays.fill(penalty, 1);
      for (int k = 0; k < 20; k++) {
        penalty[r.nextInt(n)] = 2; // penalties only raise costs, so the bound must stay valid
      }
      double[][] bound = new double[stops.length - 1][];
      double tail = 0;
      for (int s = stops.length - 2; s >= 0; s--) {
        // Every third trial spends only a small budget, so the bound is cut at the search frontier.
        PlainDistances plain = new PlainDistances(g, model, stops[s + 1]);
        bound[s] = plain.capped(Double.POSITIVE_INFINITY, trial % 3 == 0 ? 25 : Integer.MAX_VALUE);
        double[] withTail = bound[s].clone();
        for (int v = 0; v < n; v++) {
          withTail[v] += tail;
        }
        tail += bound[s][stops[s]];
        bound[s] = withTail;
      }
      boolean[] blocked = new boolean[n];
      Optional<LayeredChainSearch.Walk> fast =
          new LayeredChainSearch(g, model, penalty, blocked, min, max, bound).search(stops);
      Optional<LayeredChainSearch.Walk> plain =
          new LayeredChainSearch(g, model, penalty, blocked, min, max, null).search(stops);
      assertThat(fast.isPresent()).as("seed %d", seed).isEqualTo(plain.isPresent());
      if (fast.isPresent()) {
        LayeredChainSearch cost = new LayeredChainSearch(g, model, penalty, blocked, min, max, null);
        assertThat(total(cost, fast.get())).as("seed %d, steps %d..%d", seed, min, max)
            .isCloseTo(total(cost, plain.get()), within(1e-9));
        assertThat(fast.get().edges().length).isBetween(min, max);
      }
    }
  }

  private static double total(LayeredChainSearch s, LayeredChainSearch.Walk w) {
    double sum = 0;
    for (int i = 0; i < w.edges().length; i++) {
      double c = s.stepCost(w.nodes()[i], w.edges()[i]);
      sum += c * c;
    }
    return sum;
  }
}
