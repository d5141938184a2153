package org.morphscout.app.gui.service;

import java.util.List;
import java.util.Map;

/**
 * A scored pair of catalog images.
 *
 * @param a smaller image id
 * @param b larger image id
 * @param score morph-friendliness in [0, 1], higher is better
 * @param components the named parts of the score (names are shown as column headers), insertion-ordered
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
