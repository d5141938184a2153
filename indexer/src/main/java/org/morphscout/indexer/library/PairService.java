package org.morphscout.indexer.library;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.CandidateSource;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.pairing.NearDuplicates;
import org.morphscout.indexer.pairing.PairFinder;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Scores pairs and discovers the most morph-friendly ones. Candidates come from the HNSW index (appearance and shape
 * fields, so outline-compatible images with different surfaces are proposed too) and are then scored exactly, with
 * warp estimation.
 */
public final class PairService {
  private final QueryContext context;
  private final PairScorer scorer;
  private final NearDuplicates duplicates;
  private final StoredPairs stored;
  private final boolean storeApplies;

  public PairService(QueryContext context, ScoreConfig config) {
    this(context, config, NearDuplicateConfig.DEFAULTS);
  }

  public PairService(QueryContext context, ScoreConfig config, NearDuplicateConfig duplicateConfig) {
    this.context = context;
    this.scorer = new PairScorer(config, Ciede2000::difference, new WarpEstimator());
    this.duplicates = new NearDuplicates(duplicateConfig, Ciede2000::difference);
    this.stored = new StoredPairs(context.library(), context.cache(), scorer);
    // Stored near-duplicate flags were decided with the default rule.
    this.storeApplies = duplicateConfig.equals(NearDuplicateConfig.DEFAULTS);
  }

  public PairScorer scorer() {
    return scorer;
  }

  /** Scores one pair exactly. */
  public PairScore score(ImageAnalysis a, ImageAnalysis b) {
    return scorer.score(a, b);
  }

  /** Whether two images are the same picture resized, recompressed or lightly edited. */
  public boolean areDuplicates(ImageAnalysis a, ImageAnalysis b) {
    return duplicates.areDuplicates(a, b);
  }

  /**
   * The best pairs over every ready image of the catalog, near-duplicates listed apart. Answered from the catalog's
   * stored pairs when they are up to date for this query (scores computed from stored measures under the current
   * settings, in about a second per million stored pairs); otherwise every candidate pair is measured live, and the
   * result says why in its notes.
   */
  public PairSearchResult bestPairs(PairQuery query, ProgressListener progress, CancellationToken cancel) {
    Optional<String> why = storeUnusable(query);
    if (why.isEmpty()) {
      return stored.best(query, cancel);
    }
    return bestPairsLive(query, progress, cancel).withNote("scored live: " + why.get());
  }

  /** The best pairs with every candidate pair measured now, the stored pairs left aside. */
  PairSearchResult bestPairsLive(PairQuery query, ProgressListener progress, CancellationToken cancel) {
    List<Long> ids = context.library().features().readyIds(context.modelId());
    return finder().findPairs(ids, query, progress, cancel);
  }

  /** The best partners of a catalog image with every candidate pair measured now. */
  PairSearchResult partnersLive(ImageAnalysis image, PairQuery query, ProgressListener progress,
      CancellationToken cancel) {
    return finder().findPartners(image.id(), query, progress, cancel);
  }

  private Optional<String> storeUnusable(PairQuery query) {
    if (!storeApplies) {
      return Optional.of("the near-duplicate rule differs from the one the stored pairs were made with");
    }
    return stored.unusable(context.modelId(), query.candidatesPerImage());
  }

  /** The best partners of one image; an image outside the catalog is scored against its nearest catalog images. */
  public PairSearchResult partners(ImageAnalysis image, PairQuery query, ProgressListener progress,
      CancellationToken cancel) {
    if (image.id() >= 0) {
      Optional<String> why = storeUnusable(query);
      if (why.isEmpty()) {
        return stored.partners(image.id(), query, cancel);
      }
      return partnersLive(image, query, progress, cancel).withNote("scored live: " + why.get());
    }
    Set<Long> exclude = new LinkedHashSet<>();
    context.sameContent(image).ifPresent(exclude::add);
    List<ScoredPair> pairs = new ArrayList<>();
    List<PairSearchResult.DuplicatePair> dupes = new ArrayList<>();
    List<Long> candidates = candidates(image, query.candidatesPerImage(), exclude);
    progress.phase("scoring", candidates.size());
    long done = 0;
    for (long id : candidates) {
      cancel.throwIfCancelled();
      Optional<ImageAnalysis> other = context.cache().get(id);
      if (other.isPresent()) {
        if (duplicates.areDuplicates(image, other.get())) {
          dupes.add(new PairSearchResult.DuplicatePair(-1, id));
        } else {
          PairScore s = scorer.score(image, other.get());
          if (s.score() >= query.minScore()) {
            pairs.add(new ScoredPair(-1, id, s));
          }
        }
      }
      progress.progressed(++done, "");
    }
    pairs.sort(Comparator.comparingDouble((ScoredPair p) -> -p.score().score()).thenComparingLong(ScoredPair::b));
    List<ScoredPair> top = pairs.size() > query.topN() ? pairs.subList(0, query.topN()) : pairs;
    return new PairSearchResult(top, dupes, candidates.size(), List.of());
  }

  private PairFinder finder() {
    CandidateSource source = (id, k) -> {
      ImageAnalysis a = context.cache().get(id).orElse(null);
      return a == null ? List.of() : candidates(a, k, Set.of(id));
    };
    return new PairFinder(scorer, duplicates, source, id -> context.cache().get(id).orElseThrow(
        () -> new MorphscoutException("image " + id + " has no stored analysis")),
        Runtime.getRuntime().availableProcessors());
  }

  /** Nearest catalog images by shape first (what morphs well), then by appearance, without duplicates. */
  List<Long> candidates(ImageAnalysis a, int k, Set<Long> exclude) {
    try {
      return PairCandidates.of(context.index(), a, k, exclude);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

}
