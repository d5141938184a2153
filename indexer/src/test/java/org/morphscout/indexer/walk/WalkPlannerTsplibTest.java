package org.morphscout.indexer.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.util.HashSet;
import org.jgrapht.Graph;
import org.jgrapht.GraphPath;
import org.jgrapht.alg.tour.TwoOptHeuristicTSP;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Closed tours on TSPLIB95 instances against their published optima. */
class WalkPlannerTsplibTest {

  // Optima from Reinelt's TSPLIB95 published optima table: berlin52 7542, kroA100 21282. Tolerances: ours.
  @ParameterizedTest
  @CsvSource({"berlin52, 7542, 0.03", "kroA100, 21282, 0.04"})
  void closedTourIsNearThePublishedOptimum(String name, int optimum, double tolerance) throws IOException {
    Tsplib p = Tsplib.load(name + ".tsp");
    // The coordinates are right only if the published optimal tour has exactly the published length.
    int[] opt = Tsplib.tour(name + ".opt.tour");
    assertThat(new HashSet<>(java.util.Arrays.stream(opt).boxed().toList())).hasSize(p.size());
    double optLength = 0;
    for (int k = 0; k < opt.length; k++) {
      optLength += p.euc2d(opt[k], opt[(k + 1) % opt.length]);
    }
    assertThat(optLength).isEqualTo(optimum);

    WalkResult r = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0)).planClosed(p.size(), p::euc2d);
    assertThat(r.order()).hasSize(p.size()).doesNotHaveDuplicates();
    assertThat(r.total()).isGreaterThanOrEqualTo(optimum).isLessThanOrEqualTo(optimum * (1 + tolerance));
    double recomputed = 0;
    for (int k = 0; k < p.size(); k++) {
      recomputed += p.euc2d(r.order().get(k), r.order().get((k + 1) % p.size()));
    }
    assertThat(r.total()).isEqualTo(recomputed);
  }

  /** Reference library: JGraphT's 2-opt heuristic (random restarts); ours adds Or-opt so should not be worse. */
  @ParameterizedTest
  @CsvSource({"berlin52", "kroA100"})
  void notWorseThanJgraphtTwoOpt(String name) throws IOException {
    Tsplib p = Tsplib.load(name + ".tsp");
    Graph<Integer, DefaultWeightedEdge> g = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
    for (int i = 0; i < p.size(); i++) {
      g.addVertex(i);
    }
    for (int i = 0; i < p.size(); i++) {
      for (int j = i + 1; j < p.size(); j++) {
        g.setEdgeWeight(g.addEdge(i, j), p.euc2d(i, j));
      }
    }
    GraphPath<Integer, DefaultWeightedEdge> theirs = new TwoOptHeuristicTSP<Integer, DefaultWeightedEdge>(
        4, new java.util.Random(17)).getTour(g);
    WalkResult ours = new WalkPlanner(WalkConfig.DEFAULT.withJumpPenalty(0)).planClosed(p.size(), p::euc2d);
    assertThat(ours.total()).isLessThanOrEqualTo(theirs.getWeight() * 1.02);
  }
}
