package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
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
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.StepFeatures;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Chains through the library's {@link ChainFinder} on the neighbour graph the indexer stored (each image's nearest
 * neighbours with their appearance, shape and colour gaps). Required images become waypoints, visited in order of
 * their step cost from the start. A catalog without a stored graph falls back to {@code fallback}.
 */
public final class ServiceChains implements ChainsBackend {
  private final QueryContext context;
  private final ChainsBackend fallback;
  private final Supplier<InMemoryStepGraph> graph;

  public ServiceChains(QueryContext context, ChainsBackend fallback) {
    this.context = context;
    this.fallback = fallback;
    this.graph = InterimBackends.memoised(this::loadGraph);
  }

  private InMemoryStepGraph loadGraph() {
    InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
    Set<List<Long>> seen = new HashSet<>();
    for (NeighbourStore.Link l : context.library().neighbours().all()) {
      if (l.from() == l.to() || !seen.add(List.of(Math.min(l.from(), l.to()), Math.max(l.from(), l.to())))) {
        continue;
      }
      b.addEdge(l.from(), l.to(), StepCostModel.DEFAULT.mix(clamp(l.appearance(), 2), clamp(l.shape(), 1),
          Math.max(0, l.colour())));
    }
    return b.build();
  }

  @Override
  public List<ChainCandidate> find(long start, long end, ChainRequest request, CancellationToken token) {
    InMemoryStepGraph g = graph.get();
    if (g.edgeCount() == 0) {
      return fallback.find(start, end, request, token);
    }
    for (long id : new long[] {start, end}) {
      if (!g.nodes().contains(id)) {
        throw new MorphscoutException(name(id) + " has no neighbours in the catalog's graph yet; index its folder "
            + "again (morphscout index) to link it");
      }
    }
    StepCostModel model = StepCostModel.withShapeWeight(request.shapeWeight());
    ImageAnalysis target = load(end);
    ImageAnalysis first = load(start);
    List<Long> via = new ArrayList<>(request.require());
    via.sort(Comparator.comparingDouble(id -> model.cost(StepFeatures.between(first, load(id)))));
    ChainQuery query = ChainQuery.between(start, end).withAlternatives(request.alternatives())
        .withSteps(request.minSteps(), request.maxSteps()).withCostModel(model).withAvoid(request.avoid())
        .withVia(via);
    token.throwIfCancelled();
    ChainResult result = new ChainFinder(g).find(query, id -> model.cost(StepFeatures.between(load(id), target)));
    if (result.chains().isEmpty()) {
      String closest = result.closestReachable().isPresent()
          ? " The closest image you can reach is " + name(result.closestReachable().getAsLong()) + "." : "";
      throw new MorphscoutException(result.reason() + closest);
    }
    List<ChainCandidate> out = new ArrayList<>();
    for (Chain c : result.chains()) {
      List<ChainStep> steps = new ArrayList<>();
      for (Edge e : c.steps()) {
        StepCost sc = e.components();
        Map<String, Double> parts = new LinkedHashMap<>();
        parts.put("appearance", sc.appearanceDistance());
        parts.put("shape", sc.shapeIncompatibility());
        parts.put("ΔE00", sc.colourGap());
        steps.add(new ChainStep(e.from(), e.to(), e.cost(), parts));
      }
      out.add(ChainCandidate.of(c.images(), steps));
    }
    return out;
  }

  private ImageAnalysis load(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has no stored analysis; index its folder again"));
  }

  private String name(long id) {
    return context.library().images().byId(id).map(r -> java.nio.file.Path.of(r.path()).getFileName().toString())
        .orElse("image " + id);
  }

  private static double clamp(double v, double max) {
    return Double.isNaN(v) ? max : Math.max(0, Math.min(max, v));
  }
}
