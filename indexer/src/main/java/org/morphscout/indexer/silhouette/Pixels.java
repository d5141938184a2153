package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;

/** Reading packed ARGB pixels from an image without per-pixel colour-model calls where the layout allows it. */
final class Pixels {
  private Pixels() {}

  /** Row-major 0xAARRGGBB pixels (sRGB). For INT_RGB images alpha is set to opaque. */
  static int[] argb(BufferedImage image) {
    int w = image.getWidth();
    int h = image.getHeight();
    int type = image.getType();
    if (type == BufferedImage.TYPE_INT_ARGB || type == BufferedImage.TYPE_INT_RGB) {
      // getDataElements copies the raster without un-accelerating ("stealing") the image's buffer.
      int[] px = (int[]) image.getRaster().getDataElements(0, 0, w, h, new int[w * h]);
      if (type == BufferedImage.TYPE_INT_RGB) {
        for (int i = 0; i < px.length; i++) {
          px[i] |= 0xff000000;
        }
      }
      return px;
    }
    return image.getRGB(0, 0, w, h, new int[w * h], 0, w);
  }
}
