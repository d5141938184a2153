package org.morphscout.app.gui.service;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalLong;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.SimilarityService;
import org.morphscout.indexer.pairing.ColourDifference;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.pairing.NearDuplicates;
import org.morphscout.indexer.pairing.PairFinder;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Pair suggestions through the library's {@link PairFinder} and {@link PairScorer} with their default configuration
 * (CIEDE2000 colour difference, Sharma, Wu and Dalal 2005), candidates from the vector index (appearance and shape
 * together). The table shows the sub-scores most telling for a morph; all reasons are kept.
 */
public final class ServicePairs implements PairsBackend {
  /** Sub-scores shown as columns, in this order (each in [0, 1], 1 best). */
  static final List<String> SHOWN = List.of("overlap", "warpEffort", "foldSafety", "appearance", "colour", "aspect");
  /** Candidates per image: more finds more pairs but costs one warp estimate each. */
  static final int CANDIDATES_PARTNERS = 24;
  static final int CANDIDATES_LIBRARY = 8;

  private final QueryContext context;
  private final int threads;

  public ServicePairs(QueryContext context, int threads) {
    this.context = context;
    this.threads = threads;
  }

  @Override
  public List<PairSuggestion> suggest(OptionalLong image, int limit, CancellationToken token) {
    ColourDifference colour = Ciede2000::difference;
    PairScorer scorer = new PairScorer(ScoreConfig.DEFAULTS, colour, new WarpEstimator());
    NearDuplicates duplicates = new NearDuplicates(NearDuplicateConfig.DEFAULTS, colour);
    PairFinder finder = new PairFinder(scorer, duplicates, this::candidates, this::load, threads);
    PairSearchResult result;
    if (image.isPresent()) {
      result = finder.findPartners(image.getAsLong(), new PairQuery(CANDIDATES_PARTNERS, limit, 0),
          ProgressListener.NONE, token);
    } else {
      List<Long> ids = context.library().features().readyIds(context.modelId());
      result = finder.findPairs(ids, new PairQuery(CANDIDATES_LIBRARY, limit, 0), ProgressListener.NONE, token);
    }
    List<PairSuggestion> out = new ArrayList<>();
    for (ScoredPair p : result.pairs()) {
      Map<String, Double> shown = new LinkedHashMap<>();
      for (String k : SHOWN) {
        Double v = p.score().components().get(k);
        shown.put(k, v == null ? Double.NaN : v);
      }
      out.add(new PairSuggestion(p.a(), p.b(), p.score().score(), shown,
          PairVerdict.valueOf(p.score().verdict().name()), p.score().reasons()));
    }
    return out;
  }

  private List<Long> candidates(long id, int k) {
    try {
      return new SimilarityService(context).similar(load(id), k, SimilarityService.By.BOTH).stream()
          .map(SimilarityService.Hit::id).toList();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot search the vector index", e);
    }
  }

  private ImageAnalysis load(long id) {
    return context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has no stored analysis; index its folder again"));
  }
}
