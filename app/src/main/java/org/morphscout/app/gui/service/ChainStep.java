package org.morphscout.app.gui.service;

import java.util.Map;

/**
 * One link of a chain.
 *
 * @param cost the step's size with the request's weighting, in [0, 2]; smaller is smoother
 * @param components named parts of the cost (appearance and shape distance, colour gap ...), insertion-ordered
 */
public record ChainStep(long from, long to, double cost, Map<String, Double> components) {
  public ChainStep {
    components = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(components));
  }
}
