package org.morphscout.indexer.library;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.PriorityQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.concurrent.Semaphore;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.pairing.ImageFacts;
import org.morphscout.indexer.pairing.PairFacts;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.pairing.WarpMeasures;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Answers pair queries from the stored pairs: every stored pair is scored from its stored facts under the current
 * settings while the rows stream past, and only the best {@code topN} are kept (a bounded heap), so memory does not
 * grow with the number of stored pairs. A pair stored without its warp is warped live only when its score's upper
 * bound could still place it among the best. The answer is the one {@link org.morphscout.indexer.pairing.PairFinder}
 * gives over the same candidates, scored exactly.
 */
public final class StoredPairs {
  private static final int BATCH = 4096;
  private static final Comparator<Entry> BEST_FIRST = Comparator.comparingDouble((Entry e) -> -e.score)
      .thenComparingLong(e -> e.first).thenComparingLong(e -> e.second);

  private final Library library;
  private final AnalysisCache cache;
  private final PairScorer scorer;

  /** @param cache analyses for the rare pair stored without its warp that must be warped live */
  public StoredPairs(Library library, AnalysisCache cache, PairScorer scorer) {
    this.library = library;
    this.cache = cache;
    this.scorer = scorer;
  }

  /** Why the store cannot answer queries asking {@code candidates} per image; empty when it can. */
  Optional<String> unusable(String modelId, int candidates) {
    Optional<String> complete = library.features().setting(LibrarySettings.STORED_PAIRS_COMPLETE);
    if (complete.isEmpty()) {
      return Optional.of("the catalog's stored pairs are not complete (run index to bring them up to date)");
    }
    String[] parts = complete.get().split(":", 3);
    if (parts.length < 3 || !parts[0].equals(Integer.toString(PairMeasurer.VERSION))) {
      return Optional.of("the catalog's stored pairs were measured by another version (run index to refresh them)");
    }
    if (!parts[2].equals(modelId)) {
      return Optional.of("the catalog's stored pairs belong to another appearance model (run index)");
    }
    if (!parts[1].equals(Integer.toString(candidates))) {
      return Optional.of("the catalog stores " + parts[1] + " candidates per image, not " + candidates);
    }
    return Optional.empty();
  }

  /** The best pairs of the whole catalog (check {@link #unusable} first). */
  public PairSearchResult best(PairQuery query, CancellationToken cancel) {
    ImageFacts[] pictures = pictures();
    Ranking ranking = new Ranking(query);
    // One thread reads rows (the catalog's connection is single-threaded); the others score them in batches.
    int workers = Math.max(1, Runtime.getRuntime().availableProcessors());
    ExecutorService pool = Workers.pool("stored-pairs", workers);
    Semaphore inFlight = new Semaphore(2 * workers); // bounds the rows held in memory
    List<Future<?>> done = new ArrayList<>();
    @SuppressWarnings("unchecked")
    List<PairStore.Row>[] batch = new List[] {new ArrayList<>(BATCH)};
    long[] counted = new long[1];
    try {
      library.pairs().forEach(row -> {
        counted[0]++;
        batch[0].add(row);
        if (batch[0].size() == BATCH) {
          done.add(submit(pool, inFlight, batch[0], pictures, ranking));
          batch[0] = new ArrayList<>(BATCH);
        }
      });
      done.add(submit(pool, inFlight, batch[0], pictures, ranking));
      done.forEach(Workers::await);
    } finally {
      pool.shutdownNow();
    }
    PriorityQueue<Entry> heap = ranking.heap;
    List<PairSearchResult.DuplicatePair> duplicates = ranking.duplicates;
    List<Entry> hopeful = ranking.hopeful;
    cancel.throwIfCancelled();
    List<String> failures = new ArrayList<>();
    hopeful.sort(BEST_FIRST);
    for (Entry e : hopeful) {
      cancel.throwIfCancelled();
      if (e.score < threshold(heap, query)) {
        break; // sorted by bound: no later one can enter either
      }
      try {
        PairFacts f = e.facts.withWarp(WarpMeasures.of(scorer.measurer().warp(load(e.first), load(e.second))));
        offer(heap, new Entry(e.first, e.second, scorer.score(f), f), query);
      } catch (MorphscoutException ex) {
        failures.add("images " + e.first + " and " + e.second + ": " + ex.getMessage());
      }
    }
    duplicates.sort(Comparator.comparingLong(PairSearchResult.DuplicatePair::a)
        .thenComparingLong(PairSearchResult.DuplicatePair::b));
    return new PairSearchResult(ranked(heap), duplicates, (int) counted[0], failures);
  }

  /**
   * The best partners of a catalog image over its stored choice, the image as A: pairs stored in that orientation
   * are scored from their facts, the others measured live (a warp is not symmetric).
   */
  PairSearchResult partners(long id, PairQuery query, CancellationToken cancel) {
    PriorityQueue<Entry> heap = new PriorityQueue<>(BEST_FIRST.reversed());
    List<PairSearchResult.DuplicatePair> duplicates = new ArrayList<>();
    Map<Long, PairStore.Row> stored = new HashMap<>();
    for (PairStore.Row row : library.pairs().chosenBy(id)) {
      stored.put(row.first() == id ? row.second() : row.first(), row);
    }
    ImageFacts[] pictures = pictures();
    int scored = 0;
    for (long other : library.pairs().choicesOf(id)) {
      cancel.throwIfCancelled();
      PairStore.Row row = stored.get(other);
      if (row == null) {
        continue;
      }
      scored++;
      if (row.kind() == PairStore.Kind.DUPLICATE) {
        duplicates.add(new PairSearchResult.DuplicatePair(Math.min(id, other), Math.max(id, other)));
        continue;
      }
      PairFacts f;
      if (row.kind() == PairStore.Kind.NO_OBJECT) {
        f = new PairFacts(picture(pictures, id), picture(pictures, other), null, null);
      } else if (row.first() == id && row.kind() == PairStore.Kind.MEASURED) {
        f = new PairFacts(picture(pictures, id), picture(pictures, other),
            StoredPairCodec.measures(row.measures(), row.first(), row.second()),
            StoredPairCodec.warp(row.measures(), row.first(), row.second()));
      } else {
        f = scorer.measurer().measure(load(id), load(other));
      }
      offer(heap, new Entry(id, other, scorer.score(f), f), query);
    }
    return new PairSearchResult(ranked(heap), duplicates, scored, List.of());
  }

  /** Every paired image's facts, indexed by image id (ids are dense row ids). */
  private ImageFacts[] pictures() {
    Map<Long, byte[]> stored = library.pairs().pictureFacts();
    long max = 0;
    for (long id : stored.keySet()) {
      max = Math.max(max, id);
    }
    if (max >= Integer.MAX_VALUE) {
      throw new MorphscoutException("image ids beyond " + Integer.MAX_VALUE + " are not supported");
    }
    ImageFacts[] out = new ImageFacts[(int) max + 1];
    stored.forEach((id, bytes) -> out[(int) (long) id] = StoredPairCodec.picture(bytes, id));
    return out;
  }

  private static ImageFacts picture(ImageFacts[] pictures, long id) {
    ImageFacts f = id >= 0 && id < pictures.length ? pictures[(int) id] : null;
    if (f == null) {
      throw new MorphscoutException("the stored pairs name image " + id + " without its facts: run index");
    }
    return f;
  }

  private ImageAnalysis load(long id) {
    return cache.get(id).orElseThrow(() -> new MorphscoutException("image " + id + " has no stored analysis"));
  }

  private static void offer(PriorityQueue<Entry> heap, Entry e, PairQuery query) {
    if (e.score < query.minScore()) {
      return;
    }
    if (heap.size() < query.topN()) {
      heap.add(e);
    } else if (BEST_FIRST.compare(e, heap.peek()) < 0) {
      heap.poll();
      heap.add(e);
    }
  }

  /** The lowest score that could still enter the list. */
  private static double threshold(PriorityQueue<Entry> heap, PairQuery query) {
    return heap.size() < query.topN() ? query.minScore() : Math.max(query.minScore(), heap.peek().score);
  }

  private List<ScoredPair> ranked(PriorityQueue<Entry> heap) {
    List<Entry> best = new ArrayList<>(heap);
    best.sort(BEST_FIRST);
    List<ScoredPair> out = new ArrayList<>();
    for (Entry e : best) {
      PairScore s = scorer.explain(e.facts);
      out.add(new ScoredPair(e.first, e.second, s));
    }
    return out;
  }

  private record Entry(long first, long second, double score, PairFacts facts) {}

  private Future<?> submit(ExecutorService pool, Semaphore inFlight, List<PairStore.Row> rows,
      ImageFacts[] pictures, Ranking ranking) {
    try {
      inFlight.acquire();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new CancellationToken.CancelledException();
    }
    return pool.submit(() -> {
      try {
        for (PairStore.Row row : rows) {
          ranking.take(row, pictures, scorer);
        }
      } finally {
        inFlight.release();
      }
    });
  }

  /**
   * The best entries so far, shared by the scoring threads. The top {@code topN} under a total order does not depend
   * on the order rows arrive in, so the answer is the same whatever the threads do.
   */
  private static final class Ranking {
    final PairQuery query;
    final PriorityQueue<Entry> heap = new PriorityQueue<>(BEST_FIRST.reversed());
    final List<PairSearchResult.DuplicatePair> duplicates = new ArrayList<>();
    final List<Entry> hopeful = new ArrayList<>();
    /** The lowest score that could still enter, read without the lock to reject most rows cheaply. */
    volatile double floor;

    Ranking(PairQuery query) {
      this.query = query;
      this.floor = query.minScore();
    }

    void take(PairStore.Row row, ImageFacts[] pictures, PairScorer scorer) {
      switch (row.kind()) {
        case MEASURED -> {
          PairFacts f = new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()),
              StoredPairCodec.measures(row.measures(), row.first(), row.second()),
              StoredPairCodec.warp(row.measures(), row.first(), row.second()));
          double score = scorer.score(f);
          if (score >= floor) {
            offer(new Entry(row.first(), row.second(), score, f));
          }
        }
        case NO_OBJECT -> {
          if (0 >= floor) {
            offer(new Entry(row.first(), row.second(), 0,
                new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()), null, null)));
          }
        }
        case DUPLICATE -> {
          synchronized (this) {
            duplicates.add(new PairSearchResult.DuplicatePair(row.first(), row.second()));
          }
        }
        case BOUNDED -> {
          // Stored without a warp: kept aside only while its best possible score could still enter the list.
          PairFacts f = new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()),
              StoredPairCodec.measures(row.measures(), row.first(), row.second()), null);
          double bound = scorer.upperBound(f);
          if (bound >= floor) {
            synchronized (this) {
              hopeful.add(new Entry(row.first(), row.second(), bound, f));
            }
          }
        }
      }
    }

    synchronized void offer(Entry e) {
      StoredPairs.offer(heap, e, query);
      floor = threshold(heap, query);
    }
  }
}
