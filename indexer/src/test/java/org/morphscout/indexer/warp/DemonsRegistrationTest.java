package org.morphscout.indexer.warp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class DemonsRegistrationTest {
  private static final int N = 64;
  private final DemonsRegistration demons = new DemonsRegistration(DemonsConfig.DEFAULT);

  @Test
  void recoversTheShiftOfADisc() {
    // Definition of the field (moving(x + u) = fixed(x)): a moving disc shifted by d gives u = d inside the disc.
    // Common practice: a registration must recover a pure translation. The half-pixel tolerance is our own bar.
    double[][] shifts = {{3, -2}, {-4.5, 1.5}, {0, 5}};
    for (double[] d : shifts) {
      float[] fixed = TestMasks.disc(N, 31.5, 31.5, 12);
      float[] moving = TestMasks.disc(N, 31.5 + d[0], 31.5 + d[1], 12);
      DisplacementField u = demons.register(fixed, moving);
      double[] mean = meanInside(u, fixed);
      assertThat(mean[0]).as("mean dx for shift %s,%s", d[0], d[1]).isCloseTo(d[0], within(0.5));
      assertThat(mean[1]).as("mean dy for shift %s,%s", d[0], d[1]).isCloseTo(d[1], within(0.5));
    }
  }

  @Test
  void identicalMasksGiveANearZeroField() {
    float[] disc = TestMasks.ellipseGrid(N, 30, 34, 18, 11);
    DisplacementField u = demons.register(disc, disc.clone());
    assertThat(u.maxLength()).isLessThan(0.05);
  }

  @Test
  void discAgainstEllipseGivesTheRadialPattern() {
    // Geometry: to turn a disc of radius 16 into an ellipse with semi-axes 22 (x) and 12 (y), points on the disc
    // must move outward along the ellipse's major axis and inward along its minor axis.
    float[] disc = TestMasks.disc(N, 31.5, 31.5, 16);
    float[] ellipse = TestMasks.ellipseGrid(N, 31.5, 31.5, 22, 12);
    DisplacementField u = demons.register(disc, ellipse);
    int c = 31;
    assertThat(u.sampleDx(c + 15, c)).as("right end moves right").isGreaterThan(2f);
    assertThat(u.sampleDx(c - 14, c)).as("left end moves left").isLessThan(-2f);
    assertThat(u.sampleDy(c, c + 15)).as("bottom moves up").isLessThan(-1.5f);
    assertThat(u.sampleDy(c, c - 14)).as("top moves down").isGreaterThan(1.5f);
    // The warp must actually improve the overlap (checked independently of the field's pattern).
    float[] warped = new float[N * N];
    for (int y = 0; y < N; y++) {
      for (int x = 0; x < N; x++) {
        int i = y * N + x;
        warped[i] = Grids.bilinear(ellipse, N, N, x + u.dx()[i], y + u.dy()[i]);
      }
    }
    assertThat(Grids.iou(disc, warped)).isGreaterThan(Grids.iou(disc, ellipse) + 0.1);
  }

  @Test
  void upsampleDoublesAConstantField() {
    float[] u = new float[16];
    java.util.Arrays.fill(u, 1.25f);
    float[] up = DemonsRegistration.upsample(u, 4);
    assertThat(up).hasSize(64).containsOnly(2.5f);
  }

  @Test
  void configRejectsBadValues() {
    assertThatThrownBy(() -> new DemonsConfig(66, 3, List.of(1, 1, 1), 1, 1, 2))
        .hasMessageContaining("divisible");
    assertThatThrownBy(() -> new DemonsConfig(64, 3, List.of(1, 1), 1, 1, 2)).hasMessageContaining("per level");
    assertThatThrownBy(() -> new DemonsConfig(64, 3, List.of(1, 1, 1), -1, 1, 2)).hasMessageContaining("sigma");
    assertThatThrownBy(() -> new DemonsConfig(64, 3, List.of(1, 1, 1), 1, 1, 0)).hasMessageContaining("max step");
    assertThatThrownBy(() -> new DemonsConfig(64, 0, List.of(), 1, 1, 2)).hasMessageContaining("levels");
  }

  private static double[] meanInside(DisplacementField u, float[] region) {
    double sx = 0;
    double sy = 0;
    int n = 0;
    for (int i = 0; i < region.length; i++) {
      if (region[i] >= 0.5f) {
        sx += u.dx()[i];
        sy += u.dy()[i];
        n++;
      }
    }
    return new double[] {sx / n, sy / n};
  }
}
