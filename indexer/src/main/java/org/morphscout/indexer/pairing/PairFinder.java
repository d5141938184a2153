package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.LongFunction;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Finds the pairs of a library that morph best. The candidate source (the appearance index) proposes each image's
 * k nearest images; unordered pairs are de-duplicated, then every pair is scored exactly by the {@link PairScorer}
 * on a pool of named worker threads. Near-duplicates (the same picture twice) are excluded from the pairs and listed
 * apart. The image with the smaller id is A, except for {@link #findPartners}, where the query image is A.
 *
 * <p>Analyses are loaded through the loader as needed and not kept, so memory stays flat on large libraries; a
 * loader backed by a slow store should cache. A loader or scoring failure skips the pairs concerned and is reported
 * in {@link PairSearchResult#failures()}. Candidates outside the given ids are scored too (the source defines the
 * library). Thread-safe; each search makes and shuts down its own pool.
 */
public final class PairFinder {
  private static final Logger LOG = LoggerFactory.getLogger(PairFinder.class);
  private static final AtomicInteger POOLS = new AtomicInteger();

  private final PairScorer scorer;
  private final NearDuplicates duplicates;
  private final CandidateSource candidates;
  private final LongFunction<ImageAnalysis> loader;
  private final int threads;

  /**
   * @param loader returns the analysis of a catalog id; may throw (for example a MorphscoutException naming the file)
   * @param threads worker threads, at least 1 (the machine's cores is a good choice)
   */
  public PairFinder(PairScorer scorer, NearDuplicates duplicates, CandidateSource candidates,
      LongFunction<ImageAnalysis> loader, int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be at least 1, got " + threads);
    }
    this.scorer = scorer;
    this.duplicates = duplicates;
    this.candidates = candidates;
    this.loader = loader;
    this.threads = threads;
  }

  /**
   * The best pairs over the given images.
   *
   * @throws CancellationToken.CancelledException when cancelled
   */
  public PairSearchResult findPairs(Collection<Long> ids, PairQuery query, ProgressListener progress,
      CancellationToken cancel) {
    try {
      progress.phase("finding candidates", ids.size());
      Map<Long, TreeSet<Long>> byA = new TreeMap<>();
      long done = 0;
      for (long id : ids) {
        cancel.throwIfCancelled();
        for (long other : candidates.candidates(id, query.candidatesPerImage())) {
          if (other != id) {
            byA.computeIfAbsent(Math.min(id, other), x -> new TreeSet<>()).add(Math.max(id, other));
          }
        }
        progress.progressed(++done, Long.toString(id));
      }
      return score(byA, query, progress, cancel);
    } finally {
      progress.finished();
    }
  }

  /**
   * The best partners of one image (it is A in every pair).
   *
   * @throws CancellationToken.CancelledException when cancelled
   */
  public PairSearchResult findPartners(long id, PairQuery query, ProgressListener progress,
      CancellationToken cancel) {
    try {
      TreeSet<Long> others = new TreeSet<>(candidates.candidates(id, query.candidatesPerImage()));
      others.remove(id);
      Map<Long, TreeSet<Long>> byA = new TreeMap<>();
      byA.put(id, others);
      return score(byA, query, progress, cancel);
    } finally {
      progress.finished();
    }
  }

  private PairSearchResult score(Map<Long, TreeSet<Long>> byA, PairQuery query, ProgressListener progress,
      CancellationToken cancel) {
    int total = byA.values().stream().mapToInt(TreeSet::size).sum();
    progress.phase("scoring pairs", total);
    ExecutorService pool = Executors.newFixedThreadPool(threads, namedThreads());
    List<ScoredPair> pairs = new ArrayList<>();
    List<PairSearchResult.DuplicatePair> dups = new ArrayList<>();
    List<String> failures = new ArrayList<>();
    int scored = 0;
    try {
      CompletionService<Batch> done = new ExecutorCompletionService<>(pool);
      for (Map.Entry<Long, TreeSet<Long>> e : byA.entrySet()) {
        long a = e.getKey();
        List<Long> bs = List.copyOf(e.getValue());
        done.submit(() -> scoreBatch(a, bs, cancel));
      }
      long finished = 0;
      for (int i = 0; i < byA.size(); i++) {
        Batch batch = done.take().get();
        pairs.addAll(batch.pairs);
        dups.addAll(batch.duplicates);
        failures.addAll(batch.failures);
        scored += batch.pairs.size() + batch.duplicates.size();
        finished += batch.size;
        progress.progressed(finished, Long.toString(batch.a));
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new CancellationToken.CancelledException();
    } catch (ExecutionException e) {
      if (e.getCause() instanceof CancellationToken.CancelledException c) {
        throw c;
      }
      if (e.getCause() instanceof RuntimeException r) {
        throw r;
      }
      throw new IllegalStateException(e.getCause());
    } finally {
      pool.shutdownNow();
    }
    cancel.throwIfCancelled();
    List<ScoredPair> best = pairs.stream()
        .filter(p -> p.score().score() >= query.minScore())
        .sorted(Comparator.comparingDouble((ScoredPair p) -> -p.score().score())
            .thenComparingLong(ScoredPair::a).thenComparingLong(ScoredPair::b))
        .limit(query.topN())
        .toList();
    List<PairSearchResult.DuplicatePair> sortedDups = dups.stream()
        .sorted(Comparator.comparingLong(PairSearchResult.DuplicatePair::a)
            .thenComparingLong(PairSearchResult.DuplicatePair::b))
        .toList();
    return new PairSearchResult(best, sortedDups, scored, failures);
  }

  private record Batch(long a, int size, List<ScoredPair> pairs, List<PairSearchResult.DuplicatePair> duplicates,
      List<String> failures) {}

  private Batch scoreBatch(long a, List<Long> bs, CancellationToken cancel) {
    List<ScoredPair> pairs = new ArrayList<>();
    List<PairSearchResult.DuplicatePair> dups = new ArrayList<>();
    List<String> failures = new ArrayList<>();
    ImageAnalysis analysisA;
    try {
      analysisA = loader.apply(a);
    } catch (RuntimeException e) {
      LOG.warn("cannot load analysis of image {}: {}", a, e.getMessage());
      failures.add("image " + a + ": " + e.getMessage());
      return new Batch(a, bs.size(), pairs, dups, failures);
    }
    for (long b : bs) {
      cancel.throwIfCancelled();
      ImageAnalysis analysisB;
      try {
        analysisB = loader.apply(b);
      } catch (RuntimeException e) {
        LOG.warn("cannot load analysis of image {}: {}", b, e.getMessage());
        failures.add("image " + b + ": " + e.getMessage());
        continue;
      }
      if (duplicates.areDuplicates(analysisA, analysisB)) {
        dups.add(new PairSearchResult.DuplicatePair(Math.min(a, b), Math.max(a, b)));
      } else {
        try {
          pairs.add(new ScoredPair(a, b, scorer.score(analysisA, analysisB)));
        } catch (CancellationToken.CancelledException e) {
          throw e;
        } catch (RuntimeException e) {
          // One malformed analysis must not end a library-wide search; report it with the pair.
          LOG.warn("cannot score images {} and {}", a, b, e);
          failures.add("images " + a + " and " + b + ": " + e.getMessage());
        }
      }
    }
    return new Batch(a, bs.size(), pairs, dups, failures);
  }

  private static ThreadFactory namedThreads() {
    int pool = POOLS.incrementAndGet();
    AtomicInteger n = new AtomicInteger();
    return r -> {
      Thread t = new Thread(r, "morphscout-pairs-" + pool + "-" + n.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
  }
}
