package org.morphscout.demo;

import java.util.List;

/**
 * Pictures among which some pairs were planted as the most compatible: each planted pair shows almost the same
 * vessel (profile varied by about 2 %, glaze colour shifted slightly) on the same backdrop, while every other
 * picture has a different archetype, glaze and backdrop.
 *
 * @param images all pictures, planted and others, in a seeded shuffled order
 * @param pairs the planted pairs as indices into {@code images}, each with {@code first < second}
 */
public record PlantedPairs(List<DemoImage> images, List<Pair> pairs) {
  public PlantedPairs {
    images = List.copyOf(images);
    pairs = List.copyOf(pairs);
  }

  /** Indices of a planted pair, {@code first < second}. */
  public record Pair(int first, int second) {
    public Pair {
      if (first < 0 || second <= first) {
        throw new IllegalArgumentException("pair needs 0 <= first < second: " + first + ", " + second);
      }
    }
  }
}
