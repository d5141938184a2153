package org.morphscout.indexer.library;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.ImageFacts;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.pairing.NearDuplicates;
import org.morphscout.indexer.pairing.PairFacts;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.WarpMeasures;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.vector.VectorIndex;
import org.morphscout.indexer.warp.WarpEstimator;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Brings the stored pairs up to date after an indexing run: every ready image without a stored choice chooses its
 * candidates from the vector index ({@link PairCandidates}, {@link #CANDIDATES} per field, as {@code pairs} asks by
 * default), then every chosen pair without measures of the current {@link PairMeasurer#VERSION} is measured on all
 * threads. Cheap before costly: a pair whose cheap measures bound its score under the default settings below
 * {@link #WARP_FLOOR} is stored without its warp (queries warp it live in the rare case a setting could lift it into
 * view). Work is committed in small batches, so an interrupted run keeps what it finished and the next continues.
 */
public final class PairStoreUpdater {
  /** Candidates per image and field stored by {@code index}: the default of {@code pairs}. */
  public static final int CANDIDATES = PairQuery.DEFAULTS.candidatesPerImage();
  /** Pairs whose score cannot reach this under the default settings, whatever the warp, are not warped. */
  public static final double WARP_FLOOR = ScoreConfig.DEFAULTS.warnScore();

  private static final Logger LOG = LoggerFactory.getLogger(PairStoreUpdater.class);
  private static final int CHOOSER_BATCH = 64;
  /** Prepared silhouettes kept while measuring (about 17 MB): a batch's choosers and many of their candidates. */
  private static final int SHAPES = 512;

  private final Library library;
  private final VectorIndex index;
  private final AnalysisCache cache;
  private final int threads;
  private final int batch;
  private final PairMeasurer measurer = new PairMeasurer(Ciede2000::difference, new WarpEstimator());
  private final PairScorer bounds = new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
  private final NearDuplicates duplicates = new NearDuplicates(NearDuplicateConfig.DEFAULTS, Ciede2000::difference);

  /**
   * What an update did.
   *
   * @param chosen images whose candidates were chosen
   * @param measured pairs measured, the warp included
   * @param bounded pairs stored without a warp, their cheap measures bounding the score below {@link #WARP_FLOOR}
   * @param failed pairs that could not be measured (an analysis could not be loaded); they are tried again next time
   */
  public record Result(int chosen, int measured, int bounded, int failed) {}

  public PairStoreUpdater(Library library, VectorIndex index, AnalysisCache cache, int threads) {
    this(library, index, cache, threads, CHOOSER_BATCH);
  }

  /** @param batch images whose choices or pairs are committed together (small in tests, to interrupt between) */
  PairStoreUpdater(Library library, VectorIndex index, AnalysisCache cache, int threads, int batch) {
    if (threads < 1 || batch < 1) {
      throw new IllegalArgumentException("threads and batch must be at least 1, got " + threads + ", " + batch);
    }
    this.library = library;
    this.index = index;
    this.cache = cache;
    this.threads = threads;
    this.batch = batch;
  }

  /**
   * Brings the stored pairs of the ready images of {@code modelId} up to date. Call after the vector index was
   * committed.
   *
   * @throws CancellationToken.CancelledException when cancelled; finished batches stay stored
   */
  public Result update(String modelId, ProgressListener progress, CancellationToken cancel) {
    PairStore store = library.pairs();
    List<Long> ready = library.features().readyIds(modelId);
    Map<Long, Integer> chosen = store.choosers();
    List<Long> toChoose = new ArrayList<>();
    for (long id : ready) {
      Integer k = chosen.get(id);
      if (k == null || k != CANDIDATES) {
        toChoose.add(id);
      }
    }
    ExecutorService pool = Workers.pool("pair-store", threads);
    try {
      progress.phase("choosing pair candidates", toChoose.size());
      long done = 0;
      for (List<Long> ids : batches(toChoose, batch)) {
        cancel.throwIfCancelled();
        List<Callable<Optional<Choice>>> work = new ArrayList<>();
        for (long id : ids) {
          work.add(() -> choose(id));
        }
        List<Choice> choices = new ArrayList<>();
        for (Optional<Choice> c : all(pool, work)) {
          c.ifPresent(choices::add);
        }
        library.catalog().inTransaction(c -> {
          for (Choice choice : choices) {
            store.putChoice(choice.id, CANDIDATES, StoredPairCodec.picture(choice.facts), choice.others);
          }
          return null;
        });
        done += ids.size();
        progress.progressed(done, "");
      }
      int[] counts = new int[3];
      WarpShapeCache shapes = new WarpShapeCache(measurer, SHAPES);
      progress.phase("measuring pairs", ready.size());
      done = 0;
      for (List<Long> ids : batches(ready, batch)) {
        cancel.throwIfCancelled();
        List<PairStore.Choice> pairs = store.unmeasuredOf(ids, PairMeasurer.VERSION);
        List<Callable<Optional<PairStore.Row>>> work = new ArrayList<>();
        for (PairStore.Choice p : pairs) {
          work.add(() -> measure(p.chooser(), p.other(), shapes, cancel));
        }
        List<PairStore.Row> rows = new ArrayList<>();
        for (Optional<PairStore.Row> r : all(pool, work)) {
          if (r.isEmpty()) {
            counts[2]++;
          } else {
            rows.add(r.get());
            counts[r.get().kind() == PairStore.Kind.BOUNDED ? 1 : 0]++;
          }
        }
        library.catalog().inTransaction(c -> {
          store.putMeasures(rows);
          return null;
        });
        done += ids.size();
        progress.progressed(done, "");
      }
      if (!toChoose.isEmpty()) {
        store.dropUnchosen();
      }
      if (counts[2] == 0) {
        library.features().putSetting(LibrarySettings.STORED_PAIRS_COMPLETE,
            PairMeasurer.VERSION + ":" + CANDIDATES + ":" + modelId);
      }
      Result result = new Result(toChoose.size(), counts[0], counts[1], counts[2]);
      LOG.info("stored pairs: {} images chose candidates, {} pairs measured, {} bounded without a warp, {} failed",
          result.chosen(), result.measured(), result.bounded(), result.failed());
      return result;
    } finally {
      pool.shutdownNow();
    }
  }

  private record Choice(long id, ImageFacts facts, List<Long> others) {}

  private Optional<Choice> choose(long id) {
    Optional<ImageAnalysis> a = cache.get(id);
    if (a.isEmpty()) {
      return Optional.empty();
    }
    List<Long> others = PairCandidates.of(index, a.get(), CANDIDATES, Set.of(id));
    return Optional.of(new Choice(id, ImageFacts.of(a.get()), others));
  }

  private Optional<PairStore.Row> measure(long first, long second, WarpShapeCache shapes, CancellationToken cancel) {
    cancel.throwIfCancelled();
    Optional<ImageAnalysis> a = cache.get(first);
    Optional<ImageAnalysis> b = cache.get(second);
    if (a.isEmpty() || b.isEmpty()) {
      LOG.warn("cannot measure images {} and {}: an analysis is missing", first, second);
      return Optional.empty();
    }
    int version = PairMeasurer.VERSION;
    try {
      if (duplicates.areDuplicates(a.get(), b.get())) {
        return Optional.of(new PairStore.Row(first, second, PairStore.Kind.DUPLICATE, version, null));
      }
      PairFacts cheap = measurer.cheap(a.get(), b.get());
      if (!cheap.measurable()) {
        return Optional.of(new PairStore.Row(first, second, PairStore.Kind.NO_OBJECT, version, null));
      }
      if (bounds.upperBound(cheap) < WARP_FLOOR) {
        return Optional.of(new PairStore.Row(first, second, PairStore.Kind.BOUNDED, version,
            StoredPairCodec.pair(cheap.measures(), null)));
      }
      WarpMeasures warp = WarpMeasures.of(measurer.warp(shapes.get(first, a.get()), shapes.get(second, b.get())));
      return Optional.of(new PairStore.Row(first, second, PairStore.Kind.MEASURED, version,
          StoredPairCodec.pair(cheap.measures(), warp)));
    } catch (CancellationToken.CancelledException e) {
      throw e;
    } catch (RuntimeException e) {
      // One malformed analysis must not end the run; the pair is tried again by the next index run.
      LOG.warn("cannot measure images {} and {}", first, second, e);
      return Optional.empty();
    }
  }

  private static <T> List<T> all(ExecutorService pool, Collection<? extends Callable<T>> work) {
    List<Future<T>> futures = new ArrayList<>();
    work.forEach(w -> futures.add(pool.submit(w)));
    List<T> out = new ArrayList<>();
    futures.forEach(f -> out.add(Workers.await(f)));
    return out;
  }

  private static List<List<Long>> batches(List<Long> ids, int size) {
    List<List<Long>> out = new ArrayList<>();
    for (int i = 0; i < ids.size(); i += size) {
      out.add(ids.subList(i, Math.min(ids.size(), i + size)));
    }
    return out;
  }
}
