package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.library.ChainService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.StepFeatures;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Chains through the library's {@link ChainService} on the stored neighbour graph, each step also scored as a pair.
 * Required images become waypoints, visited in order of their step cost from the start.
 */
public final class ServiceChains implements ChainsBackend {
  private final QueryContext context;
  private final ChainService service;

  public ServiceChains(QueryContext context, ChainService service) {
    this.context = context;
    this.service = service;
  }

  @Override
  public List<ChainCandidate> find(long start, long end, ChainRequest request, CancellationToken token) {
    StepCostModel model = StepCostModel.withShapeWeight(request.shapeWeight());
    ImageAnalysis from = load(start);
    ImageAnalysis to = load(end);
    List<Long> via = new ArrayList<>(request.require());
    via.sort(Comparator.comparingDouble(id -> model.cost(StepFeatures.between(from, load(id)))));
    ChainQuery query = ChainQuery.between(start, end).withAlternatives(request.alternatives())
        .withSteps(request.minSteps(), request.maxSteps()).withCostModel(model).withAvoid(request.avoid())
        .withVia(via);
    token.throwIfCancelled();
    ChainService.ChainAnswer answer = service.chains(from, to, query);
    token.throwIfCancelled();
    if (answer.chains().isEmpty()) {
      String closest = answer.closestReachable() >= 0
          ? " The closest image you can reach is " + name(answer.closestReachable()) + "." : "";
      throw new MorphscoutException(answer.reason() + closest);
    }
    List<ChainCandidate> out = new ArrayList<>();
    for (ChainService.ChainDetail c : answer.chains()) {
      List<ChainStep> steps = new ArrayList<>();
      for (ChainService.StepDetail s : c.steps()) {
        Map<String, Double> parts = new LinkedHashMap<>();
        // the keys of chain --json's steps, so both say the same
        parts.put("appearanceDistance", s.components().appearanceDistance());
        parts.put("shapeDistance", s.components().shapeIncompatibility());
        parts.put("colourGap", s.components().colourGap());
        parts.put("score", s.score().score());
        steps.add(new ChainStep(s.a(), s.b(), s.cost(), parts));
      }
      out.add(ChainCandidate.of(c.chain().images(), steps));
    }
    return out;
  }

  private ImageAnalysis load(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has no stored analysis; index its folder again"));
  }

  private String name(long id) {
    return context.library().image(id).map(r -> java.nio.file.Path.of(r.path()).getFileName().toString())
        .orElse("image " + id);
  }
}
