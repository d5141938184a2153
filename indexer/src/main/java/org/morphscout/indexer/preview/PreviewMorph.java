package org.morphscout.indexer.preview;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.warp.Canvas;
import org.morphscout.indexer.warp.DisplacementField;
import org.morphscout.indexer.warp.Similarity;
import org.morphscout.indexer.warp.WarpResult;

/**
 * Renders in-between frames of a morph from A to B using a {@link WarpResult} (similarity + displacement field).
 *
 * <p>Frames live in A's frame (A's aspect ratio, long side {@link #longSide()}). For time t in [0, 1], with u the
 * field (A's point x matches aligned B's point x + u(x)), the intermediate shape places x at x + t u(x). An output
 * point y is filled from A at y - t u(y) and from B at y + (1 - t) u(y) (mapped into B's image through the inverse
 * similarity), then the two are cross-dissolved with weight t. Departure from an exact inverse: u is sampled at y
 * instead of solving y = x + t u(x), which is accurate while u is smooth (the demons field is). Consequently frame 0
 * is A itself and the last frame is B brought onto A by the similarity.
 *
 * <p>Outside the field's canvas the displacement fades to zero within two canvas pixels; samples outside an image are
 * clamped to its border. Immutable and thread-safe.
 */
public final class PreviewMorph {
  private final int longSide;

  /**
   * @param longSide long side of every frame in pixels, 16..4096 (320 is plenty for judging a pair)
   */
  public PreviewMorph(int longSide) {
    if (longSide < 16 || longSide > 4096) {
      throw new IllegalArgumentException("preview long side must be 16..4096 pixels, got " + longSide);
    }
    this.longSide = longSide;
  }

  public int longSide() {
    return longSide;
  }

  /** One image of a chain with its silhouette (whose mask the warp was estimated on). */
  public record Stop(BufferedImage image, Silhouette silhouette) {}

  /**
   * @param a image A (any type; read as ARGB)
   * @param silhouetteA A's silhouette; its mask's size relates A's pixels to the warp's canvas
   * @param b image B
   * @param silhouetteB B's silhouette
   * @param warp the warp from {@code silhouetteA.mask()} to {@code silhouetteB.mask()}
   * @param count number of frames, at least 2 (t = 0 and t = 1 included)
   * @return frames of type {@code TYPE_INT_ARGB}, all of the same size
   */
  public List<BufferedImage> frames(BufferedImage a, Silhouette silhouetteA, BufferedImage b,
      Silhouette silhouetteB, WarpResult warp, int count) {
    if (count < 2) {
      throw new IllegalArgumentException("a morph preview needs at least 2 frames, got " + count);
    }
    Leg leg = new Leg(a, silhouetteA.mask(), b, silhouetteB.mask(), warp);
    List<BufferedImage> out = new ArrayList<>(count);
    for (int i = 0; i < count; i++) {
      out.add(leg.render(i / (double) (count - 1)));
    }
    return out;
  }

  /**
   * Frames along a chain FROM, VIA..., TO: each leg is rendered as by {@link #frames} and letterboxed into the
   * first image's frame size, so every frame has the same size. Each leg after the first skips its first frame when
   * it would repeat the previous leg's end.
   *
   * @param warps one warp per leg: {@code warps.get(i)} from stop i to stop i + 1
   */
  public List<BufferedImage> chain(List<Stop> stops, List<WarpResult> warps, int framesPerLeg) {
    if (stops.size() < 2 || warps.size() != stops.size() - 1) {
      throw new IllegalArgumentException("a chain needs at least 2 stops and one warp per leg");
    }
    int[] size = frameSize(stops.get(0).image().getWidth(), stops.get(0).image().getHeight());
    List<BufferedImage> out = new ArrayList<>();
    for (int i = 0; i < warps.size(); i++) {
      Stop from = stops.get(i);
      Stop to = stops.get(i + 1);
      List<BufferedImage> leg = frames(from.image(), from.silhouette(), to.image(), to.silhouette(), warps.get(i),
          framesPerLeg);
      for (int k = i == 0 ? 0 : 1; k < leg.size(); k++) {
        out.add(letterbox(leg.get(k), size[0], size[1]));
      }
    }
    return out;
  }

  /** Frame size for an image: same aspect, long side {@link #longSide()}. */
  int[] frameSize(int w, int h) {
    if (w >= h) {
      return new int[] {longSide, Math.max(1, (int) Math.round(longSide * h / (double) w))};
    }
    return new int[] {Math.max(1, (int) Math.round(longSide * w / (double) h)), longSide};
  }

  private static BufferedImage letterbox(BufferedImage img, int w, int h) {
    if (img.getWidth() == w && img.getHeight() == h) {
      return img;
    }
    BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = out.createGraphics();
    g.setColor(Color.BLACK);
    g.fillRect(0, 0, w, h);
    double k = Math.min(w / (double) img.getWidth(), h / (double) img.getHeight());
    int dw = (int) Math.round(img.getWidth() * k);
    int dh = (int) Math.round(img.getHeight() * k);
    g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
    g.drawImage(img, (w - dw) / 2, (h - dh) / 2, dw, dh, null);
    g.dispose();
    return out;
  }

  /** Everything one leg needs, precomputed. */
  private final class Leg {
    private final int[] pa;
    private final int aw;
    private final int ah;
    private final int[] pb;
    private final int bw;
    private final int bh;
    private final int fw;
    private final int fh;
    private final double maskAPerFrameX;
    private final double maskAPerFrameY;
    private final double bImagePerMaskX;
    private final double bImagePerMaskY;
    private final double aImagePerMaskX;
    private final double aImagePerMaskY;
    private final Canvas canvas;
    private final DisplacementField field;
    private final double[] inv;

    Leg(BufferedImage a, Mask maskA, BufferedImage b, Mask maskB, WarpResult warp) {
      aw = a.getWidth();
      ah = a.getHeight();
      bw = b.getWidth();
      bh = b.getHeight();
      pa = a.getRGB(0, 0, aw, ah, null, 0, aw);
      pb = b.getRGB(0, 0, bw, bh, null, 0, bw);
      int[] size = frameSize(aw, ah);
      fw = size[0];
      fh = size[1];
      maskAPerFrameX = maskA.width() / (double) fw;
      maskAPerFrameY = maskA.height() / (double) fh;
      aImagePerMaskX = aw / (double) maskA.width();
      aImagePerMaskY = ah / (double) maskA.height();
      bImagePerMaskX = bw / (double) maskB.width();
      bImagePerMaskY = bh / (double) maskB.height();
      canvas = warp.canvas();
      field = warp.field();
      inv = inverse(warp.similarity());
    }

    BufferedImage render(double t) {
      int[] out = new int[fw * fh];
      int n = field.width();
      for (int oy = 0; oy < fh; oy++) {
        double my = (oy + 0.5) * maskAPerFrameY;
        double cy = canvas.canvasY(my);
        for (int ox = 0; ox < fw; ox++) {
          double mx = (ox + 0.5) * maskAPerFrameX;
          double cx = canvas.canvasX(mx);
          double ux = 0;
          double uy = 0;
          double fade = fade(cx, n) * fade(cy, n);
          if (fade > 0) {
            ux = field.sampleDx(cx, cy) * fade / canvas.scale();
            uy = field.sampleDy(cx, cy) * fade / canvas.scale();
          }
          // A at y - t u(y), in A's image pixels.
          int ca = t >= 1 ? 0 : sample(pa, aw, ah, (mx - t * ux) * aImagePerMaskX - 0.5,
              (my - t * uy) * aImagePerMaskY - 0.5);
          int cb = 0;
          if (t > 0) {
            double qx = mx + (1 - t) * ux;
            double qy = my + (1 - t) * uy;
            double bx = inv[0] * qx + inv[1] * qy + inv[2];
            double by = inv[3] * qx + inv[4] * qy + inv[5];
            cb = sample(pb, bw, bh, bx * bImagePerMaskX - 0.5, by * bImagePerMaskY - 0.5);
          }
          out[oy * fw + ox] = t <= 0 ? ca : t >= 1 ? cb : mix(ca, cb, t);
        }
      }
      BufferedImage img = new BufferedImage(fw, fh, BufferedImage.TYPE_INT_ARGB);
      img.setRGB(0, 0, fw, fh, out, 0, fw);
      return img;
    }
  }

  /** 1 inside [0, n-1], falling linearly to 0 two canvas pixels outside. */
  private static double fade(double c, int n) {
    double outside = c < 0 ? -c : (c > n - 1 ? c - (n - 1) : 0);
    return Math.max(0, 1 - outside / 2);
  }

  /** The 2x3 matrix of the inverse similarity (A-mask to B-mask coordinates). */
  static double[] inverse(Similarity s) {
    double c = Math.cos(s.rotation());
    double sn = Math.sin(s.rotation());
    double m = s.mirror() ? -1 : 1;
    double a = m * c / s.scale();
    double b = m * sn / s.scale();
    double d = -sn / s.scale();
    double e = c / s.scale();
    return new double[] {a, b, -(a * s.tx() + b * s.ty()), d, e, -(d * s.tx() + e * s.ty())};
  }

  /** Bilinear ARGB sample at index coordinates, clamped to the border. */
  static int sample(int[] px, int w, int h, double x, double y) {
    x = Math.max(0, Math.min(w - 1, x));
    y = Math.max(0, Math.min(h - 1, y));
    int x0 = (int) x;
    int y0 = (int) y;
    int x1 = Math.min(x0 + 1, w - 1);
    int y1 = Math.min(y0 + 1, h - 1);
    double fx = x - x0;
    double fy = y - y0;
    int p00 = px[y0 * w + x0];
    int p10 = px[y0 * w + x1];
    int p01 = px[y1 * w + x0];
    int p11 = px[y1 * w + x1];
    int out = 0;
    for (int shift = 0; shift < 32; shift += 8) {
      double top = ((p00 >>> shift) & 0xff) * (1 - fx) + ((p10 >>> shift) & 0xff) * fx;
      double bottom = ((p01 >>> shift) & 0xff) * (1 - fx) + ((p11 >>> shift) & 0xff) * fx;
      int v = (int) Math.round(top * (1 - fy) + bottom * fy);
      out |= (v & 0xff) << shift;
    }
    return out;
  }

  /** (1 - t) p + t q per channel, alpha included. */
  static int mix(int p, int q, double t) {
    int out = 0;
    for (int shift = 0; shift < 32; shift += 8) {
      double v = ((p >>> shift) & 0xff) * (1 - t) + ((q >>> shift) & 0xff) * t;
      out |= ((int) Math.round(v) & 0xff) << shift;
    }
    return out;
  }
}
