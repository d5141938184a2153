package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.library.AnalysisCache;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.StoredPairCodec;
import org.morphscout.indexer.library.StoredPairs;
import org.morphscout.indexer.pairing.ImageFacts;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.pairing.PairMeasures;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.WarpMeasures;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Whole-library pair queries on stored pairs: a catalog of {@code n} images, each with 20 to 30 stored candidate
 * pairs of seeded random (plausible) measures, asked for the best 30 pairs, as {@code pairs --top 30} does, then again
 * under changed weights (a {@code --set}). Reports wall time per query, the heap the query needed and the catalog's
 * size. The measures are synthetic: what is measured is reading and scoring stored rows, which does not depend on
 * their values.
 */
public final class StoredPairsBenchmark {
  /**
   * @param images catalog images
   * @param pairs stored pairs
   * @param fillSeconds time to write the synthetic catalog
   * @param queryMs wall time of {@code pairs --top 30} per run (first run cold)
   * @param rerankMs the same under changed weights
   * @param heapBytes peak heap during the queries above the heap in use before them (an upper bound)
   * @param databaseBytes size of the catalog database
   */
  public record Result(int images, long pairs, double fillSeconds, Latencies queryMs, Latencies rerankMs,
      long heapBytes, long databaseBytes) {}

  private StoredPairsBenchmark() {}

  public static Result run(Path catalogDir, int images, long seed, int repetitions) throws IOException {
    long start = System.nanoTime();
    long pairs;
    try (Library library = Library.open(catalogDir)) {
      pairs = fill(library, images, seed);
    }
    double fill = (System.nanoTime() - start) / 1e9;
    try (Library library = Library.openForReading(catalogDir)) {
      PairScorer defaults = new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
      PairScorer changed = new PairScorer(ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.weight", "1",
          "appearance.weight", "3")), Ciede2000::difference, new WarpEstimator());
      AnalysisCache cache = new AnalysisCache(library, 16);
      PairQuery query = new PairQuery(20, 30, 0);
      long before = HeapMeter.usedAfterGc();
      HeapMeter.resetPeak();
      long[] q = new long[repetitions];
      long[] r = new long[repetitions];
      for (int i = 0; i < repetitions; i++) {
        q[i] = timed(new StoredPairs(library, cache, defaults), query);
        r[i] = timed(new StoredPairs(library, cache, changed), query);
      }
      long peak = HeapMeter.peakSinceReset();
      return new Result(images, pairs, fill, Latencies.ofNanos(q), Latencies.ofNanos(r), Math.max(0, peak - before),
          library.catalog().databaseBytes());
    }
  }

  private static long timed(StoredPairs stored, PairQuery query) {
    long t = System.nanoTime();
    PairSearchResult result = stored.best(query, CancellationToken.none());
    if (result.pairs().size() != query.topN()) {
      throw new IllegalStateException("expected " + query.topN() + " pairs, got " + result.pairs().size());
    }
    return System.nanoTime() - t;
  }

  /** Writes {@code n} ready images, their facts, choices and pair measures; returns the pairs stored. */
  private static long fill(Library library, int n, long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    library.catalog().inTransaction(c -> {
      try (PreparedStatement root = c.prepareStatement(
          "INSERT INTO roots(id, path, added_at) VALUES (1, '/bench', '2026-12-04T00:00:00Z')")) {
        root.executeUpdate();
      }
      try (PreparedStatement s = c.prepareStatement("INSERT INTO images(id, root_id, path, size, mtime_ms, status, "
          + "first_seen, updated_at) VALUES (?, 1, ?, 1000, 0, 'ready', 'x', 'x')")) {
        for (int i = 1; i <= n; i++) {
          s.setInt(1, i);
          s.setString(2, "/bench/" + i + ".jpg");
          s.addBatch();
        }
        s.executeBatch();
      }
      return null;
    });
    PairStore store = library.pairs();
    int batch = 2000;
    for (int from = 1; from <= n; from += batch) {
      int to = Math.min(n, from + batch - 1);
      List<PairStore.Row> rows = new ArrayList<>();
      List<long[]> choices = new ArrayList<>();
      for (int id = from; id <= to; id++) {
        int k = 20 + random.nextInt(11);
        long[] others = new long[k];
        for (int j = 0; j < k; j++) {
          long other;
          do {
            other = 1 + Math.floorMod(id + random.nextInt(-500, 500), n);
          } while (other == id);
          others[j] = other;
        }
        others = Arrays.stream(others).distinct().toArray();
        choices.add(others);
        for (long other : others) {
          rows.add(row(Math.min(id, other), Math.max(id, other), random));
        }
      }
      int first = from;
      library.catalog().inTransaction(c -> {
        for (int i = 0; i < choices.size(); i++) {
          long id = first + i;
          store.putChoice(id, 20, picture(random), Arrays.stream(choices.get(i)).boxed().toList());
        }
        store.putMeasures(rows.stream().collect(java.util.stream.Collectors.toMap(
            r -> r.first() * (n + 1L) + r.second(), r -> r, (x, y) -> x)).values());
        return null;
      });
    }
    return library.pairs().counts(PairMeasurer.VERSION).pairs();
  }

  private static byte[] picture(SplittableRandom random) {
    ImageFacts f = new ImageFacts(1200 + random.nextInt(2000), 900 + random.nextInt(1500), false,
        random.nextInt(10) == 0, random.nextInt(8) == 0 ? 2 : 1, 0.3 + 0.7 * random.nextDouble(),
        random.nextInt(20) == 0, 0.1 + 0.5 * random.nextDouble());
    return StoredPairCodec.picture(f);
  }

  private static PairStore.Row row(long first, long second, SplittableRandom random) {
    PairMeasures m = new PairMeasures(random.nextDouble() * 0.8, random.nextDouble() * 40, 30 + random.nextDouble() * 50,
        30 + random.nextDouble() * 50, 5 + random.nextDouble() * 20, 5 + random.nextDouble() * 20,
        random.nextDouble(), random.nextDouble() * 0.5, 0.3 + 0.7 * random.nextDouble(),
        0.3 + 0.7 * random.nextDouble(), random.nextDouble() * 0.4, random.nextDouble() * 50,
        20 + random.nextDouble() * 60, 20 + random.nextDouble() * 60);
    boolean bounded = random.nextInt(10) == 0;
    WarpMeasures w = bounded ? null : new WarpMeasures(random.nextDouble(), 0.3 + 0.7 * random.nextDouble(),
        0.4 + 0.6 * random.nextDouble(), random.nextDouble() * 0.3, random.nextDouble() * 0.8,
        random.nextDouble() * 0.05, Double.NaN, Double.NaN);
    if (bounded) {
      // A bound-skipped pair: its cheap measures are poor, so its best possible score stays below the list.
      m = new PairMeasures(1.5, 90, 10, 90, 2, 30, 0.05, 1.2, 0.1, 0.1, 1.0, 90, 10, 90);
    }
    return new PairStore.Row(first, second, bounded ? PairStore.Kind.BOUNDED : PairStore.Kind.MEASURED,
        PairMeasurer.VERSION, StoredPairCodec.pair(m, w));
  }
}
