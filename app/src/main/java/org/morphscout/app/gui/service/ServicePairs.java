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
 * {@code morphscout pairs} without options. Every sub-score is passed on, one per {@link PairComponent} in its order
 * (the table shows the most telling by default and offers the others in its column menu); all reasons are kept.
 */
public final class ServicePairs implements PairsBackend {
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

  /** Every sub-score (each in [0, 1], 1 best) keyed by its component, in the components' order; NaN if missing. */
  static Map<String, Double> shown(Map<String, Double> components) {
    Map<String, Double> shown = new LinkedHashMap<>();
    for (PairComponent c : PairComponent.values()) {
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
