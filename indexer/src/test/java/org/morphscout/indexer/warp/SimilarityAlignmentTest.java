package org.morphscout.indexer.warp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.NoninvertibleTransformException;
import java.awt.geom.Point2D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.morphscout.indexer.silhouette.Mask;

class SimilarityAlignmentTest {

  @ParameterizedTest(name = "scale {0}, rotation {1} deg, mirror {2}")
  @CsvSource({"1.0, 0, false", "1.5, 40, false", "0.7, -120, false", "1.3, 75, true", "0.8, 180, true"})
  void recoversAKnownSimilarity(double scale, double degrees, boolean mirror)
      throws NoninvertibleTransformException {
    // Ground truth by construction: B is A's outline drawn through a known similarity; the recovered transform
    // (B -> A) must send B's points back onto A's (moment-based alignment is exact up to pixel sampling).
    AffineTransform toA = AffineTransform.getTranslateInstance(120, 100);
    AffineTransform toB = new AffineTransform();
    toB.translate(150, 140);
    toB.rotate(Math.toRadians(degrees));
    toB.scale(scale, scale);
    if (mirror) {
      toB.scale(-1, 1);
    }
    Shape boot = TestMasks.boot();
    Mask a = TestMasks.draw(240, 200, toA.createTransformedShape(boot));
    Mask b = TestMasks.draw(300, 280, toB.createTransformedShape(boot));

    Alignment al = new SimilarityAlignment(64, true, 0.15).align(a, b);
    Similarity sim = al.similarity();

    assertThat(sim.mirror()).isEqualTo(mirror);
    assertThat(sim.scale()).isCloseTo(1 / scale, within(0.03 / scale));
    AffineTransform aToB = new AffineTransform(toB);
    aToB.concatenate(toA.createInverse());
    for (double[] p : new double[][] {{100, 50}, {130, 50}, {165, 125}, {100, 145}, {110, 100}}) {
      Point2D pb = aToB.transform(new Point2D.Double(p[0], p[1]), null);
      double[] back = sim.apply(pb.getX(), pb.getY());
      assertThat(Math.hypot(back[0] - p[0], back[1] - p[1]))
          .as("point %s,%s maps back", p[0], p[1]).isLessThan(3.0);
    }
    assertThat(al.iou()).isGreaterThan(0.85);
  }

  @Test
  void withoutMirroringAFlippedShapeAlignsWorse() {
    AffineTransform flip = AffineTransform.getTranslateInstance(100, 100);
    flip.scale(-1, 1);
    Mask a = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.boot(),
        AffineTransform.getTranslateInstance(100, 100)));
    Mask b = TestMasks.draw(200, 200, TestMasks.transformed(TestMasks.boot(), flip));
    double withMirror = new SimilarityAlignment(64, true, 0.15).align(a, b).iou();
    double without = new SimilarityAlignment(64, false, 0.15).align(a, b).iou();
    assertThat(withMirror).isGreaterThan(0.9);
    assertThat(without).isLessThan(withMirror - 0.1);
  }

  @Test
  void forAMorphATallShapeIsNotLaidOnItsSideToMatchAWideOne() {
    // A wide ellipse (a bowl's outline) and the same ellipse standing (a bottle's): principal axes 90 degrees apart.
    // Without a limit the turned candidate overlaps best; with the morph limit (45 degrees) B stays upright.
    Mask wide = TestMasks.draw(200, 200, new java.awt.geom.Ellipse2D.Double(30, 72, 140, 56));
    Mask tall = TestMasks.draw(200, 200, new java.awt.geom.Ellipse2D.Double(72, 30, 56, 140));
    Alignment free = new SimilarityAlignment(64, true, 0.15).align(wide, tall);
    Alignment morph = new SimilarityAlignment(64, true, 0.15, SimilarityAlignment.MORPH_MAX_ROTATION)
        .align(wide, tall);
    assertThat(Math.abs(Math.abs(free.similarity().rotation()) - Math.PI / 2)).isLessThan(0.05);
    assertThat(free.iou()).isGreaterThan(0.9);
    assertThat(Math.abs(morph.similarity().rotation())).isLessThanOrEqualTo(SimilarityAlignment.MORPH_MAX_ROTATION);
    assertThat(morph.iou()).isLessThan(free.iou() - 0.2);
  }

  @Test
  void aTiltedShotIsStillStraightenedWithinTheMorphLimit() {
    // The boot outline turned by 25 degrees (a tilted shot): within the limit, so the turn is recovered.
    Mask a = TestMasks.draw(240, 240, TestMasks.transformed(TestMasks.boot(),
        AffineTransform.getTranslateInstance(120, 120)));
    AffineTransform tilt = AffineTransform.getTranslateInstance(120, 120);
    tilt.rotate(Math.toRadians(25));
    Mask b = TestMasks.draw(240, 240, TestMasks.transformed(TestMasks.boot(), tilt));
    Alignment al = new SimilarityAlignment(64, true, 0.15, SimilarityAlignment.MORPH_MAX_ROTATION).align(a, b);
    assertThat(Math.toDegrees(al.similarity().rotation())).isCloseTo(-25, within(3.0));
    assertThat(al.iou()).isGreaterThan(0.85);
  }

  @Test
  void theRotationLimitIsValidated() {
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> new SimilarityAlignment(64, true, 0.15, 4.0))
        .hasMessageContaining("rotation");
  }

  @Test
  void similarityInverseUndoesApply() {
    Similarity s = Similarity.through(1.7, 2.2, true, 10, 20, 50, 60);
    double[] p = s.apply(13, -4);
    double[] q = s.applyInverse(p[0], p[1]);
    assertThat(q[0]).isCloseTo(13, within(1e-9));
    assertThat(q[1]).isCloseTo(-4, within(1e-9));
    double[] c = s.apply(10, 20);
    assertThat(c[0]).isCloseTo(50, within(1e-9));
    assertThat(c[1]).isCloseTo(60, within(1e-9));
  }
}
