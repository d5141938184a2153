package org.morphscout.app.gui.service;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ChainCandidateTest {
  private static ChainStep step(long a, long b, double cost) {
    return new ChainStep(a, b, cost, Map.of());
  }

  @Test
  void equalStepsAreEven() {
    ChainCandidate c = ChainCandidate.of(List.of(1L, 2L, 3L), List.of(step(1, 2, 0.2), step(2, 3, 0.2)));
    assertThat(c.evenness()).isZero();
    assertThat(c.maxStep()).isEqualTo(0.2);
  }

  @Test
  void unevennessIsTheCoefficientOfVariation() {
    // steps 0.1 and 0.3: mean 0.2, population standard deviation 0.1, so CV = 0.5 (definition of the CV)
    ChainCandidate c = ChainCandidate.of(List.of(1L, 2L, 3L), List.of(step(1, 2, 0.1), step(2, 3, 0.3)));
    assertThat(c.evenness()).isCloseTo(0.5, within(1e-12));
    assertThat(c.maxStep()).isEqualTo(0.3);
  }
}
