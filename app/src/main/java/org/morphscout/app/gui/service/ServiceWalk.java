package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.StepFeatures;
import org.morphscout.indexer.library.WalkService;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Walks through the library's {@link WalkService} with the default step cost; steps of a hand-edited order
 * are measured with the same cost ({@link StepCostModel#DEFAULT} over {@link StepFeatures}), so the numbers agree.
 */
public final class ServiceWalk implements WalkBackend {
  private final QueryContext context;
  private final WalkService service;

  public ServiceWalk(QueryContext context, WalkService service) {
    this.context = context;
    this.service = service;
  }

  @Override
  public List<Long> order(List<Long> ids, CancellationToken token) {
    List<ImageAnalysis> images = new ArrayList<>();
    for (long id : ids) {
      images.add(load(id));
    }
    token.throwIfCancelled();
    return service.plan(images, null, null, StepCostModel.DEFAULT).images().stream().map(ImageAnalysis::id)
        .toList();
  }

  @Override
  public List<Double> steps(List<Long> ordered, CancellationToken token) {
    Map<Long, ImageAnalysis> cache = new HashMap<>();
    List<Double> steps = new ArrayList<>();
    for (int i = 0; i + 1 < ordered.size(); i++) {
      token.throwIfCancelled();
      ImageAnalysis a = cache.computeIfAbsent(ordered.get(i), this::load);
      ImageAnalysis b = cache.computeIfAbsent(ordered.get(i + 1), this::load);
      steps.add(StepCostModel.DEFAULT.cost(StepFeatures.between(a, b)));
    }
    return steps;
  }

  private ImageAnalysis load(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has no stored analysis; index its folder again"));
  }
}
