package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The test helper {@link Spearman} against worked textbook examples. */
class SpearmanTest {

  @Test
  void wikipediaWorkedExampleIqVersusTelevision() {
    // Worked example of the Wikipedia article "Spearman's rank correlation coefficient" (section "Example"): IQ and
    // hours of television per week of ten people; sum of d^2 = 194, rho = 1 - 6 * 194 / (10 * (100 - 1)) = -29/165,
    // about -0.175757575 (from memory of the article; the arithmetic is checked here by the d^2 formula below).
    double[] iq = {106, 100, 86, 101, 99, 103, 97, 113, 112, 110};
    double[] tv = {7, 27, 2, 50, 28, 29, 20, 12, 6, 17};
    assertThat(Spearman.rho(iq, tv)).isCloseTo(-29.0 / 165.0, within(1e-12));
    double[] ri = Spearman.ranks(iq);
    double[] rt = Spearman.ranks(tv);
    double d2 = 0;
    for (int i = 0; i < iq.length; i++) {
      d2 += (ri[i] - rt[i]) * (ri[i] - rt[i]);
    }
    assertThat(d2).isEqualTo(194.0);
  }

  @Test
  void tiesTakeTheMeanRank() {
    // Ranks of (10, 20, 20, 30): the tied values share (2 + 3) / 2 = 2.5 (common practice, "fractional ranking").
    assertThat(Spearman.ranks(new double[] {30, 20, 10, 20})).containsExactly(4, 2.5, 1, 2.5);
  }

  @Test
  void monotoneSeriesGivePlusOrMinusOne() {
    double[] x = {0.1, 0.4, 0.5, 0.9, 2.0};
    assertThat(Spearman.rho(x, new double[] {1, 8, 27, 64, 125})).isCloseTo(1.0, within(1e-12));
    assertThat(Spearman.rho(x, new double[] {5, 4, 3, 2, 1})).isCloseTo(-1.0, within(1e-12));
  }
}
