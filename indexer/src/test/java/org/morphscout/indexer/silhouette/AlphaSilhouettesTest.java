package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;

/** Alpha cut-outs: detection of a usable alpha channel and the composite's choice of source. */
class AlphaSilhouettesTest {
  private static BufferedImage cutOut(Shape s) {
    BufferedImage img = new BufferedImage(Scenes.W, Scenes.H, BufferedImage.TYPE_INT_ARGB); // transparent
    Graphics2D g = img.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    // Same colour as the (transparent) background's RGB, so only alpha can tell the object apart.
    g.setColor(new Color(0, 0, 0));
    g.fill(s);
    g.dispose();
    return img;
  }

  @Test
  void cutOutIsDetectedAndUsedByTheDefaultComposite() {
    Shape s = Scenes.shape(Scenes.ShapeKind.STAR, 380, 290, 170);
    BufferedImage img = cutOut(s);
    assertThat(AlphaSilhouettes.hasUsableAlpha(img)).isTrue();
    Silhouette sil = new DefaultSilhouettes().extract(img);
    assertThat(sil.source()).isEqualTo("alpha");
    assertThat(sil.mask().iou(Scenes.mask(Scenes.W, Scenes.H, s))).isGreaterThanOrEqualTo(0.98);
    assertThat(sil.confidence()).isGreaterThan(0.9);
    assertThat(sil.components()).isEqualTo(1);
  }

  @Test
  void opaqueImagesHaveNoUsableAlphaAndFallBackToTheBorderModel() {
    Shape s = Scenes.shape(Scenes.ShapeKind.DISK, 380, 290, 150);
    BufferedImage img = Scenes.background(Scenes.Background.PLAIN, Scenes.W, Scenes.H, 1);
    Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    assertThat(AlphaSilhouettes.hasUsableAlpha(img)).isFalse();
    BufferedImage rgb = new BufferedImage(Scenes.W, Scenes.H, BufferedImage.TYPE_INT_RGB);
    assertThat(AlphaSilhouettes.hasUsableAlpha(rgb)).isFalse();
    Silhouette sil = new DefaultSilhouettes().extract(img);
    assertThat(sil.source()).isEqualTo("border-model");
    assertThat(sil.mask().iou(Scenes.mask(Scenes.W, Scenes.H, s))).isGreaterThanOrEqualTo(0.95);
  }

  @Test
  void aFewTransparentPixelsAreNotACutOut() {
    BufferedImage img = Scenes.background(Scenes.Background.PLAIN, 200, 100, 1);
    img.setRGB(0, 0, 0x00ffffff); // 1 of 20000 pixels
    assertThat(AlphaSilhouettes.hasUsableAlpha(img)).isFalse();
  }
}
