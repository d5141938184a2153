package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The separable area average against a plain two-dimensional reference, plus box-filter facts. */
class AreaDownscalerTest {

  /**
   * Plain reference: for each output pixel, integrate the source over its footprint (x in [ox*sx, (ox+1)*sx),
   * y likewise), weighting each source pixel by its overlap area; colours premultiplied by alpha.
   */
  static int[] reference(int[] src, int w, int h, int tw, int th) {
    double sx = (double) w / tw;
    double sy = (double) h / th;
    int[] out = new int[tw * th];
    for (int oy = 0; oy < th; oy++) {
      for (int ox = 0; ox < tw; ox++) {
        double a = 0;
        double r = 0;
        double g = 0;
        double b = 0;
        double area = 0;
        for (int y = 0; y < h; y++) {
          double oyl = Math.max(0, Math.min(y + 1, (oy + 1) * sy) - Math.max(y, oy * sy));
          if (oyl <= 0) {
            continue;
          }
          for (int x = 0; x < w; x++) {
            double oxl = Math.max(0, Math.min(x + 1, (ox + 1) * sx) - Math.max(x, ox * sx));
            if (oxl <= 0) {
              continue;
            }
            double wt = oxl * oyl;
            int p = src[y * w + x];
            double pa = (p >>> 24) / 255.0;
            a += pa * wt;
            r += ((p >> 16) & 0xFF) * pa * wt;
            g += ((p >> 8) & 0xFF) * pa * wt;
            b += (p & 0xFF) * pa * wt;
            area += wt;
          }
        }
        int ai = (int) Math.round(a / area * 255);
        int ri = a > 0 ? (int) Math.round(r / a) : 0;
        int gi = a > 0 ? (int) Math.round(g / a) : 0;
        int bi = a > 0 ? (int) Math.round(b / a) : 0;
        out[oy * tw + ox] = ai << 24 | ri << 16 | gi << 8 | bi;
      }
    }
    return out;
  }

  @ParameterizedTest(name = "{0}x{1} -> {2}x{3}")
  @CsvSource({"37,23,10,7", "64,64,32,32", "50,20,49,19", "9,9,1,1", "100,3,7,3", "31,17,31,17"})
  void matchesPlainReference(int w, int h, int tw, int th) {
    long seed = 1234L + w * 31L + h;
    Random rnd = new Random(seed);
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    int[] src = new int[w * h];
    for (int i = 0; i < src.length; i++) {
      // Mix of opaque, translucent and fully transparent pixels.
      int a = switch (rnd.nextInt(4)) {
        case 0 -> 0;
        case 1 -> rnd.nextInt(256);
        default -> 255;
      };
      src[i] = a << 24 | rnd.nextInt(1 << 24);
    }
    img.setRGB(0, 0, w, h, src, 0, w);

    BufferedImage out = AreaDownscaler.resize(img, tw, th);
    int[] got = out.getRGB(0, 0, tw, th, null, 0, tw);
    int[] want = reference(src, w, h, tw, th);
    for (int i = 0; i < got.length; i++) {
      int diff = TestImages.maxChannelDiff(got[i], want[i]);
      if (TestImages.alpha(want[i]) == 0) {
        assertThat(TestImages.alpha(got[i])).as("seed %d, pixel %d", seed, i).isZero();
      } else {
        // float vs double accumulation and colour of nearly transparent pixels: at most 1 level, plus 1 for
        // pixels whose alpha is so low that a colour level is below float precision after un-premultiplying.
        int allowed = TestImages.alpha(want[i]) < 8 ? 3 : 1;
        assertThat(diff).as("seed %d, pixel %d: %08x vs %08x", seed, i, got[i], want[i]).isLessThanOrEqualTo(allowed);
      }
    }
  }

  @Test
  void halvingAveragesEachTwoByTwoBlock() {
    // Common practice: a box filter at factor 2 is the mean of each 2 x 2 block.
    BufferedImage img = new BufferedImage(4, 2, BufferedImage.TYPE_INT_ARGB);
    int[] px = {0xFF000000, 0xFFFFFFFF, 0xFF102030, 0xFF102030, 0xFFFFFFFF, 0xFF000000, 0xFF102030, 0xFF506070};
    img.setRGB(0, 0, 4, 2, px, 0, 4);
    BufferedImage out = AreaDownscaler.resize(img, 2, 1);
    assertThat(out.getRGB(0, 0)).isEqualTo(0xFF808080); // (0 + 255 + 255 + 0) / 4 = 127.5 -> 128
    assertThat(out.getRGB(1, 0)).isEqualTo(0xFF203040); // (16*3 + 80) / 4 = 32, (32*3+96)/4 = 48, (48*3+112)/4=64
  }

  @Test
  void transparentColourDoesNotBleed() {
    // Transparent pixels carry arbitrary colour (here red); premultiplied averaging ignores it.
    BufferedImage img = new BufferedImage(2, 1, BufferedImage.TYPE_INT_ARGB);
    img.setRGB(0, 0, 0x00FF0000);
    img.setRGB(1, 0, 0xFF0000FF);
    int p = AreaDownscaler.resize(img, 1, 1).getRGB(0, 0);
    assertThat(p).isEqualTo(0x800000FF);
  }

  @Test
  void fitWithinKeepsAspectAndNeverEnlarges() {
    assertThat(AreaDownscaler.fitWithin(3000, 2000, 768)).containsExactly(768, 512);
    assertThat(AreaDownscaler.fitWithin(2000, 3000, 768)).containsExactly(512, 768);
    assertThat(AreaDownscaler.fitWithin(300, 200, 768)).containsExactly(300, 200);
    assertThat(AreaDownscaler.fitWithin(100_000, 10, 768)).containsExactly(768, 1);
  }

  @Test
  void aSubImageSharingABiggerBufferGivesTheSameResultAsAPlainCopy() {
    // The direct pixel-array path applies to plain ARGB images only; a sub-image (offset into a larger buffer) must
    // take the getRGB path and still see its own pixels.
    Random rnd = new Random(31);
    BufferedImage big = new BufferedImage(60, 50, BufferedImage.TYPE_INT_ARGB);
    for (int y = 0; y < 50; y++) {
      for (int x = 0; x < 60; x++) {
        big.setRGB(x, y, rnd.nextInt());
      }
    }
    BufferedImage sub = big.getSubimage(7, 5, 41, 33);
    BufferedImage copy = new BufferedImage(41, 33, BufferedImage.TYPE_INT_ARGB);
    copy.setRGB(0, 0, 41, 33, sub.getRGB(0, 0, 41, 33, null, 0, 41), 0, 41);
    assertThat(AreaDownscaler.packedArgb(copy)).containsExactly(sub.getRGB(0, 0, 41, 33, null, 0, 41));
    BufferedImage a = AreaDownscaler.resize(sub, 13, 11);
    BufferedImage b = AreaDownscaler.resize(copy, 13, 11);
    assertThat(a.getRGB(0, 0, 13, 11, null, 0, 13)).containsExactly(b.getRGB(0, 0, 13, 11, null, 0, 13));
    assertThat(b.getRGB(0, 0, 13, 11, null, 0, 13))
        .containsExactly(reference(copy.getRGB(0, 0, 41, 33, null, 0, 41), 41, 33, 13, 11));
  }
}
