package org.morphscout.indexer.pairing;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.warp.WarpResult;

/**
 * How well the first picture morphs into the second.
 *
 * @param score 0..100, higher is better
 * @param verdict pass, warn or fail from the score thresholds and framing faults
 * @param components sub-scores in [0, 1] (1 best), keyed by {@link PairComponent#key()} in the components' order (a
 *     sub-score whose inputs are missing, e.g. no colour statistics, is left out)
 * @param measures the raw measures behind them: each component's {@link PairComponent#measure()} in the same
 *     order, then iouBefore, warpedIou, maxDisplacement and exposureGap (missing ones left out)
 * @param reasons plain-language findings for a photographer, most important first; empty for a clean pair
 * @param warp the warp between the silhouettes; empty when either image has no silhouette
 */
public record PairScore(
    double score,
    Verdict verdict,
    Map<String, Double> components,
    Map<String, Double> measures,
    List<String> reasons,
    Optional<WarpResult> warp) {

  public PairScore {
    if (!(score >= 0 && score <= 100)) {
      throw new IllegalArgumentException("score must be in [0, 100], got " + score);
    }
    components = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(components));
    measures = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(measures));
    reasons = List.copyOf(reasons);
  }
}
