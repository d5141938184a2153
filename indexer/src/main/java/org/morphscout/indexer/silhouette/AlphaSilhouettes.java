package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;

/**
 * Silhouettes from the alpha channel of cut-out images (alpha >= 128 is object). Only meaningful when
 * {@link #hasUsableAlpha(BufferedImage)} holds; on other images it returns an empty silhouette. The mask is cleaned
 * like the other extractors' (largest component, holes filled) but without opening or closing, since a cut-out's edge
 * is already the intended one. Confidence is the share of pixels whose alpha is decisive (within 5% of fully
 * transparent or opaque): a crisp cut-out scores near 1, a soft matte lower. Immutable and thread-safe.
 */
public final class AlphaSilhouettes implements SilhouetteExtractor {
  /** Each of fully transparent and fully opaque pixels must make up at least this share for a real cut-out. */
  static final double MIN_SHARE = 0.01;

  private static final int THRESHOLD = 128;
  private static final int DECISIVE = 13; // 5% of 255

  private final double minComponentFraction;

  /** @param minComponentFraction components below this fraction of the largest are specks (default 0.1) */
  public AlphaSilhouettes(double minComponentFraction) {
    if (!(minComponentFraction >= 0 && minComponentFraction <= 1)) {
      throw new IllegalArgumentException("minComponentFraction must be in [0, 1], got " + minComponentFraction);
    }
    this.minComponentFraction = minComponentFraction;
  }

  public AlphaSilhouettes() {
    this(0.1);
  }

  /**
   * Whether the image's alpha holds a real cut-out: it has an alpha channel with at least 1% fully transparent
   * (alpha 0) and at least 1% fully opaque (alpha 255) pixels.
   */
  public static boolean hasUsableAlpha(BufferedImage image) {
    if (!image.getColorModel().hasAlpha()) {
      return false;
    }
    int[] px = Pixels.argb(image);
    int clear = 0;
    int opaque = 0;
    for (int p : px) {
      int a = p >>> 24;
      clear += a == 0 ? 1 : 0;
      opaque += a == 255 ? 1 : 0;
    }
    double min = MIN_SHARE * px.length;
    return clear >= min && opaque >= min;
  }

  @Override
  public Silhouette extract(BufferedImage image) {
    int w = image.getWidth();
    int h = image.getHeight();
    if (!image.getColorModel().hasAlpha()) {
      return new Silhouette(Mask.empty(w, h), 0, false, 0, 0, name());
    }
    int[] px = Pixels.argb(image);
    byte[] raw = new byte[px.length];
    int decisive = 0;
    for (int i = 0; i < px.length; i++) {
      int a = px[i] >>> 24;
      raw[i] = (byte) (a >= THRESHOLD ? 1 : 0);
      decisive += (a <= DECISIVE || a >= 255 - DECISIVE) ? 1 : 0;
    }
    MaskCleanup.Settings settings = new MaskCleanup.Settings(0, 0, minComponentFraction);
    return MaskCleanup.finish(raw, w, h, settings, w, h, decisive / (double) px.length, name());
  }

  @Override
  public String name() {
    return "alpha";
  }
}
