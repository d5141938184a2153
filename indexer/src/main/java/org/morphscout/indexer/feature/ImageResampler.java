package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;

/**
 * Resizes an analysis image to a model's input size by stretching (no letterbox: both GIST's grid and typical CNNs
 * want the whole frame, and aspect differences are scored elsewhere) with box (area) averaging, after compositing
 * alpha over mid-grey (sRGB 128), so transparent regions read as neutral rather than black. Averaging is done on 8-bit
 * sRGB codes (common practice for thumbnails; not gamma-correct). When enlarging, each target pixel takes its nearest
 * source pixel. Stateless and thread-safe.
 */
final class ImageResampler {
  /** The grey that transparent pixels become, sRGB code 128 per channel. */
  static final int MID_GREY = 128;

  private ImageResampler() {}

  /** Opaque packed RGB (0xFFRRGGBB) pixels of the resized image, row-major {@code width * height}. */
  static int[] resize(BufferedImage image, int width, int height) {
    int sw = image.getWidth();
    int sh = image.getHeight();
    int[] src = argbPixels(image);
    int[] out = new int[width * height];
    for (int ty = 0; ty < height; ty++) {
      int y0 = (int) ((long) ty * sh / height);
      int y1 = Math.max(y0 + 1, (int) (((long) ty + 1) * sh / height));
      for (int tx = 0; tx < width; tx++) {
        int x0 = (int) ((long) tx * sw / width);
        int x1 = Math.max(x0 + 1, (int) (((long) tx + 1) * sw / width));
        long r = 0;
        long g = 0;
        long b = 0;
        for (int y = y0; y < y1; y++) {
          for (int x = x0; x < x1; x++) {
            int p = src[y * sw + x];
            int a = p >>> 24;
            // Composite over grey in 0..255*255 units to keep precision until the final division.
            r += ((p >> 16) & 0xFF) * a + MID_GREY * (255 - a);
            g += ((p >> 8) & 0xFF) * a + MID_GREY * (255 - a);
            b += (p & 0xFF) * a + MID_GREY * (255 - a);
          }
        }
        long n = 255L * (y1 - y0) * (x1 - x0);
        out[ty * width + tx] =
            0xFF000000 | (int) ((r + n / 2) / n) << 16 | (int) ((g + n / 2) / n) << 8 | (int) ((b + n / 2) / n);
      }
    }
    return out;
  }

  /**
   * Packed ARGB pixels, row-major. For TYPE_INT_ARGB (the analysis format) the raster already holds exactly that and
   * is copied directly, which is several times faster than {@code getRGB}; other types go through {@code getRGB}.
   */
  static int[] argbPixels(BufferedImage image) {
    int w = image.getWidth();
    int h = image.getHeight();
    if (image.getType() == BufferedImage.TYPE_INT_ARGB) {
      return (int[]) image.getRaster().getDataElements(0, 0, w, h, null);
    }
    return image.getRGB(0, 0, w, h, null, 0, w);
  }
}
