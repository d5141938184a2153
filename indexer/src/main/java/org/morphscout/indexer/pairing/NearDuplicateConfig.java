package org.morphscout.indexer.pairing;

/**
 * When two analyses count as the same picture (resized, recompressed or lightly edited). All conditions must hold.
 * Immutable; validated on construction.
 *
 * @param minCosine smallest cosine of the appearance vectors, in [0, 1] (default 0.98; recompression and resizing
 *     keep learned embeddings within about 0.99, a different photo of the same object rarely exceeds 0.97)
 * @param maxShapeDistance largest Euclidean distance of the L2-normalised shape vectors, in [0, 2] (default 0.16, a shape cosine of 0.987: a light crop moves the outline a little)
 * @param maxDeltaE largest CIEDE2000 difference of the foreground means (default 4.0: a light exposure or colour edit
 *     moves it by 2-3; about 1 is a just noticeable difference)
 * @param maxAspectGap largest relative difference of the image aspect ratios, in [0, 1] (default 0.02)
 * @param maxBackgroundDeltaE largest CIEDE2000 difference of the background means (default 4.0): a global edit moves
 *     object and background alike, while a different photo usually has another backdrop
 * @param maxBackgroundStdGap largest difference of the background's L* standard deviation (default 1.5): the
 *     backdrop's texture survives resizing and light edits but differs between shots
 * @param maxObjectAspectGap largest relative difference of the objects' bounding-box aspect ratios, in [0, 1]
 *     (default 0.03, plus 4 pixels' worth of the smaller object's bounding box, since a small copy's outline is
 *     measured on fewer pixels): resizing, recompressing and cropping around the object keep it, while two similar
 *     objects (one vessel a little slimmer than the other) differ in it
 * @param minFingerprintCorrelation smallest normalised cross-correlation of the two
 *     {@link org.morphscout.indexer.analysis.PixelFingerprint}s, in [-1, 1] (default 0.996); ignored when either
 *     image has no fingerprint (features stored before catalog schema version 4). Measured with
 *     PixelFingerprintSeparationBenchmark on rendered test pictures (TestFamilies, seeds 8401, 7202, 8502, 1, 3, 4),
 *     counting only pairs that pass every other condition: edited copies (resize to 0.75/0.625/0.5/0.45, JPEG
 *     q0.60-0.92, PNG re-save, crop 3-4 % per side + brighten 5-6 %; 109 pairs) median 0.9994, 100 of 109 at or
 *     above 0.996 (101 at 0.995, 94 at 0.997), the tail down to 0.974 where a low-contrast object's silhouette, and
 *     with it the sampled window, shifts between copies; neighbouring members of vase-to-bottle and jug-to-bottle
 *     families t 1/7 apart (42 pairs) 0.987-0.9947, members t 0.2 apart (54 pairs) 0.973-0.991. 0.996 keeps every
 *     family member out with a little room; a copy whose window shifts a lot is then missed (it is listed as a pair
 *     instead), the safer of the two errors for a morph finder
 * @param maxCentroidOffset largest distance between the objects' centroids, in picture fractions (default 0.03):
 *     resizing, recompressing and light edits keep the object where it was in the frame (the demo's copies move it
 *     by at most 0.002), while a second shot from a slightly moved viewpoint shifts it (the demo's shelf views,
 *     0.055 between neighbours), and two such shots are not the same picture even when the object crops match
 */
public record NearDuplicateConfig(double minCosine, double maxShapeDistance, double maxDeltaE, double maxAspectGap,
    double maxBackgroundDeltaE, double maxBackgroundStdGap, double maxObjectAspectGap,
    double minFingerprintCorrelation, double maxCentroidOffset) {

  public static final NearDuplicateConfig DEFAULTS =
      new NearDuplicateConfig(0.98, 0.16, 4.0, 0.02, 4.0, 1.5, 0.03, 0.996, 0.03);

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
    if (!(maxBackgroundDeltaE >= 0) || !Double.isFinite(maxBackgroundDeltaE)) {
      throw new IllegalArgumentException("maxBackgroundDeltaE must be >= 0, got " + maxBackgroundDeltaE);
    }
    if (!(maxBackgroundStdGap >= 0) || !Double.isFinite(maxBackgroundStdGap)) {
      throw new IllegalArgumentException("maxBackgroundStdGap must be >= 0, got " + maxBackgroundStdGap);
    }
    if (!(maxObjectAspectGap >= 0 && maxObjectAspectGap <= 1)) {
      throw new IllegalArgumentException("maxObjectAspectGap must be in [0, 1], got " + maxObjectAspectGap);
    }
    if (!(maxAspectGap >= 0 && maxAspectGap <= 1)) {
      throw new IllegalArgumentException("maxAspectGap must be in [0, 1], got " + maxAspectGap);
    }
    if (!(maxCentroidOffset >= 0 && maxCentroidOffset <= 2)) {
      throw new IllegalArgumentException("maxCentroidOffset must be in [0, 2], got " + maxCentroidOffset);
    }
    if (!(minFingerprintCorrelation >= -1 && minFingerprintCorrelation <= 1)) {
      throw new IllegalArgumentException(
          "minFingerprintCorrelation must be in [-1, 1], got " + minFingerprintCorrelation);
    }
  }

  /** These settings with some replaced ({@code minCosine=0.99}). */
  public NearDuplicateConfig withOverrides(java.util.Map<String, String> overrides) {
    return RecordSettings.apply(this, overrides, "command-line options");
  }
}
