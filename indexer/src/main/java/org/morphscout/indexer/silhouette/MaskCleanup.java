package org.morphscout.indexer.silhouette;

/**
 * The cleanup every extractor shares: opening then closing with disks, counting sizeable components, keeping the
 * largest, filling its holes, scaling the mask to the image size and reading the frame and coverage flags.
 * Thread-safe (stateless).
 */
final class MaskCleanup {
  /**
   * Mask pixels allowed on one image side before the object counts as touching the frame: this fraction of that
   * side's length (at least {@link #MIN_TOUCH_PIXELS}), so a stray antialiased pixel does not raise the flag.
   */
  static final double TOUCH_TOLERANCE = 0.005;

  static final int MIN_TOUCH_PIXELS = 2;

  /**
   * Settings of one cleanup.
   *
   * @param openRadius disk radius of the opening, in working pixels (0 = none)
   * @param closeRadius disk radius of the closing, in working pixels (0 = none)
   * @param minComponentFraction components smaller than this fraction of the largest do not count as objects
   */
  record Settings(int openRadius, int closeRadius, double minComponentFraction) {}

  private MaskCleanup() {}

  /**
   * Cleans a raw mask at working size and returns the silhouette at output size.
   *
   * @param raw 0/1 mask at {@code w x h}
   * @param confidence the extractor's separation confidence, used as is unless the result is empty (then 0)
   */
  static Silhouette finish(
      byte[] raw, int w, int h, Settings s, int outW, int outH, double confidence, String source) {
    byte[] m = raw;
    if (s.openRadius() > 0) {
      m = Morphology.open(m, w, h, Morphology.Element.DISK, s.openRadius());
    }
    if (s.closeRadius() > 0) {
      m = Morphology.close(m, w, h, Morphology.Element.DISK, s.closeRadius());
    }
    Components.Labels labels = Components.label(m, w, h);
    int components = Components.countSizeable(labels, s.minComponentFraction());
    if (components == 0) {
      return new Silhouette(Mask.empty(outW, outH), 0, false, 0, 0, source);
    }
    m = Components.fillHoles(Components.keepLargest(m, w, h), w, h);
    Mask mask = new Mask(outW, outH, (w == outW && h == outH) ? m : upsample(m, w, h, outW, outH));
    int area = mask.area();
    if (area == 0) {
      return new Silhouette(mask, 0, false, 0, 0, source);
    }
    double conf = Math.max(0, Math.min(1, confidence));
    return new Silhouette(mask, components, touchesFrame(mask), area / ((double) outW * outH), conf, source);
  }

  /** Whether more than a tiny tolerance of mask pixels lies on any outermost row or column. */
  static boolean touchesFrame(Mask mask) {
    int w = mask.width();
    int h = mask.height();
    int top = 0;
    int bottom = 0;
    int left = 0;
    int right = 0;
    for (int x = 0; x < w; x++) {
      top += mask.get(x, 0) ? 1 : 0;
      bottom += mask.get(x, h - 1) ? 1 : 0;
    }
    for (int y = 0; y < h; y++) {
      left += mask.get(0, y) ? 1 : 0;
      right += mask.get(w - 1, y) ? 1 : 0;
    }
    int tolW = Math.max(MIN_TOUCH_PIXELS, (int) (TOUCH_TOLERANCE * w));
    int tolH = Math.max(MIN_TOUCH_PIXELS, (int) (TOUCH_TOLERANCE * h));
    return top > tolW || bottom > tolW || left > tolH || right > tolH;
  }

  /**
   * Bilinear upsampling of a 0/1 mask, thresholded at 0.5, which gives smoother edges than repeating pixels. Pixel
   * centres are aligned ((X + 0.5) * w / outW - 0.5), edges clamped.
   */
  static byte[] upsample(byte[] m, int w, int h, int outW, int outH) {
    byte[] out = new byte[outW * outH];
    int[] x0 = new int[outW];
    float[] fx = new float[outW];
    for (int x = 0; x < outW; x++) {
      double sx = Math.max(0, Math.min(w - 1, (x + 0.5) * w / outW - 0.5));
      x0[x] = Math.min(w - 2 < 0 ? 0 : w - 2, (int) sx);
      fx[x] = (float) (sx - x0[x]);
    }
    for (int y = 0; y < outH; y++) {
      double sy = Math.max(0, Math.min(h - 1, (y + 0.5) * h / outH - 0.5));
      int y0 = Math.min(h - 2 < 0 ? 0 : h - 2, (int) sy);
      int y1 = Math.min(h - 1, y0 + 1);
      float fy = (float) (sy - y0);
      int r0 = y0 * w;
      int r1 = y1 * w;
      for (int x = 0; x < outW; x++) {
        int a = x0[x];
        int b = Math.min(w - 1, a + 1);
        float f = fx[x];
        float top = m[r0 + a] + f * (m[r0 + b] - m[r0 + a]);
        float bot = m[r1 + a] + f * (m[r1 + b] - m[r1 + a]);
        out[y * outW + x] = (byte) (top + fy * (bot - top) >= 0.5f ? 1 : 0);
      }
    }
    return out;
  }
}
