package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.Comparator;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The background model's parts on synthetic Lab planes with known answers. */
class BackgroundModelTest {
  private static final long SEED = 555L;

  @Test
  void robustSurfaceFollowsAGradientAndIgnoresAnObjectInTheBand() {
    int w = 120;
    int h = 90;
    float[][] lab = new float[3][w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        lab[0][i] = 40 + 0.3f * x + 0.2f * y; // a planar gradient in L*
        lab[1][i] = 5 - 0.05f * y;
        lab[2][i] = -3 + 0.04f * x;
      }
    }
    // An object touching the left edge: 10% of the band, far from the background colour.
    for (int y = 30; y < 50; y++) {
      for (int x = 0; x < 30; x++) {
        lab[0][y * w + x] = 20;
        lab[1][y * w + x] = 60;
        lab[2][y * w + x] = 40;
      }
    }
    BackgroundModel.Fit fit = BackgroundModel.fit(lab, w, h, BorderModelOptions.DEFAULTS);
    // Interior background pixels lie on the fitted surface; the object is far from it.
    assertThat(fit.distance()[60 * w + 80]).isLessThan(0.1f);
    assertThat(fit.distance()[40 * w + 10]).isGreaterThan(50f);
    assertThat(fit.spread()).isCloseTo(1.0, within(1e-9)); // clean band: the 1 Delta E floor
  }

  @Test
  void colourModesFindTwoBackgroundColoursAndDropARareOne() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    int n = 2000;
    float[][] lab = new float[3][n];
    for (int i = 0; i < n; i++) {
      double u = rnd.nextDouble();
      float[] c = u < 0.6 ? new float[] {90, 0, 5} : u < 0.95 ? new float[] {55, 10, 25} : new float[] {30, 50, 30};
      for (int k = 0; k < 3; k++) {
        lab[k][i] = c[k] + (float) rnd.nextGaussian();
      }
    }
    int[] band = new int[n];
    Arrays.setAll(band, i -> i);
    float[][] modes = ColourModes.of(lab, band, 3, 0.15);
    Arrays.sort(modes, Comparator.comparingDouble(m -> -m[0]));
    assertThat(modes).as("seed %d", SEED).hasNumberOfRows(2);
    assertThat(modes[0]).containsExactly(new float[] {90, 0, 5}, within(0.3f));
    assertThat(modes[1]).containsExactly(new float[] {55, 10, 25}, within(0.3f));
  }
}
