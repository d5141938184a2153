package org.morphscout.indexer.warp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.geom.AffineTransform;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.silhouette.Mask;

class WarpEstimatorTest {
  private final WarpEstimator estimator = new WarpEstimator();

  @Test
  void identicalMasksNeedNoWarp() {
    Mask a = TestMasks.ellipse(120, 90, 60, 45, 30, 20);
    WarpResult r = estimator.estimate(a, a);
    assertThat(r.iouBefore()).isEqualTo(1.0);
    assertThat(r.iouAligned()).isGreaterThan(0.99);
    assertThat(r.iouWarped()).isGreaterThan(0.99);
    assertThat(r.meanDisplacement()).isLessThan(0.01);
    assertThat(r.foldFraction()).isZero();
  }

  @Test
  void theWarpImprovesOverlapBetweenDifferentShapes() {
    // Independent check: the warped overlap is measured by resampling B through the field, so a field that did not
    // match the shapes could not raise it.
    Mask a = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.vase(0.0),
        AffineTransform.getTranslateInstance(100, 100)));
    Mask b = TestMasks.draw(160, 240, TestMasks.transformed(TestMasks.vase(1.0),
        AffineTransform.getTranslateInstance(70, 110)));
    WarpResult r = estimator.estimate(a, b);
    assertThat(r.iouWarped()).isGreaterThan(r.iouAligned());
    assertThat(r.meanDisplacement()).isGreaterThan(0.005);
    assertThat(r.maxDisplacement()).isGreaterThanOrEqualTo(r.meanDisplacement());
    assertThat(r.foldFraction()).isBetween(0.0, 0.05);
  }

  @Test
  void effortGrowsWithTheShapeDifference() {
    Mask a = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.vase(0.0),
        AffineTransform.getTranslateInstance(100, 100)));
    double previous = -1;
    for (double t : new double[] {0.0, 0.5, 1.0}) {
      Mask b = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.vase(t),
          AffineTransform.getTranslateInstance(100, 100)));
      double effort = estimator.estimate(a, b).meanDisplacement();
      assertThat(effort).as("effort at t=%s", t).isGreaterThan(previous);
      previous = effort;
    }
  }

  @Test
  void emptyMaskIsRejected() {
    Mask a = TestMasks.ellipse(50, 50, 25, 25, 10, 10);
    assertThatThrownBy(() -> estimator.estimate(a, Mask.empty(50, 50)))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("empty");
  }

  @Test
  void preparedShapesGiveTheSameEstimate() {
    Mask a = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.vase(0.0),
        AffineTransform.getTranslateInstance(100, 100)));
    Mask b = TestMasks.draw(160, 240, TestMasks.transformed(TestMasks.vase(1.0),
        AffineTransform.getTranslateInstance(70, 110)));
    WarpShape sa = estimator.shape(a);
    WarpShape sb = estimator.shape(b);
    for (Mask[] pair : new Mask[][] {{a, b}, {b, a}, {a, a}}) {
      WarpResult plain = estimator.estimate(pair[0], pair[1]);
      WarpResult prepared = estimator.estimate(pair[0] == a ? sa : sb, pair[1] == a ? sa : sb);
      assertThat(prepared).usingRecursiveComparison().isEqualTo(plain);
    }
    assertThatThrownBy(() -> estimator.shape(Mask.empty(50, 50)))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("empty");
  }

  @Test
  void aShapePreparedForAnotherGridIsRefused() {
    Mask a = TestMasks.ellipse(120, 90, 60, 45, 30, 20);
    WarpShape coarse = new WarpEstimator(DemonsConfig.DEFAULT.withGridSize(32), true).shape(a);
    assertThatThrownBy(() -> estimator.estimate(coarse, estimator.shape(a)))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("32");
  }
}
