package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * Checks {@link Orientation} against the Orientation tag definition of CIPA DC-008-2019 (Exif 2.32), tag 0x0112,
 * which states for each value on which visual side the stored 0th row and 0th column lie. The expected positions
 * here are derived from that table ({@link #SIDES}), not from the transform formulas.
 */
class OrientationTest {

  /**
   * CIPA DC-008-2019, Orientation: {0th row side, 0th column side} for values 1..8.
   * 1 top/left, 2 top/right, 3 bottom/right, 4 bottom/left, 5 left/top, 6 right/top, 7 right/bottom, 8 left/bottom.
   */
  static final String[][] SIDES = {
    null,
    {"top", "left"}, {"top", "right"}, {"bottom", "right"}, {"bottom", "left"},
    {"left", "top"}, {"right", "top"}, {"right", "bottom"}, {"left", "bottom"}
  };

  /**
   * Visual corner (x, y) in the upright W x H picture where the stored pixel in row {@code lastRow ? last : 0} and
   * column {@code lastCol ? last : 0} ends up: the stored 0th row lies along side SIDES[tag][0], so the last row
   * lies along the opposite side; likewise for columns.
   */
  static int[] expectedCorner(int tag, boolean lastRow, boolean lastCol, int uprightW, int uprightH) {
    String rowSide = lastRow ? opposite(SIDES[tag][0]) : SIDES[tag][0];
    String colSide = lastCol ? opposite(SIDES[tag][1]) : SIDES[tag][1];
    int x = -1;
    int y = -1;
    for (String side : new String[] {rowSide, colSide}) {
      switch (side) {
        case "top" -> y = 0;
        case "bottom" -> y = uprightH - 1;
        case "left" -> x = 0;
        case "right" -> x = uprightW - 1;
        default -> throw new IllegalStateException(side);
      }
    }
    return new int[] {x, y};
  }

  static String opposite(String side) {
    return switch (side) {
      case "top" -> "bottom";
      case "bottom" -> "top";
      case "left" -> "right";
      default -> "left";
    };
  }

  @ParameterizedTest(name = "orientation {0}")
  @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
  void storedCornersLandWhereTheExifTableSays(int tag) {
    int w = 5;
    int h = 3;
    BufferedImage stored = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        stored.setRGB(x, y, 0xFF000000 | (x << 8) | y); // each pixel unique: green = column, blue = row
      }
    }
    BufferedImage upright = Orientation.apply(stored, tag);

    boolean swap = tag >= 5; // rows become columns when the 0th row lies on the left or right side
    assertThat(upright.getWidth()).isEqualTo(swap ? h : w);
    assertThat(upright.getHeight()).isEqualTo(swap ? w : h);
    for (boolean lastRow : new boolean[] {false, true}) {
      for (boolean lastCol : new boolean[] {false, true}) {
        int sx = lastCol ? w - 1 : 0;
        int sy = lastRow ? h - 1 : 0;
        int[] c = expectedCorner(tag, lastRow, lastCol, upright.getWidth(), upright.getHeight());
        assertThat(upright.getRGB(c[0], c[1]))
            .as("tag %d: stored (%d,%d) should be at (%d,%d)", tag, sx, sy, c[0], c[1])
            .isEqualTo(stored.getRGB(sx, sy));
      }
    }
  }

  @ParameterizedTest(name = "orientation {0}")
  @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
  void everyPixelIsKeptExactlyOnce(int tag) {
    BufferedImage stored = new BufferedImage(4, 7, BufferedImage.TYPE_INT_ARGB);
    for (int y = 0; y < 7; y++) {
      for (int x = 0; x < 4; x++) {
        stored.setRGB(x, y, 0xFF000000 | (y * 4 + x));
      }
    }
    BufferedImage upright = Orientation.apply(stored, tag);
    int[] seen = new int[28];
    for (int y = 0; y < upright.getHeight(); y++) {
      for (int x = 0; x < upright.getWidth(); x++) {
        seen[upright.getRGB(x, y) & 0xFFFFFF]++;
      }
    }
    assertThat(seen).containsOnly(1);
  }

  @Test
  void valuesOutsideOneToEightAreRejected() {
    BufferedImage img = new BufferedImage(2, 2, BufferedImage.TYPE_INT_ARGB);
    assertThatThrownBy(() -> Orientation.apply(img, 0)).isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> Orientation.apply(img, 9)).isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void rotationsMatchTheirNames() {
    // Exif 2.32 names 6 "rotate 90 CW" and 8 "rotate 270 CW": applying 6 four times (or 8 four times) is the
    // identity, and 6 followed by 8 is the identity (common practice: rotation group of order 4).
    BufferedImage img = new BufferedImage(3, 2, BufferedImage.TYPE_INT_ARGB);
    for (int i = 0; i < 6; i++) {
      img.setRGB(i % 3, i / 3, 0xFF000000 | i);
    }
    BufferedImage r = img;
    for (int i = 0; i < 4; i++) {
      r = Orientation.apply(r, 6);
    }
    assertThat(pixels(r)).containsExactly(pixels(img));
    assertThat(pixels(Orientation.apply(Orientation.apply(img, 6), 8))).containsExactly(pixels(img));
    // 3 equals 6 applied twice.
    assertThat(pixels(Orientation.apply(img, 3)))
        .containsExactly(pixels(Orientation.apply(Orientation.apply(img, 6), 6)));
  }

  private static int[] pixels(BufferedImage img) {
    return img.getRGB(0, 0, img.getWidth(), img.getHeight(), null, 0, img.getWidth());
  }
}
