package org.morphscout.indexer.ingest;

import java.awt.AlphaComposite;
import java.awt.Graphics2D;
import java.awt.color.ColorSpace;
import java.awt.image.BufferedImage;
import java.awt.image.ColorConvertOp;
import java.awt.image.ColorModel;
import java.awt.image.IndexColorModel;
import java.awt.image.Raster;

/**
 * Converts whatever a decoder returns (grey, 16-bit, palette, CMYK-converted, images tagged with an ICC profile)
 * into an sRGB {@code TYPE_INT_ARGB} image, keeping alpha.
 *
 * <p>Three paths, chosen by the colour space:
 * <ul>
 *   <li>Grey: samples are copied to R = G = B after scaling to 8 bits. Java's built-in {@code CS_GRAY} is
 *       linear-light, so letting Java2D convert it would lighten mid-greys (128 becomes 188); but grey PNGs and
 *       JPEGs store gamma-encoded values (ISO/IEC 15948 section 13.13 applies the same gamma to grey as to
 *       colour). Departure: a grey ICC profile with a gamma other than about 2.2 is treated as sRGB-like grey.</li>
 *   <li>sRGB and palette images: drawn with {@code AlphaComposite.Src}, which only repacks samples.</li>
 *   <li>Any other ICC colour space (for example an embedded Adobe RGB or linear profile): {@link ColorConvertOp}
 *       to sRGB using the profiles (ICC.1:2010 colour management), alpha copied unchanged.</li>
 * </ul>
 * Thread-safe (no state).
 */
final class SrgbConverter {

  private SrgbConverter() {}

  static BufferedImage toSrgbArgb(BufferedImage src) {
    ColorModel cm = src.getColorModel();
    ColorSpace cs = cm.getColorSpace();
    if (cs.getType() == ColorSpace.TYPE_GRAY && !(cm instanceof IndexColorModel)) {
      return fromGrey(src);
    }
    if (cs.isCS_sRGB() || cm instanceof IndexColorModel) {
      if (src.getType() == BufferedImage.TYPE_INT_ARGB) {
        return src;
      }
      return draw(src);
    }
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_ARGB);
    new ColorConvertOp(null).filter(src, out);
    if (!cm.hasAlpha()) {
      // Some ColorConvertOp paths leave alpha at 0 when the source has none; an opaque source is opaque.
      forceOpaque(out);
    }
    return out;
  }

  private static BufferedImage draw(BufferedImage src) {
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = out.createGraphics();
    try {
      g.setComposite(AlphaComposite.Src);
      g.drawImage(src, 0, 0, null);
    } finally {
      g.dispose();
    }
    return out;
  }

  private static BufferedImage fromGrey(BufferedImage src) {
    Raster r = src.getRaster();
    ColorModel cm = src.getColorModel();
    int w = src.getWidth();
    int h = src.getHeight();
    int greyMax = (1 << cm.getComponentSize(0)) - 1;
    boolean alpha = cm.hasAlpha();
    int alphaBand = cm.getNumColorComponents();
    int alphaMax = alpha ? (1 << cm.getComponentSize(alphaBand)) - 1 : 1;
    boolean premultiplied = cm.isAlphaPremultiplied();
    int[] out = new int[w * h];
    int[] grey = new int[w];
    int[] alphas = new int[w];
    for (int y = 0; y < h; y++) {
      r.getSamples(0, y, w, 1, 0, grey);
      if (alpha) {
        r.getSamples(0, y, w, 1, alphaBand, alphas);
      }
      for (int x = 0; x < w; x++) {
        int a = alpha ? scale(alphas[x], alphaMax) : 255;
        double g = grey[x];
        if (premultiplied && alphas[x] > 0) {
          g = g * alphaMax / alphas[x];
        }
        int v = (int) Math.min(255, Math.round(g * 255.0 / greyMax));
        out[y * w + x] = a << 24 | v << 16 | v << 8 | v;
      }
    }
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    img.setRGB(0, 0, w, h, out, 0, w);
    return img;
  }

  private static int scale(int v, int max) {
    return (int) Math.round(v * 255.0 / max);
  }

  private static void forceOpaque(BufferedImage img) {
    int[] data = ((java.awt.image.DataBufferInt) img.getRaster().getDataBuffer()).getData();
    for (int i = 0; i < data.length; i++) {
      data[i] |= 0xFF000000;
    }
  }
}
