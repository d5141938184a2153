package org.morphscout.indexer.library;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.PriorityQueue;
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
    Map<Long, ImageFacts> pictures = pictures();
    PriorityQueue<Entry> heap = new PriorityQueue<>(BEST_FIRST.reversed());
    long[] counted = new long[1];
    PairStore store = library.pairs();
    store.forEach(PairStore.Kind.MEASURED, row -> {
      counted[0]++;
      PairFacts f = new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()),
          StoredPairCodec.measures(row.measures(), row.first(), row.second()),
          StoredPairCodec.warp(row.measures(), row.first(), row.second()));
      offer(heap, new Entry(row.first(), row.second(), scorer.score(f), f), query);
    });
    cancel.throwIfCancelled();
    store.forEach(PairStore.Kind.NO_OBJECT, row -> {
      counted[0]++;
      PairFacts f = new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()), null, null);
      offer(heap, new Entry(row.first(), row.second(), 0, f), query);
    });
    List<PairSearchResult.DuplicatePair> duplicates = new ArrayList<>();
    store.forEach(PairStore.Kind.DUPLICATE, row -> {
      counted[0]++;
      duplicates.add(new PairSearchResult.DuplicatePair(row.first(), row.second()));
    });
    // Pairs stored without a warp: only those whose best possible score could still enter the list are warped.
    double floor = threshold(heap, query);
    List<Entry> hopeful = new ArrayList<>();
    store.forEach(PairStore.Kind.BOUNDED, row -> {
      counted[0]++;
      PairFacts f = new PairFacts(picture(pictures, row.first()), picture(pictures, row.second()),
          StoredPairCodec.measures(row.measures(), row.first(), row.second()), null);
      double bound = scorer.upperBound(f);
      if (bound >= floor) {
        hopeful.add(new Entry(row.first(), row.second(), bound, f));
      }
    });
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
    Map<Long, ImageFacts> pictures = pictures();
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

  private Map<Long, ImageFacts> pictures() {
    Map<Long, ImageFacts> out = new HashMap<>();
    library.pairs().pictureFacts().forEach((id, bytes) -> out.put(id, StoredPairCodec.picture(bytes, id)));
    return out;
  }

  private static ImageFacts picture(Map<Long, ImageFacts> pictures, long id) {
    ImageFacts f = pictures.get(id);
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
}
