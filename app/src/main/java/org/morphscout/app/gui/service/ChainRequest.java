package org.morphscout.app.gui.service;

import java.util.Set;

/**
 * What to search for between two endpoints.
 *
 * @param alternatives how many different chains to return, 1..20 (default 3)
 * @param minSteps fewest steps (links) a chain may have, 1..maxSteps (default 2)
 * @param maxSteps most steps a chain may have, up to 50 (default 8)
 * @param shapeWeight 0 = only appearance counts, 1 = only shape counts (default 0.5)
 * @param avoid images no chain may pass through
 * @param require images every chain must pass through
 */
public record ChainRequest(int alternatives, int minSteps, int maxSteps, double shapeWeight, Set<Long> avoid,
    Set<Long> require) {
  public static final ChainRequest DEFAULTS = new ChainRequest(3, 2, 8, 0.5, Set.of(), Set.of());

  public ChainRequest {
    if (alternatives < 1 || alternatives > 20) {
      throw new IllegalArgumentException("alternatives must be 1..20, got " + alternatives);
    }
    if (minSteps < 1 || maxSteps < minSteps || maxSteps > 50) {
      throw new IllegalArgumentException("steps must satisfy 1 <= min <= max <= 50, got " + minSteps + ".." + maxSteps);
    }
    if (!(shapeWeight >= 0 && shapeWeight <= 1)) {
      throw new IllegalArgumentException("shape weight must be in [0, 1], got " + shapeWeight);
    }
    avoid = Set.copyOf(avoid);
    require = Set.copyOf(require);
    for (Long id : require) {
      if (avoid.contains(id)) {
        throw new IllegalArgumentException("image " + id + " cannot be both avoided and required");
      }
    }
  }
}
