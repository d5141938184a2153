package org.morphscout.indexer.screen;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.Verdict;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Screens user-listed pairs: resolves both images, scores the pair and keeps the row's extra columns. A resolver or
 * scorer failure becomes a FAIL row whose reason is the failure's message ("cannot use A (path): ..."), never an
 * exception. Within one {@link #screenAll} call each path is resolved once, so an image used in many rows costs one
 * analysis. Thread-safe if the resolver is.
 */
public final class PairScreener {
  private static final Logger LOG = LoggerFactory.getLogger(PairScreener.class);

  private final PairScorer scorer;
  private final AnalysisResolver resolver;

  public PairScreener(PairScorer scorer, AnalysisResolver resolver) {
    this.scorer = scorer;
    this.resolver = resolver;
  }

  /** Screens one row. */
  public ScreenResult screen(ScreenRow row) {
    return screen(row, new HashMap<>());
  }

  /**
   * Screens rows in order, one result per row.
   *
   * @throws CancellationToken.CancelledException when cancelled
   */
  public List<ScreenResult> screenAll(List<ScreenRow> rows, ProgressListener progress, CancellationToken cancel) {
    try {
      progress.phase("screening pairs", rows.size());
      Map<String, Resolved> cache = new HashMap<>();
      List<ScreenResult> out = new ArrayList<>(rows.size());
      for (ScreenRow row : rows) {
        cancel.throwIfCancelled();
        out.add(screen(row, cache));
        progress.progressed(out.size(), row.pathA() + " -> " + row.pathB());
      }
      return out;
    } finally {
      progress.finished();
    }
  }

  /**
   * Screens rows one at a time for a list of any length: images used by several rows are resolved once while they
   * stay among the {@code cacheSize} most recently used (about 20 KB each), so memory stays bounded.
   */
  public final class Stream {
    private final Map<String, Resolved> cache;

    private Stream(int cacheSize) {
      cache = new java.util.LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<String, Resolved> eldest) {
          return size() > cacheSize;
        }
      };
    }

    public ScreenResult screen(ScreenRow row) {
      return PairScreener.this.screen(row, cache);
    }
  }

  /** A streaming screener keeping at most {@code cacheSize} resolved images. */
  public Stream stream(int cacheSize) {
    return new Stream(cacheSize);
  }

  /** An analysis, or the reason there is none. */
  private record Resolved(ImageAnalysis analysis, String problem) {}

  private ScreenResult screen(ScreenRow row, Map<String, Resolved> cache) {
    Resolved a = cache.computeIfAbsent(row.pathA(), this::resolve);
    Resolved b = cache.computeIfAbsent(row.pathB(), this::resolve);
    List<String> problems = new ArrayList<>();
    if (a.problem() != null) {
      problems.add("cannot use A (" + row.pathA() + "): " + a.problem());
    }
    if (b.problem() != null) {
      problems.add("cannot use B (" + row.pathB() + "): " + b.problem());
    }
    if (!problems.isEmpty()) {
      return new ScreenResult(row.pathA(), row.pathB(), Verdict.FAIL, 0, problems, row.extras());
    }
    try {
      PairScore s = scorer.score(a.analysis(), b.analysis());
      return new ScreenResult(row.pathA(), row.pathB(), s.verdict(), s.score(), s.reasons(), row.extras());
    } catch (RuntimeException e) {
      LOG.warn("scoring {} -> {} failed", row.pathA(), row.pathB(), e);
      return new ScreenResult(row.pathA(), row.pathB(), Verdict.FAIL, 0,
          List.of("could not score the pair: " + message(e)), row.extras());
    }
  }

  private Resolved resolve(String path) {
    try {
      ImageAnalysis analysis = resolver.resolve(path);
      if (analysis == null) {
        return new Resolved(null, "no analysis found");
      }
      return new Resolved(analysis, null);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new CancellationToken.CancelledException();
    } catch (Exception e) {
      LOG.debug("cannot resolve {}", path, e);
      return new Resolved(null, message(e));
    }
  }

  private static String message(Exception e) {
    String m = e.getMessage();
    return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
  }
}
