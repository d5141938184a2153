package org.morphscout.app.gui.service;

import java.util.List;
import java.util.Map;

/**
 * A scored pair of catalog images.
 *
 * @param a first image id (the query image when partners of one image were asked for)
 * @param b second image id
 * @param score morph-friendliness in [0, 100], higher is better (the scale the command line prints)
 * @param components the named parts of the score (names are shown as column headers), insertion-ordered; NaN when
 *     a part could not be measured
 * @param reasons plain sentences explaining a WARN or FAIL (empty for a clean PASS)
 */
public record PairSuggestion(long a, long b, double score, Map<String, Double> components, PairVerdict verdict,
    List<String> reasons) {
  public PairSuggestion {
    if (a == b) {
      throw new IllegalArgumentException("a pair needs two different images");
    }
    components = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(components));
    reasons = List.copyOf(reasons);
  }
}
