package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;

/**
 * Applies an EXIF orientation so the picture looks upright.
 *
 * <p>CIPA DC-008-2019 (Exif 2.32), tag 0x0112 Orientation, gives for each value where the stored image's 0th row
 * and 0th column lie visually: 1 = top/left (normal), 2 = top/right (mirror horizontally), 3 = bottom/right
 * (rotate 180), 4 = bottom/left (mirror vertically), 5 = left/top (transpose: mirror across the main diagonal),
 * 6 = right/top (rotate 90 degrees clockwise to view), 7 = right/bottom (transverse: mirror across the
 * anti-diagonal), 8 = left/bottom (rotate 90 degrees counter-clockwise, i.e. 270 clockwise, to view).
 *
 * <p>Pure and thread-safe; works on any {@link BufferedImage} and returns a new {@code TYPE_INT_ARGB} image.
 */
public final class Orientation {

  private Orientation() {}

  /** Whether the orientation swaps width and height (values 5..8). */
  public static boolean swapsAxes(int tag) {
    check(tag);
    return tag >= 5;
  }

  /**
   * Returns the upright picture for an image stored with orientation {@code tag}.
   *
   * @param tag 1..8
   */
  public static BufferedImage apply(BufferedImage stored, int tag) {
    check(tag);
    int w = stored.getWidth();
    int h = stored.getHeight();
    int ow = swapsAxes(tag) ? h : w;
    int oh = swapsAxes(tag) ? w : h;
    int[] src = stored.getRGB(0, 0, w, h, null, 0, w);
    if (tag == 1 && stored.getType() == BufferedImage.TYPE_INT_ARGB) {
      return copy(stored, src);
    }
    int[] dst = new int[ow * oh];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        // (x, y) in stored image -> (u, v) in upright image.
        int u;
        int v;
        switch (tag) {
          case 1 -> { u = x; v = y; }
          case 2 -> { u = w - 1 - x; v = y; }
          case 3 -> { u = w - 1 - x; v = h - 1 - y; }
          case 4 -> { u = x; v = h - 1 - y; }
          case 5 -> { u = y; v = x; }
          case 6 -> { u = h - 1 - y; v = x; }
          case 7 -> { u = h - 1 - y; v = w - 1 - x; }
          default -> { u = y; v = w - 1 - x; } // 8
        }
        dst[v * ow + u] = src[y * w + x];
      }
    }
    BufferedImage out = new BufferedImage(ow, oh, BufferedImage.TYPE_INT_ARGB);
    out.setRGB(0, 0, ow, oh, dst, 0, ow);
    return out;
  }

  private static BufferedImage copy(BufferedImage stored, int[] argb) {
    BufferedImage out = new BufferedImage(stored.getWidth(), stored.getHeight(), BufferedImage.TYPE_INT_ARGB);
    out.setRGB(0, 0, stored.getWidth(), stored.getHeight(), argb, 0, stored.getWidth());
    return out;
  }

  private static void check(int tag) {
    if (tag < 1 || tag > 8) {
      throw new IllegalArgumentException("EXIF orientation must be 1..8, got " + tag);
    }
  }
}
