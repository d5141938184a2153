package org.morphscout.indexer.library;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.NeighbourStore;
import org.morphscout.indexer.chain.Chain;
import org.morphscout.indexer.chain.ChainFinder;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.chain.ChainResult;
import org.morphscout.indexer.chain.Edge;
import org.morphscout.indexer.chain.InMemoryStepGraph;
import org.morphscout.indexer.chain.StepCost;
import org.morphscout.indexer.chain.StepGraph;
import org.morphscout.indexer.pairing.PairScore;

/**
 * Chains of real catalog images between two endpoints, over the stored neighbour graph, with every step scored as a
 * pair (so a person sees aligned IoU and warp effort per step, not only the graph's cost).
 */
public final class ChainService {
  private final QueryContext context;
  private final PairService pairs;
  private StepGraph graph;

  public ChainService(QueryContext context, PairService pairs) {
    this.context = context;
    this.pairs = pairs;
  }

  /** One step of a chain with its graph components and its exact pair score. */
  public record StepDetail(long a, long b, double cost, StepCost components, PairScore score) {}

  /** One chain with the details of each step. */
  public record ChainDetail(Chain chain, List<StepDetail> steps) {}

  /**
   * The answer to a chain query.
   *
   * @param direct the pair score of FROM and TO directly, for comparison
   * @param chains the diverse chains found, best first (empty when TO cannot be reached)
   * @param closestReachable when no chain exists, the reachable image closest to TO (-1 when none)
   * @param reason why no chain exists ("" when chains were found)
   */
  public record ChainAnswer(ImageAnalysis from, ImageAnalysis to, PairScore direct, List<ChainDetail> chains,
      long closestReachable, String reason) {}

  /**
   * The stored neighbour graph over the ready images, loaded once per service. Links to images that are not ready are
   * left out: while an indexing run goes on, a changed image is pending again but the links others stored to it are
   * only recomputed at the end of the run.
   */
  public synchronized StepGraph graph() {
    if (graph == null) {
      InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
      Set<Long> ready = new HashSet<>(context.library().features().readyIds(context.modelId()));
      for (long id : ready) {
        b.addNode(id);
      }
      for (NeighbourStore.Link l : context.library().neighbours().all()) {
        if (ready.contains(l.from()) && ready.contains(l.to())) {
          b.addEdge(l.from(), l.to(), StepCost.of(l.appearance(), Math.min(1, l.shape()), l.colour()));
        }
      }
      graph = b.build();
    }
    return graph;
  }

  /** Finds chains from {@code from} to {@code to}; both must be ready catalog images. */
  public ChainAnswer chains(ImageAnalysis from, ImageAnalysis to, ChainQuery query) {
    requireInCatalog(from);
    requireInCatalog(to);
    ChainResult result = new ChainFinder(graph()).find(query, id -> context.cache().get(id)
        .map(a -> query.costModel().cost(StepFeatures.between(a, to)))
        .orElse(Double.MAX_VALUE));
    List<ChainDetail> details = new ArrayList<>();
    for (Chain c : result.chains()) {
      details.add(detail(c));
    }
    return new ChainAnswer(from, to, pairs.score(from, to), details, result.closestReachable().orElse(-1),
        result.reason() == null ? "" : result.reason());
  }

  private ChainDetail detail(Chain c) {
    List<StepDetail> steps = new ArrayList<>();
    for (Edge e : c.steps()) {
      ImageAnalysis a = stored(e.from());
      ImageAnalysis b = stored(e.to());
      steps.add(new StepDetail(e.from(), e.to(), e.cost(), e.components(), pairs.score(a, b)));
    }
    return new ChainDetail(c, steps);
  }

  /** A chain image's analysis; it can vanish when an indexing run re-analyses the image after the graph was read. */
  private ImageAnalysis stored(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException("image " + id + " ("
        + context.library().images().byId(id).map(r -> r.path()).orElse("no longer in the catalog")
        + ") is being analysed again by an indexing run; ask for the chain again when it is over"));
  }

  private static void requireInCatalog(ImageAnalysis a) {
    if (a.id() < 0) {
      throw new MorphscoutException("chain endpoints must be catalog images: " + a.path() + " is not indexed (run "
          + "morphscout index on its folder first)");
    }
  }
}
