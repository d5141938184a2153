package org.morphscout.indexer.warp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class DisplacementFieldTest {
  private static final int N = 32;

  @Test
  void jacobianOfAnAffineFieldEqualsItsAnalyticValue() {
    // Analytic: x -> A x + c with A = [[a, b], [c, d]] has Jacobian determinant ad - bc everywhere; finite
    // differences (central or one-sided) are exact for an affine field.
    double a = 1.2;
    double b = 0.3;
    double c = -0.4;
    double d = 0.7;
    float[] ux = new float[N * N];
    float[] uy = new float[N * N];
    for (int y = 0; y < N; y++) {
      for (int x = 0; x < N; x++) {
        ux[y * N + x] = (float) ((a - 1) * x + b * y + 2);
        uy[y * N + x] = (float) (c * x + (d - 1) * y - 1);
      }
    }
    float[] det = new DisplacementField(N, N, ux, uy).jacobianDeterminant();
    for (float v : det) {
      assertThat((double) v).isCloseTo(a * d - b * c, within(1e-4));
    }
  }

  @Test
  void aFoldingFieldIsDetectedAndASmoothOneIsNot() {
    // A Gaussian bump pushing x towards the centre: dux/dx at the centre is -amplitude, so the determinant there is
    // 1 - amplitude (analytic); amplitude 2 folds, amplitude 0.3 does not.
    float[] all = new float[N * N];
    Arrays.fill(all, 1f);
    assertThat(bump(2.0).foldFraction(all)).isGreaterThan(0);
    assertThat(bump(0.3).foldFraction(all)).isZero();
    assertThat((double) bump(2.0).jacobianDeterminant()[16 * N + 16]).isCloseTo(1 - 2.0, within(0.05));
  }

  @Test
  void composeWithZeroIsIdentityAndTranslationsAdd() {
    DisplacementField t1 = constant(1.5f, -0.5f);
    DisplacementField t2 = constant(-0.25f, 2f);
    DisplacementField sum = t1.compose(t2);
    assertThat(sum.sampleDx(10, 10)).isCloseTo(1.25f, within(1e-5f));
    assertThat(sum.sampleDy(10, 10)).isCloseTo(1.5f, within(1e-5f));
    DisplacementField same = bump(0.5).compose(DisplacementField.zero(N, N));
    assertThat(same.dx()).containsExactly(bump(0.5).dx(), within(1e-7f));
  }

  private static DisplacementField constant(float vx, float vy) {
    float[] ux = new float[N * N];
    float[] uy = new float[N * N];
    Arrays.fill(ux, vx);
    Arrays.fill(uy, vy);
    return new DisplacementField(N, N, ux, uy);
  }

  private static DisplacementField bump(double amplitude) {
    float[] ux = new float[N * N];
    float[] uy = new float[N * N];
    double sigma = 5;
    for (int y = 0; y < N; y++) {
      for (int x = 0; x < N; x++) {
        double r2 = (x - 16) * (x - 16) + (y - 16) * (y - 16);
        ux[y * N + x] = (float) (-amplitude * (x - 16) * Math.exp(-r2 / (2 * sigma * sigma)));
      }
    }
    return new DisplacementField(N, N, ux, uy);
  }
}
