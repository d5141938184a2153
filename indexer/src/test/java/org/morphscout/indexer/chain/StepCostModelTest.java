package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class StepCostModelTest {

  @Test
  void mixesComponentsLinearlyByShapeWeight() {
    StepCostModel m = new StepCostModel(0.25, 0.5, 1.0, 50);
    // 0.75 * 0.4 / 0.5 + 0.25 * 0.2 + 1.0 * 25 / 50 = 0.6 + 0.05 + 0.5
    assertThat(m.cost(0.4, 0.2, 25)).isCloseTo(1.15, within(1e-12));
    assertThat(StepCostModel.withShapeWeight(0).cost(0.3, 0.9, 99)).isCloseTo(0.3, within(1e-12));
    assertThat(StepCostModel.withShapeWeight(1).cost(0.3, 0.9, 99)).isCloseTo(0.9, within(1e-12));
  }

  @Test
  void mixFillsTheMixedCost() {
    StepCost c = StepCostModel.DEFAULT.mix(0.4, 0.2, 5);
    assertThat(c.mixedCost()).isCloseTo(0.3, within(1e-12));
    Edge e = new Edge(1, 2, c.mixedCost(), c).reweighted(StepCostModel.withShapeWeight(1));
    assertThat(e.cost()).isCloseTo(0.2, within(1e-12));
  }

  @Test
  void rejectsOutOfRangeValues() {
    assertThatThrownBy(() -> StepCostModel.withShapeWeight(1.2)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new StepCostModel(0.5, 0, 0, 50)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> StepCost.of(2.5, 0, 0)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> StepCost.of(0.1, -0.1, 0)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> StepCost.of(0.1, 0.1, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
  }
}
