package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class InMemoryStepGraphTest {

  @Test
  void edgesAreUndirectedAndLaterAdditionWins() {
    StepCost first = StepCostModel.DEFAULT.mix(0.2, 0.2, 0);
    StepCost second = StepCostModel.DEFAULT.mix(0.6, 0.4, 0);
    InMemoryStepGraph g = InMemoryStepGraph.builder()
        .addEdge(5, 3, first)
        .addEdge(3, 9, first)
        .addEdge(3, 5, second)
        .addNode(42)
        .build();
    assertThat(g.nodes()).containsExactlyInAnyOrder(3L, 5L, 9L, 42L);
    assertThat(g.edgeCount()).isEqualTo(2);
    assertThat(g.neighbours(5)).containsExactly(new Edge(5, 3, second.mixedCost(), second));
    assertThat(g.neighbours(3)).extracting(Edge::to).containsExactly(5L, 9L);
    assertThat(g.neighbours(3).get(0).components()).isEqualTo(second);
    assertThat(g.neighbours(42)).isEmpty();
    assertThat(g.neighbours(7)).isEqualTo(List.of());
  }

  @Test
  void indexedCopyOfAForeignGraphMatches() {
    StepCost c = StepCostModel.DEFAULT.mix(0.2, 0.1, 3);
    InMemoryStepGraph g = InMemoryStepGraph.builder().addEdge(1, 2, c).addEdge(2, 3, c).build();
    StepGraph foreign = new StepGraph() {
      @Override
      public List<Edge> neighbours(long id) {
        return g.neighbours(id);
      }

      @Override
      public java.util.Set<Long> nodes() {
        return g.nodes();
      }
    };
    IndexedGraph a = IndexedGraph.of(g);
    IndexedGraph b = IndexedGraph.of(foreign);
    assertThat(b.ids).containsExactly(a.ids);
    assertThat(b.offsets).containsExactly(a.offsets);
    assertThat(b.targets).containsExactly(a.targets);
    assertThat(b.mixed).containsExactly(a.mixed);
  }
}
