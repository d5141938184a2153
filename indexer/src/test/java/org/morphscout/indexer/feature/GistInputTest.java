package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.colour.CieLab;

class GistInputTest {
  private static final int N = GistInput.SIZE;

  @Test
  void blurOfAnImpulseHasTheVarianceOfThreeBoxes() {
    // A discrete box of width w has variance (w^2 - 1) / 12; three in cascade add up (Wells 1986; common practice):
    // w = 17 gives 3 * 24 = 72 px^2 per axis, and the weights sum to 1.
    double[] plane = new double[N * N];
    plane[64 * N + 64] = 1.0;
    double[] b = GistInput.blur(plane);
    double sum = 0;
    double varX = 0;
    for (int y = 0; y < N; y++) {
      for (int x = 0; x < N; x++) {
        sum += b[y * N + x];
        varX += b[y * N + x] * (x - 64) * (x - 64);
      }
    }
    assertThat(sum).isCloseTo(1.0, within(1e-12));
    assertThat(varX).isCloseTo(72.0, within(1e-9));
  }

  @Test
  void transparentImageBecomesMidGreyWithNoStructure() {
    BufferedImage img = new BufferedImage(50, 30, BufferedImage.TYPE_INT_ARGB);
    float[] t = GistInput.prepare(img);
    double[] grey = CieLab.toLab(ImageResampler.MID_GREY, ImageResampler.MID_GREY, ImageResampler.MID_GREY);
    for (int i = 0; i < N * N; i++) {
      assertThat(t[i]).isCloseTo(0f, within(1e-5f));
      assertThat((double) t[N * N + i]).isCloseTo(grey[0] / 50 - 1, within(1e-4));
      assertThat((double) t[2 * N * N + i]).isCloseTo(grey[1] / 100, within(1e-4));
      assertThat((double) t[3 * N * N + i]).isCloseTo(grey[2] / 100, within(1e-4));
    }
  }

  @Test
  void resizeAveragesBoxesOfTheSource() {
    // 256x256 source of 2x2 blocks: each target pixel is exactly one block's mean.
    BufferedImage img = new BufferedImage(256, 256, BufferedImage.TYPE_INT_ARGB);
    for (int y = 0; y < 256; y++) {
      for (int x = 0; x < 256; x++) {
        int v = ((x / 2) * 2 + (y % 2) * 2 + (x % 2)) & 0xFF;
        img.setRGB(x, y, 0xFF000000 | v << 16 | v << 8 | v);
      }
    }
    int[] out = ImageResampler.resize(img, 128, 128);
    for (int y = 0; y < 128; y++) {
      for (int x = 0; x < 128; x++) {
        long s = 0;
        for (int dy = 0; dy < 2; dy++) {
          for (int dx = 0; dx < 2; dx++) {
            s += img.getRGB(2 * x + dx, 2 * y + dy) & 0xFF;
          }
        }
        assertThat(out[y * 128 + x] & 0xFF).isEqualTo((int) ((s * 255 + 2 * 255) / (4 * 255)));
      }
    }
  }

  @Test
  void cutOutOnTransparentGroundGivesOnlyFiniteValues() {
    // A product cut-out: an opaque disk on fully transparent pixels, which composite to a perfectly flat mid-grey.
    // The contrast normalisation must not take the square root of a tiny negative variance there.
    BufferedImage img = new BufferedImage(300, 400, BufferedImage.TYPE_INT_ARGB);
    java.awt.Graphics2D g = img.createGraphics();
    g.setColor(new java.awt.Color(180, 90, 40));
    g.fillOval(60, 80, 180, 240);
    g.dispose();
    float[] t = GistInput.prepare(img);
    for (int i = 0; i < t.length; i++) {
      assertThat(Float.isFinite(t[i])).as("component %d", i).isTrue();
    }
  }
}
