package org.morphscout.indexer.pairing;

/**
 * When two analyses count as the same picture (resized, recompressed or lightly edited). All conditions must hold.
 * Immutable; validated on construction.
 *
 * @param minCosine smallest cosine of the appearance vectors, in [0, 1] (default 0.98; recompression and resizing
 *     keep learned embeddings within about 0.99, a different photo of the same object rarely exceeds 0.97)
 * @param maxShapeDistance largest Euclidean distance of the L2-normalised shape vectors, in [0, 2] (default 0.1)
 * @param maxDeltaE largest colour difference of the foreground means (default 2.0, about a just noticeable
 *     difference)
 * @param maxAspectGap largest relative difference of the image aspect ratios, in [0, 1] (default 0.02)
 */
public record NearDuplicateConfig(double minCosine, double maxShapeDistance, double maxDeltaE, double maxAspectGap) {

  public static final NearDuplicateConfig DEFAULTS = new NearDuplicateConfig(0.98, 0.1, 2.0, 0.02);

  public NearDuplicateConfig {
    if (!(minCosine >= 0 && minCosine <= 1)) {
      throw new IllegalArgumentException("minCosine must be in [0, 1], got " + minCosine);
    }
    if (!(maxShapeDistance >= 0 && maxShapeDistance <= 2)) {
      throw new IllegalArgumentException("maxShapeDistance must be in [0, 2], got " + maxShapeDistance);
    }
    if (!(maxDeltaE >= 0) || !Double.isFinite(maxDeltaE)) {
      throw new IllegalArgumentException("maxDeltaE must be >= 0, got " + maxDeltaE);
    }
    if (!(maxAspectGap >= 0 && maxAspectGap <= 1)) {
      throw new IllegalArgumentException("maxAspectGap must be in [0, 1], got " + maxAspectGap);
    }
  }

  /** These settings with some replaced ({@code minCosine=0.99}). */
  public NearDuplicateConfig withOverrides(java.util.Map<String, String> overrides) {
    return RecordSettings.apply(this, overrides, "command-line options");
  }
}
