package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import org.junit.jupiter.api.Test;

/** Shape descriptors: exact geometry on rectangles, and the invariances the shape vector promises. */
class ShapeDescriptorsTest {
  private static final int W = 768;
  private static final int H = 576;
  private final ShapeDescriptors plain = new ShapeDescriptors();

  /** An L-shaped outline (no mirror symmetry), height 2 * s, centred on (cx, cy). */
  private static Shape ell(double cx, double cy, double s) {
    Path2D.Double p = new Path2D.Double();
    p.moveTo(-0.5 * s, -s);
    p.lineTo(0, -s);
    p.lineTo(0, 0.6 * s);
    p.lineTo(0.6 * s, 0.6 * s);
    p.lineTo(0.6 * s, s);
    p.lineTo(-0.5 * s, s);
    p.closePath();
    return AffineTransform.getTranslateInstance(cx, cy).createTransformedShape(p);
  }

  private float[] vector(ShapeDescriptors d, Shape s) {
    return d.describe(Scenes.mask(W, H, s)).shapeVector();
  }

  @Test
  void rectangleGeometryIsExact() {
    // Pixels 100..299 x 50..149 (200 x 100) in a 400 x 300 mask.
    ShapeDescriptor d = plain.describe(Scenes.mask(400, 300, new Rectangle2D.Double(100, 50, 200, 100)));
    assertThat(d.bboxX()).isCloseTo(0.25, within(1e-12));
    assertThat(d.bboxY()).isCloseTo(50 / 300.0, within(1e-12));
    assertThat(d.bboxW()).isCloseTo(0.5, within(1e-12));
    assertThat(d.bboxH()).isCloseTo(100 / 300.0, within(1e-12));
    assertThat(d.aspect()).isCloseTo(2.0, within(1e-12));
    assertThat(d.areaFraction()).isCloseTo(20000 / 120000.0, within(1e-12));
    assertThat(d.centroidX()).isCloseTo(0.5, within(1e-12));
    assertThat(d.centroidY()).isCloseTo(100 / 300.0, within(1e-12));
    assertThat(d.orientation()).isCloseTo(0.0, within(1e-9));
    assertThat(d.hu()[0]).isCloseTo(0.208333, within(1e-5)); // see HuMomentsTest for the derivation
    assertThat(d.shapeVector()).hasSize(1024);
    double norm = 0;
    for (float v : d.shapeVector()) {
      norm += v * v;
    }
    assertThat(norm).isCloseTo(1.0, within(1e-5));
  }

  @Test
  void orientationFollowsTheLongAxis() {
    // Scenes' ellipse is turned by +25 degrees (x towards y, image coordinates): the principal axis angle.
    ShapeDescriptor d = plain.describe(Scenes.mask(W, H, Scenes.shape(Scenes.ShapeKind.ELLIPSE, 384, 288, 150)));
    assertThat(d.orientation()).isCloseTo(Math.toRadians(25), within(0.01));
    ShapeDescriptor tall = plain.describe(Scenes.mask(W, H, new Rectangle2D.Double(300, 100, 100, 300)));
    assertThat(Math.abs(tall.orientation())).isCloseTo(Math.PI / 2, within(1e-9));
  }

  @Test
  void vectorIsInvariantToTranslationAndScaleButTellsShapesApart() {
    for (Scenes.ShapeKind kind : Scenes.ShapeKind.values()) {
      float[] a = vector(plain, Scenes.shape(kind, 300, 260, 160));
      float[] b = vector(plain, Scenes.shape(kind, 520, 330, 95));
      double same = ShapeDescriptors.cosine(a, b);
      assertThat(same).as(kind.toString()).isGreaterThan(0.98);
      for (Scenes.ShapeKind other : Scenes.ShapeKind.values()) {
        if (other != kind) {
          double diff = ShapeDescriptors.cosine(a, vector(plain, Scenes.shape(other, 384, 288, 130)));
          assertThat(diff).as(kind + " vs " + other).isLessThan(same - 0.02);
        }
      }
    }
  }

  @Test
  void mirrorCanonicalisationMakesMirrorImagesEqual() {
    Shape s = ell(384, 288, 180);
    Shape mirrored = new AffineTransform(-1, 0, 0, 1, 2 * 384, 0).createTransformedShape(s);
    double without = ShapeDescriptors.cosine(vector(plain, s), vector(plain, mirrored));
    ShapeDescriptors canonical = new ShapeDescriptors(new ShapeVectorOptions(32, false, true, 1.0));
    double with = ShapeDescriptors.cosine(vector(canonical, s), vector(canonical, mirrored));
    assertThat(with).isGreaterThan(0.99);
    assertThat(without).isLessThan(0.9);
  }

  @Test
  void principalAxisRotationMakesRotatedCopiesEqual() {
    Shape s = ell(384, 288, 170);
    Shape turned = AffineTransform.getRotateInstance(Math.toRadians(50), 384, 288).createTransformedShape(s);
    double without = ShapeDescriptors.cosine(vector(plain, s), vector(plain, turned));
    ShapeDescriptors rotating = new ShapeDescriptors(new ShapeVectorOptions(32, true, false, 1.0));
    double with = ShapeDescriptors.cosine(vector(rotating, s), vector(rotating, turned));
    assertThat(with).isGreaterThan(0.97);
    assertThat(without).isLessThan(with - 0.1);
  }

  @Test
  void emptyMaskGivesZeroVector() {
    ShapeDescriptor d = plain.describe(Mask.empty(20, 10));
    assertThat(d.shapeVector()).containsOnly(0f);
    assertThat(d.areaFraction()).isZero();
  }
}
