package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import org.junit.jupiter.api.Test;

class ImageCodecTest {
  @Test
  void jpegRoundTripKeepsChannelOrderAndCloseValues() throws Exception {
    int[] colours = {0xC03020, 0x20A040, 0x3050D0, 0xE8E4DC};
    BufferedImage img = new BufferedImage(64, 16, BufferedImage.TYPE_INT_RGB);
    for (int x = 0; x < 64; x++) {
      for (int y = 0; y < 16; y++) {
        img.setRGB(x, y, colours[x / 16]);
      }
    }
    BufferedImage back = ImageCodec.decode(ImageCodec.jpeg(img, 0.95f));
    for (int k = 0; k < colours.length; k++) {
      int p = back.getRGB(16 * k + 8, 8);
      // Flat 8x8 blocks survive quality-95 JPEG within a few levels (common practice).
      assertThat(VesselRendererTest.diff(p, colours[k])).as("colour %06x came back as %06x", colours[k], p & 0xFFFFFF)
          .isLessThan(12);
    }
  }

  @Test
  void pngKeepsPixelsAndAlphaExactly() throws Exception {
    BufferedImage img = new BufferedImage(5, 3, BufferedImage.TYPE_INT_ARGB);
    for (int i = 0; i < 15; i++) {
      img.setRGB(i % 5, i / 5, (i * 17) << 24 | i * 0x010203);
    }
    BufferedImage back = ImageCodec.decode(ImageCodec.png(img));
    for (int i = 0; i < 15; i++) {
      assertThat(back.getRGB(i % 5, i / 5)).isEqualTo(img.getRGB(i % 5, i / 5));
    }
  }

  @Test
  void areaResizeAveragesExactly() {
    // Halving with area averaging: each output pixel is the mean of a 2x2 block (box filter, common practice).
    BufferedImage img = new BufferedImage(4, 2, BufferedImage.TYPE_INT_RGB);
    int[] values = {10, 30, 100, 200, 50, 70, 0, 100};
    for (int i = 0; i < 8; i++) {
      img.setRGB(i % 4, i / 4, values[i] << 16);
    }
    BufferedImage half = ImageCodec.resize(img, 2, 1);
    assertThat((half.getRGB(0, 0) >> 16) & 0xFF).isEqualTo(40);
    assertThat((half.getRGB(1, 0) >> 16) & 0xFF).isEqualTo(100);
  }

  @Test
  void truncationDropsTheTail() {
    byte[] bytes = new byte[1000];
    assertThat(ImageCodec.truncated(bytes, 0.55)).hasSize(550);
  }
}
