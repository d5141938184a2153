package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Extraction against the known masks of generated scenes (antialiased shapes on plain, gradient, two-colour and
 * textured backgrounds). IoU >= 0.95 is common practice for "the same silhouette" at this resolution.
 */
class BorderModelSilhouettesTest {
  private static final long SEED = 9001L;
  private final BorderModelSilhouettes extractor = new BorderModelSilhouettes();

  private static BufferedImage scene(Scenes.Background bg, long seed, Shape... shapes) {
    BufferedImage img = Scenes.background(bg, Scenes.W, Scenes.H, seed);
    for (Shape s : shapes) {
      Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    }
    return img;
  }

  @ParameterizedTest
  @EnumSource(Scenes.Background.class)
  void findsEveryShapeOnEveryBackground(Scenes.Background bg) {
    SplittableRandom rnd = new SplittableRandom(SEED + bg.ordinal());
    for (Scenes.ShapeKind kind : Scenes.ShapeKind.values()) {
      // Seeded placement and size, kept clear of the frame.
      double size = 120 + rnd.nextDouble(50);
      double cx = 330 + rnd.nextDouble(100);
      double cy = 270 + rnd.nextDouble(40);
      Shape s = Scenes.shape(kind, cx, cy, size);
      Silhouette sil = extractor.extract(scene(bg, SEED, s));
      Mask truth = Scenes.mask(Scenes.W, Scenes.H, s);
      String what = kind + " on " + bg + " (seed " + (SEED + bg.ordinal()) + ")";
      assertThat(sil.mask().iou(truth)).as(what).isGreaterThanOrEqualTo(0.95);
      assertThat(sil.touchesFrame()).as(what).isFalse();
      assertThat(sil.components()).as(what).isEqualTo(1);
      assertThat(sil.confidence()).as(what).isGreaterThan(0.8);
      assertThat(sil.coverage()).as(what).isCloseTo(truth.coverage(), org.assertj.core.data.Offset.offset(0.01));
      assertThat(sil.source()).isEqualTo("border-model");
      assertThat(sil.mask().width()).isEqualTo(Scenes.W);
    }
  }

  @Test
  void shapeCutByTheFrameTouchesIt() {
    Shape s = Scenes.shape(Scenes.ShapeKind.DISK, 384, 500, 170); // runs off the bottom edge
    Silhouette sil = extractor.extract(scene(Scenes.Background.LINEAR_GRADIENT, SEED, s));
    assertThat(sil.touchesFrame()).isTrue();
    assertThat(sil.mask().iou(Scenes.mask(Scenes.W, Scenes.H, s))).isGreaterThanOrEqualTo(0.95);
  }

  @Test
  void twoSeparateObjectsCountAsTwoAndTheLargerIsKept() {
    Shape big = Scenes.shape(Scenes.ShapeKind.VASE, 250, 290, 150);
    Shape small = Scenes.shape(Scenes.ShapeKind.DISK, 580, 300, 80);
    Silhouette sil = extractor.extract(scene(Scenes.Background.PLAIN, SEED, big, small));
    assertThat(sil.components()).isEqualTo(2);
    assertThat(sil.mask().iou(Scenes.mask(Scenes.W, Scenes.H, big))).isGreaterThanOrEqualTo(0.95);
  }

  @ParameterizedTest
  @EnumSource(value = Scenes.Background.class, names = {"PLAIN", "NOISE", "STRIPES", "CHECKER", "LINEAR_GRADIENT"})
  void backgroundAloneGivesAnEmptyMaskWithZeroConfidence(Scenes.Background bg) {
    Silhouette sil = extractor.extract(Scenes.background(bg, Scenes.W, Scenes.H, SEED));
    assertThat(sil.isEmpty()).as(bg.toString()).isTrue();
    assertThat(sil.confidence()).isZero();
    assertThat(sil.components()).isZero();
    assertThat(sil.touchesFrame()).isFalse();
  }

  @Test
  void confidenceFallsWhenObjectAndBackgroundOverlap() {
    Shape s = Scenes.shape(Scenes.ShapeKind.DISK, 384, 288, 150);
    Silhouette crisp = extractor.extract(scene(Scenes.Background.PLAIN, SEED, s));
    // An object whose shading runs into the background's own colour: the distance distributions overlap.
    BufferedImage faint = Scenes.background(Scenes.Background.PLAIN, Scenes.W, Scenes.H, SEED);
    Scenes.drawObject(faint, s, new Color(230, 226, 218), Scenes.OBJECT_DARK);
    Silhouette weak = extractor.extract(faint);
    assertThat(crisp.confidence()).isGreaterThan(0.9);
    assertThat(weak.confidence()).isLessThan(crisp.confidence() - 0.2);
  }

  @Test
  void confidenceTracksQualityAcrossPalettes() {
    Shape s = Scenes.shape(Scenes.ShapeKind.VASE, 384, 288, 160);
    Mask truth = Scenes.mask(Scenes.W, Scenes.H, s);
    // Teal, dark grey and ochre objects stand out on every background: high IoU and high confidence.
    Color[][] clear = {
      {new Color(40, 110, 130), new Color(20, 70, 90)},
      {new Color(60, 60, 60), new Color(20, 20, 20)},
      {new Color(200, 170, 60), new Color(150, 110, 30)}
    };
    for (Color[] pal : clear) {
      for (Scenes.Background bg : List.of(Scenes.Background.WALL_AND_FLOOR, Scenes.Background.CHECKER)) {
        BufferedImage img = Scenes.background(bg, Scenes.W, Scenes.H, SEED);
        Scenes.drawObject(img, s, pal[0], pal[1]);
        Silhouette sil = extractor.extract(img);
        assertThat(sil.mask().iou(truth)).as(pal[0] + " on " + bg).isGreaterThanOrEqualTo(0.95);
        assertThat(sil.confidence()).as(pal[0] + " on " + bg).isGreaterThan(0.8);
      }
    }
    // A white-to-grey object on a grey checker shares the background's colours: whatever is found, say so.
    BufferedImage img = Scenes.background(Scenes.Background.CHECKER, Scenes.W, Scenes.H, SEED);
    Scenes.drawObject(img, s, new Color(250, 250, 250), new Color(200, 205, 215));
    assertThat(extractor.extract(img).confidence()).isLessThan(0.5);
  }

  @Test
  void smallImagesWorkAtTheirOwnSize() {
    BufferedImage img = new BufferedImage(120, 90, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = img.createGraphics();
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, 120, 90);
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setColor(new Color(20, 60, 160));
    Shape s = Scenes.shape(Scenes.ShapeKind.DISK, 60, 45, 25);
    g.fill(s);
    g.dispose();
    Silhouette sil = extractor.extract(img);
    assertThat(sil.mask().iou(Scenes.mask(120, 90, s))).isGreaterThanOrEqualTo(0.9);
  }
}
