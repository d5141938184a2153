package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.pairing.PairComponent;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Pair suggestions through the library's {@link PairService} with the default score configuration, as
 * {@code morphscout pairs} without options. The table shows the sub-scores most telling for a morph; all reasons
 * are kept.
 */
public final class ServicePairs implements PairsBackend {
  /** Sub-scores shown as columns, in this order (each in [0, 1], 1 best). */
  static final List<PairComponent> SHOWN = List.of(PairComponent.SILHOUETTE_MATCH, PairComponent.WARP_EFFORT,
      PairComponent.FOLD_SAFETY, PairComponent.APPEARANCE, PairComponent.COLOUR, PairComponent.ASPECT);
  /** Candidates per image, as the command line's default. */
  static final int CANDIDATES = 20;

  private final QueryContext context;
  private final PairService service;

  public ServicePairs(QueryContext context, PairService service) {
    this.context = context;
    this.service = service;
  }

  @Override
  public Suggestions suggest(OptionalLong image, int limit, CancellationToken token) {
    PairQuery query = new PairQuery(CANDIDATES, limit, 0);
    PairSearchResult result = image.isPresent()
        ? service.partners(load(image.getAsLong()), query, ProgressListener.NONE, token)
        : service.bestPairs(query, ProgressListener.NONE, token);
    List<PairSuggestion> out = new ArrayList<>();
    for (ScoredPair p : result.pairs()) {
      if (p.a() == p.b()) {
        continue;
      }
      out.add(new PairSuggestion(p.a(), p.b(), p.score().score(), shown(p.score().components()),
          PairVerdict.valueOf(p.score().verdict().name()), p.score().reasons()));
    }
    return new Suggestions(out, result.notes());
  }

  static Map<String, Double> shown(Map<String, Double> components) {
    Map<String, Double> shown = new LinkedHashMap<>();
    for (PairComponent c : SHOWN) {
      Double v = components.get(c.key());
      shown.put(c.key(), v == null ? Double.NaN : v);
    }
    return shown;
  }

  private ImageAnalysis load(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has no stored analysis; index its folder again"));
  }
}
