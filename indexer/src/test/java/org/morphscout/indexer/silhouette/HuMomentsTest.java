package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import org.junit.jupiter.api.Test;

/**
 * Hu moments against values derived from the definition (Hu 1962). For a solid w x h rectangle of area A = wh the
 * continuous central moments are mu20 = A w^2 / 12 and mu02 = A h^2 / 12, mu11 = 0, so eta20 = mu20 / A^2 =
 * w / (12 h) and eta02 = h / (12 w). Hence h1 = eta20 + eta02 = (w/h + h/w) / 12 and h2 = (eta20 - eta02)^2:
 * a square gives h1 = 1/6, h2 = 0; a 2:1 rectangle gives h1 = 2.5/12 = 0.208333 and h2 = (1.5/12)^2 = 0.015625.
 * For a disk of radius r, mu20 = mu02 = pi r^4 / 4 and A = pi r^2, so h1 = 2 (pi r^4 / 4) / (pi r^2)^2 = 1/(2 pi).
 * Pixelisation changes these by about 1/size^2 (discrete sums of squares), hence the large shapes.
 */
class HuMomentsTest {
  @Test
  void diskMatchesAnalyticValue() {
    Mask disk = Scenes.mask(400, 400, new Ellipse2D.Double(50, 50, 300, 300)); // radius 150
    double[] hu = HuMoments.of(disk);
    assertThat(hu[0]).isCloseTo(1 / (2 * Math.PI), within(2e-4));
    for (int i = 1; i < 7; i++) {
      assertThat(Math.abs(hu[i])).as("h%d of a disk", i + 1).isLessThan(1e-6);
    }
  }

  @Test
  void squareMatchesAnalyticValue() {
    Mask square = Scenes.mask(400, 400, new Rectangle2D.Double(50, 50, 300, 300));
    double[] hu = HuMoments.of(square);
    assertThat(hu[0]).isCloseTo(1.0 / 6.0, within(1e-5));
    assertThat(hu[1]).isCloseTo(0.0, within(1e-9));
  }

  @Test
  void twoToOneRectangleMatchesAnalyticValues() {
    Mask rect = Scenes.mask(500, 300, new Rectangle2D.Double(50, 50, 400, 200));
    double[] hu = HuMoments.of(rect);
    assertThat(hu[0]).isCloseTo(0.208333, within(1e-5));
    assertThat(hu[1]).isCloseTo(0.015625, within(1e-5));
  }

  @Test
  void invariantUnderRotationAndScale() {
    var star = Scenes.star(250, 250, 150, 70, 5);
    double[] a = HuMoments.of(Scenes.mask(500, 500, star));
    var turned = AffineTransform.getRotateInstance(Math.toRadians(37), 250, 250).createTransformedShape(star);
    var scaled = new AffineTransform(0.6, 0, 0, 0.6, 60, 60).createTransformedShape(turned);
    double[] b = HuMoments.of(Scenes.mask(500, 500, scaled));
    // Common practice: invariance holds up to pixelisation, so compare the leading invariants to within 1%.
    for (int i = 0; i < 2; i++) {
      assertThat(b[i]).as("h%d", i + 1).isCloseTo(a[i], within(0.01 * Math.abs(a[i]) + 1e-6));
    }
  }

  @Test
  void emptyMaskGivesZeros() {
    assertThat(HuMoments.of(Mask.empty(10, 10))).containsOnly(0.0);
  }
}
