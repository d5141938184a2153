package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.geom.Rectangle2D;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.PixelFingerprint;
import org.morphscout.indexer.feature.Ciede2000;

class NearDuplicatesTest {
  private static final long SEED = 20261201L;
  private final NearDuplicates dup = new NearDuplicates(NearDuplicateConfig.DEFAULTS, Ciede2000::difference);

  @Test
  void slightlyPerturbedCopyIsADuplicate() {
    ImageAnalysis a = Analyses.builder(1).build();
    // A resized, recompressed copy: tiny appearance noise, 1 unit of colour drift, 1% larger pixels.
    ImageAnalysis b = Analyses.builder(2).size(320, 240)
        .appearance(Analyses.perturbed(Analyses.look(7), 0.02, SEED)).foreground(50.5, 10.5, 20.5).build();
    assertThat(dup.areDuplicates(a, b)).as("seed %s", SEED).isTrue();
  }

  @Test
  void theSameObjectElsewhereInTheFrameIsAnotherShotNotACopy() {
    // A viewpoint moved sideways: the object matches to the pixel but sits 5 % of the width further right.
    ImageAnalysis a = Analyses.builder(1).build();
    ImageAnalysis moved = Analyses.builder(2).shift(0.05, 0).build();
    assertThat(dup.areDuplicates(a, Analyses.builder(3).build())).as("unmoved copy").isTrue();
    assertThat(dup.areDuplicates(a, moved)).isFalse();
    // Within the limit (1 % of the width) it still counts as the same picture.
    assertThat(dup.areDuplicates(a, Analyses.builder(4).shift(0.01, 0).build())).isTrue();
  }

  @Test
  void differentShapesAreNotDuplicates() {
    ImageAnalysis a = Analyses.builder(1).build();
    ImageAnalysis b = Analyses.builder(2).object(new Rectangle2D.Double(-10, -40, 20, 80)).build();
    assertThat(dup.areDuplicates(a, b)).isFalse();
  }

  @Test
  void eachConditionCanRuleOut() {
    ImageAnalysis a = Analyses.builder(1).build();
    assertThat(dup.areDuplicates(a, Analyses.builder(2).appearance(Analyses.look(99)).build())).isFalse();
    assertThat(dup.areDuplicates(a, Analyses.builder(2).foreground(55, 10, 20).build())).isFalse();
    assertThat(dup.areDuplicates(a, Analyses.builder(2).size(640, 500).build())).isFalse();
  }

  @Test
  void identicalHashesAreDuplicates() {
    ImageAnalysis a = Analyses.builder(1).hash("ab12").build();
    ImageAnalysis b = Analyses.builder(2).hash("ab12").appearance(Analyses.look(3)).build();
    assertThat(dup.areDuplicates(a, b)).isTrue();
  }

  /** A fingerprint, and one correlating with it at about {@code r} (mixed with independent noise). */
  private static float[][] fingerprints(double r, long seed) {
    SplittableRandom rnd = new SplittableRandom(seed);
    float[] x = new float[PixelFingerprint.LENGTH];
    float[] y = new float[x.length];
    for (int i = 0; i < x.length; i++) {
      x[i] = (float) (rnd.nextDouble() - 0.5);
      // For independent, equal-variance x and e, corr(x, r x + sqrt(1 - r^2) e) = r (definition of Pearson's r).
      y[i] = (float) (r * x[i] + Math.sqrt(1 - r * r) * (rnd.nextDouble() - 0.5));
    }
    return new float[][] {x, y}; // correlation() recentres and rescales: no need to z-normalise here
  }

  @Test
  void fingerprintsMustCorrelateWhenBothAreKnown() {
    float[][] close = fingerprints(0.999, SEED);
    float[][] apart = fingerprints(0.95, SEED);
    ImageAnalysis a = Analyses.builder(1).fingerprint(close[0]).build();
    ImageAnalysis copy = Analyses.builder(2).fingerprint(close[1]).build();
    assertThat(PixelFingerprint.correlation(close[0], close[1])).as("seed %d", SEED)
        .isGreaterThan(NearDuplicateConfig.DEFAULTS.minFingerprintCorrelation());
    assertThat(dup.areDuplicates(a, copy)).as("seed %d", SEED).isTrue();
    // Everything else alike, but the pixels disagree: another shot (a neighbouring member of a family).
    ImageAnalysis other = Analyses.builder(2).fingerprint(apart[1]).build();
    ImageAnalysis first = Analyses.builder(1).fingerprint(apart[0]).build();
    assertThat(PixelFingerprint.correlation(apart[0], apart[1])).as("seed %d", SEED)
        .isLessThan(NearDuplicateConfig.DEFAULTS.minFingerprintCorrelation());
    assertThat(dup.areDuplicates(first, other)).as("seed %d", SEED).isFalse();
    // Identical bytes stay duplicates whatever the fingerprints say.
    assertThat(dup.areDuplicates(Analyses.builder(1).hash("cd34").fingerprint(apart[0]).build(),
        Analyses.builder(2).hash("cd34").fingerprint(apart[1]).build())).isTrue();
  }

  @Test
  void withoutAFingerprintTheOtherEvidenceDecidesAsBefore() {
    float[][] apart = fingerprints(0.5, SEED + 1);
    ImageAnalysis known = Analyses.builder(1).fingerprint(apart[0]).build();
    ImageAnalysis unknown = Analyses.builder(2).build(); // stored before fingerprints existed
    assertThat(unknown.fingerprint()).isNull();
    assertThat(dup.areDuplicates(known, unknown)).isTrue();
    assertThat(dup.areDuplicates(unknown, known)).isTrue();
    ImageAnalysis otherShape = Analyses.builder(2).object(new Rectangle2D.Double(-10, -40, 20, 80)).build();
    assertThat(dup.areDuplicates(known, otherShape)).isFalse();
  }

  @Test
  void fingerprintThresholdIsValidatedAndCanBeOverridden() {
    NearDuplicateConfig strict =
        NearDuplicateConfig.DEFAULTS.withOverrides(Map.of("minFingerprintCorrelation", "0.9999"));
    assertThat(strict.minFingerprintCorrelation()).isEqualTo(0.9999);
    assertThat(strict.minCosine()).isEqualTo(NearDuplicateConfig.DEFAULTS.minCosine());
    float[][] close = fingerprints(0.999, SEED + 2);
    NearDuplicates strictDup = new NearDuplicates(strict, Ciede2000::difference);
    assertThat(strictDup.areDuplicates(Analyses.builder(1).fingerprint(close[0]).build(),
        Analyses.builder(2).fingerprint(close[1]).build())).as("seed %d", SEED + 2).isFalse();
    assertThatThrownBy(() -> NearDuplicateConfig.DEFAULTS.withOverrides(Map.of("minFingerprintCorrelation", "1.5")))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("minFingerprintCorrelation");
  }
}
