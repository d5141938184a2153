package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.geom.Rectangle2D;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.analysis.ImageAnalysis;

class NearDuplicatesTest {
  private static final long SEED = 20261201L;
  private final NearDuplicates dup = new NearDuplicates(NearDuplicateConfig.DEFAULTS, ColourDifference.cie76());

  @Test
  void slightlyPerturbedCopyIsADuplicate() {
    ImageAnalysis a = Analyses.builder(1).build();
    // A resized, recompressed copy: tiny appearance noise, 1 unit of colour drift, 1% larger pixels.
    ImageAnalysis b = Analyses.builder(2).size(320, 240)
        .appearance(Analyses.perturbed(Analyses.look(7), 0.02, SEED)).foreground(50.5, 10.5, 20.5).build();
    assertThat(dup.areDuplicates(a, b)).as("seed %s", SEED).isTrue();
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
}
