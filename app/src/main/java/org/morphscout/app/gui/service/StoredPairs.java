package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.function.Supplier;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.NeighbourStore;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Interim pair suggestions until the pair scorer's service lands: candidates are each image's nearest neighbours
 * (the stored neighbour graph, or a brute-force search on small libraries), scored from vector distances, the aligned
 * silhouette IoU ({@link MaskAligner}) and the foreground colour gap (CIE76 Delta E between CIELAB means).
 *
 * <p>The weights below are our own interim choice, not a published score.
 */
public final class StoredPairs implements PairsBackend {
  /** Brute-force candidate search is quadratic; beyond this many images the stored neighbour graph is required. */
  static final int BRUTE_FORCE_LIMIT = 4000;
  private static final int NEIGHBOURS = 6;

  private final Library library;
  private final Supplier<StoredVectors> vectors;

  public StoredPairs(Library library, Supplier<StoredVectors> vectors) {
    this.library = library;
    this.vectors = vectors;
  }

  @Override
  public List<PairSuggestion> suggest(OptionalLong image, int limit, CancellationToken token) {
    Set<List<Long>> candidates = candidates(image, token);
    Map<Long, Optional<ImageAnalysis>> cache = new HashMap<>();
    List<PairSuggestion> result = new ArrayList<>();
    for (List<Long> pair : candidates) {
      token.throwIfCancelled();
      result.add(score(pair.get(0), pair.get(1), cache));
    }
    result.sort(Comparator.comparingDouble(PairSuggestion::score).reversed()
        .thenComparingLong(PairSuggestion::a).thenComparingLong(PairSuggestion::b));
    return result.size() > limit ? List.copyOf(result.subList(0, limit)) : result;
  }

  private Set<List<Long>> candidates(OptionalLong image, CancellationToken token) {
    Set<List<Long>> pairs = new LinkedHashSet<>();
    List<NeighbourStore.Link> links = library.neighbours().all();
    if (!links.isEmpty()) {
      for (NeighbourStore.Link l : links) {
        if (l.from() != l.to() && (image.isEmpty() || l.from() == image.getAsLong() || l.to() == image.getAsLong())) {
          pairs.add(List.of(Math.min(l.from(), l.to()), Math.max(l.from(), l.to())));
        }
      }
      return pairs;
    }
    StoredVectors all = vectors.get();
    if (image.isEmpty() && all.size() > BRUTE_FORCE_LIMIT) {
      throw new MorphscoutException("this catalog has " + all.size() + " images but no stored neighbour graph; "
          + "re-index it so that library-wide pair suggestions can be made");
    }
    List<Long> sources = new ArrayList<>();
    if (image.isPresent()) {
      sources.add(image.getAsLong());
    } else {
      all.all().forEach(v -> sources.add(v.imageId()));
    }
    VectorSimilarity search = new VectorSimilarity(() -> all);
    for (long id : sources) {
      token.throwIfCancelled();
      if (all.get(id).isEmpty()) {
        throw new MorphscoutException("image " + id + " has not been analysed yet, so no partners can be suggested");
      }
      for (Match m : search.similar(id, SimilarityMode.APPEARANCE, NEIGHBOURS, token)) {
        pairs.add(List.of(Math.min(id, m.id()), Math.max(id, m.id())));
      }
      for (Match m : search.similar(id, SimilarityMode.SHAPE, NEIGHBOURS, token)) {
        pairs.add(List.of(Math.min(id, m.id()), Math.max(id, m.id())));
      }
    }
    return pairs;
  }

  private PairSuggestion score(long a, long b, Map<Long, Optional<ImageAnalysis>> cache) {
    double[] d = vectors.get().distances(a, b);
    Optional<ImageAnalysis> fa = cache.computeIfAbsent(a, this::analysis);
    Optional<ImageAnalysis> fb = cache.computeIfAbsent(b, this::analysis);
    double iou = 0;
    double deltaE = 100;
    List<String> reasons = new ArrayList<>();
    if (fa.isPresent() && fb.isPresent()) {
      iou = MaskAligner.align(fa.get().silhouette().mask(), fb.get().silhouette().mask(), 96).iou();
      deltaE = deltaE76(fa.get().colour().foregroundMean(), fb.get().colour().foregroundMean());
      flagReasons("first", fa.get(), reasons);
      flagReasons("second", fb.get(), reasons);
    } else {
      reasons.add("features missing for one of the images");
    }
    double colourTerm = Double.isNaN(deltaE) ? 0.5 : 1 - Math.min(1, deltaE / 40);
    double score = clamp(0.3 * (1 - d[0]) + 0.2 * (1 - d[1]) + 0.35 * iou + 0.15 * colourTerm);
    if (iou < 0.5) {
      reasons.add(String.format("silhouettes overlap poorly after alignment (IoU %.2f)", iou));
    }
    if (deltaE > 25) {
      reasons.add(String.format("object colours are far apart (Delta E %.0f)", deltaE));
    }
    PairVerdict verdict = score < 0.45 || iou < 0.3 ? PairVerdict.FAIL
        : reasons.isEmpty() && score >= 0.6 ? PairVerdict.PASS : PairVerdict.WARN;
    Map<String, Double> components = new LinkedHashMap<>();
    components.put("appearance", d[0]);
    components.put("shape", d[1]);
    components.put("IoU", iou);
    components.put("ΔE76", deltaE);
    return new PairSuggestion(a, b, 100 * score, components, verdict, reasons);
  }

  private Optional<ImageAnalysis> analysis(long id) {
    return library.images().byId(id).flatMap(library.features()::load);
  }

  private static void flagReasons(String which, ImageAnalysis a, List<String> reasons) {
    for (ImageFlag f : CatalogFlags.of(a.silhouette())) {
      reasons.add("the " + which + " image: " + f.label());
    }
  }

  /** CIE76 colour difference (Euclidean distance in CIELAB); NaN when either mean is missing. */
  static double deltaE76(double[] x, double[] y) {
    if (x == null || y == null || x.length != 3 || y.length != 3) {
      return Double.NaN;
    }
    return Math.sqrt((x[0] - y[0]) * (x[0] - y[0]) + (x[1] - y[1]) * (x[1] - y[1]) + (x[2] - y[2]) * (x[2] - y[2]));
  }

  private static double clamp(double v) {
    return Math.max(0, Math.min(1, v));
  }
}
