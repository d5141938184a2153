package org.morphscout.app.bench;

import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.util.VectorUtil;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.pairing.NearDuplicates;
import org.morphscout.indexer.pairing.PairFinder;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Pair scoring cost: milliseconds per exact pair score ({@link PairScorer} with demons warp estimation, one thread),
 * and library-wide pair discovery ({@link PairFinder} with the default {@link PairQuery}, all cores) on real
 * analyses. Discovery scores a fixed number of candidates per image, so its cost grows linearly with the library;
 * the figure for a larger library is projected from the measured seconds per image (the candidate look-up, a kNN
 * query of about a millisecond per image, is a small part of it).
 */
public final class PairBenchmark {

  /**
   * @param pairMs single-thread latency of one exact pair score
   * @param pairCpuMs CPU time of the scoring thread per pair
   * @param discoveryImages images in the measured discovery run
   * @param discoverySeconds wall-clock time of that run
   * @param pairsScored candidate pairs it scored
   * @param threads worker threads of the discovery run
   */
  public record Result(Latencies pairMs, Latencies pairCpuMs, int discoveryImages, double discoverySeconds,
      int pairsScored, int threads) {
    /** Discovery time projected linearly to a library of {@code images}. */
    public double projectedSeconds(int images) {
      return discoverySeconds / discoveryImages * images;
    }
  }

  private PairBenchmark() {}

  /** @param analyses at least 3 analysed images with ids 0..n-1 in order */
  public static Result run(List<ImageAnalysis> analyses, int pairRepetitions) {
    if (analyses.size() < 3) {
      throw new IllegalArgumentException("need at least 3 analyses");
    }
    PairScorer scorer = new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
    int n = analyses.size();
    for (int i = 0; i < Math.min(5, n - 1); i++) {
      scorer.score(analyses.get(i), analyses.get(i + 1));
    }
    long[] nanos = new long[pairRepetitions];
    long[] cpu = new long[pairRepetitions];
    for (int r = 0; r < pairRepetitions; r++) {
      int ia = r % n;
      int ib = (r * 7 + 1) % n == ia ? (ia + 1) % n : (r * 7 + 1) % n;
      ImageAnalysis a = analyses.get(ia);
      ImageAnalysis b = analyses.get(ib);
      long c0 = CpuClock.threadNanos();
      long t0 = System.nanoTime();
      scorer.score(a, b);
      nanos[r] = System.nanoTime() - t0;
      cpu[r] = CpuClock.threadNanos() - c0;
    }

    int threads = Runtime.getRuntime().availableProcessors();
    PairFinder finder = new PairFinder(scorer, new NearDuplicates(NearDuplicateConfig.DEFAULTS,
        Ciede2000::difference), (id, k) -> nearest(analyses, (int) id, k), id -> analyses.get((int) id), threads);
    List<Long> ids = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      ids.add((long) i);
    }
    long t0 = System.nanoTime();
    PairSearchResult result = finder.findPairs(ids, PairQuery.DEFAULTS, ProgressListener.NONE,
        CancellationToken.none());
    double seconds = (System.nanoTime() - t0) / 1e9;
    return new Result(Latencies.ofNanos(nanos), Latencies.ofNanos(cpu), n, seconds, result.scored(), threads);
  }

  /** Exact appearance neighbours (the role the vector index plays in production). */
  private static List<Long> nearest(List<ImageAnalysis> all, int id, int k) {
    float[] q = all.get(id).appearance();
    float[] score = new float[all.size()];
    List<Integer> sorted = new ArrayList<>();
    for (int i = 0; i < all.size(); i++) {
      sorted.add(i);
      score[i] = i == id ? Float.NEGATIVE_INFINITY : VectorUtil.dotProduct(q, all.get(i).appearance());
    }
    sorted.sort((x, y) -> Float.compare(score[y], score[x]));
    List<Long> out = new ArrayList<>();
    for (int i = 0; i < Math.min(k, all.size() - 1); i++) {
      out.add((long) sorted.get(i));
    }
    return out;
  }
}
