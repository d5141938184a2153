package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import java.awt.image.SinglePixelPackedSampleModel;
import java.awt.image.WritableRaster;

/**
 * Shrinks an ARGB image by exact area averaging (a box filter with fractional pixel coverage), the standard
 * anti-aliased minification (common practice; equivalent to OpenCV's {@code INTER_AREA} for shrinking).
 *
 * <p>Colours are averaged premultiplied by alpha, so fully transparent pixels (whose colour is meaningless) do not
 * bleed into their neighbours. Averaging is done on the stored (gamma-encoded) sRGB values, as most image tools do;
 * departure from a linear-light average, accepted for speed. Thread-safe (no state).
 */
public final class AreaDownscaler {

  private AreaDownscaler() {}

  /**
   * The size a {@code width x height} picture gets when its long side is brought down to at most {@code longSide}
   * (never enlarged), aspect ratio kept, each side at least 1.
   *
   * @return {width, height}
   */
  public static int[] fitWithin(long width, long height, int longSide) {
    long longest = Math.max(width, height);
    if (longest <= longSide) {
      return new int[] {(int) width, (int) height};
    }
    double s = (double) longSide / longest;
    int w = (int) Math.max(1, Math.min(longSide, Math.round(width * s)));
    int h = (int) Math.max(1, Math.min(longSide, Math.round(height * s)));
    return new int[] {w, h};
  }

  /** Returns {@code src} (any type) resampled to exactly {@code tw x th} ({@code TYPE_INT_ARGB}); shrinks only. */
  public static BufferedImage resize(BufferedImage src, int tw, int th) {
    int w = src.getWidth();
    int h = src.getHeight();
    if (tw < 1 || th < 1 || tw > w || th > h) {
      throw new IllegalArgumentException(
          "area downscale needs 1 <= target <= source, got " + w + "x" + h + " -> " + tw + "x" + th);
    }
    if (tw == w && th == h && src.getType() == BufferedImage.TYPE_INT_ARGB) {
      return src;
    }
    int[] argb = packedArgb(src); // read only
    // Pass 1: horizontal, into premultiplied float planes of tw x h (a, r*a, g*a, b*a), alpha in 0..1.
    Span[] xs = spans(w, tw);
    float[] mid = new float[tw * h * 4];
    for (int y = 0; y < h; y++) {
      int row = y * w;
      for (int ox = 0; ox < tw; ox++) {
        Span s = xs[ox];
        float sa = 0;
        float sr = 0;
        float sg = 0;
        float sb = 0;
        for (int k = 0; k < s.index.length; k++) {
          int p = argb[row + s.index[k]];
          float a = (p >>> 24) / 255f * s.weight[k];
          sa += a;
          sr += ((p >> 16) & 0xFF) * a;
          sg += ((p >> 8) & 0xFF) * a;
          sb += (p & 0xFF) * a;
        }
        int o = (y * tw + ox) * 4;
        mid[o] = sa;
        mid[o + 1] = sr;
        mid[o + 2] = sg;
        mid[o + 3] = sb;
      }
    }
    // Pass 2: vertical, then un-premultiply. Weights of each span sum to 1, so sums are already averages.
    Span[] ys = spans(h, th);
    int[] out = new int[tw * th];
    for (int oy = 0; oy < th; oy++) {
      Span s = ys[oy];
      for (int ox = 0; ox < tw; ox++) {
        float sa = 0;
        float sr = 0;
        float sg = 0;
        float sb = 0;
        for (int k = 0; k < s.index.length; k++) {
          int o = (s.index[k] * tw + ox) * 4;
          float wt = s.weight[k];
          sa += mid[o] * wt;
          sr += mid[o + 1] * wt;
          sg += mid[o + 2] * wt;
          sb += mid[o + 3] * wt;
        }
        int a = clamp(Math.round(sa * 255f));
        int r = sa > 0 ? clamp(Math.round(sr / sa)) : 0;
        int g = sa > 0 ? clamp(Math.round(sg / sa)) : 0;
        int b = sa > 0 ? clamp(Math.round(sb / sa)) : 0;
        out[oy * tw + ox] = a << 24 | r << 16 | g << 8 | b;
      }
    }
    BufferedImage img = new BufferedImage(tw, th, BufferedImage.TYPE_INT_ARGB);
    img.setRGB(0, 0, tw, th, out, 0, tw);
    return img;
  }

  /**
   * The pixels as {@code getRGB} returns them. A plain {@code TYPE_INT_ARGB} image (what the decoder hands over) stores
   * exactly those ints, so its own array is returned, unchanged and not to be written: {@code getRGB} would convert
   * pixel by pixel through the colour model, about a tenth of an indexing run's CPU time. Anything else (other types,
   * sub-images sharing a larger buffer) goes through {@code getRGB}.
   */
  static int[] packedArgb(BufferedImage src) {
    int w = src.getWidth();
    int h = src.getHeight();
    WritableRaster r = src.getRaster();
    if (src.getType() == BufferedImage.TYPE_INT_ARGB && r.getDataBuffer() instanceof DataBufferInt db
        && r.getSampleModel() instanceof SinglePixelPackedSampleModel sm && sm.getScanlineStride() == w
        && db.getNumBanks() == 1 && db.getOffset() == 0 && r.getSampleModelTranslateX() == 0
        && r.getSampleModelTranslateY() == 0 && db.getData().length == w * h) {
      return db.getData();
    }
    return src.getRGB(0, 0, w, h, null, 0, w);
  }

  /** Source pixels (and their coverage fraction, summing to 1) that make up each of {@code n} output pixels. */
  private static Span[] spans(int srcLen, int n) {
    double scale = (double) srcLen / n;
    Span[] spans = new Span[n];
    for (int o = 0; o < n; o++) {
      double start = o * scale;
      double end = Math.min(srcLen, (o + 1) * scale);
      int first = (int) Math.floor(start);
      int last = Math.min(srcLen - 1, (int) Math.ceil(end) - 1);
      int count = last - first + 1;
      int[] idx = new int[count];
      float[] wt = new float[count];
      for (int k = 0; k < count; k++) {
        int i = first + k;
        idx[k] = i;
        wt[k] = (float) ((Math.min(end, i + 1) - Math.max(start, i)) / scale);
      }
      spans[o] = new Span(idx, wt);
    }
    return spans;
  }

  private record Span(int[] index, float[] weight) {}

  private static int clamp(int v) {
    return v < 0 ? 0 : Math.min(255, v);
  }
}
