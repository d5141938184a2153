package org.morphscout.indexer.silhouette;

import java.awt.Color;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.util.SplittableRandom;

/** Synthetic test scenes: shapes drawn with antialiasing on generated backgrounds, with the known mask of each. */
final class Scenes {
  static final int W = 768;
  static final int H = 576;

  enum ShapeKind {
    DISK,
    VASE,
    ELLIPSE,
    STAR
  }

  enum Background {
    PLAIN,
    LINEAR_GRADIENT,
    TWO_COLOUR_GRADIENT,
    WALL_AND_FLOOR,
    NOISE,
    STRIPES,
    CHECKER
  }

  private Scenes() {}

  static Shape shape(ShapeKind kind, double cx, double cy, double size) {
    return switch (kind) {
      case DISK -> new Ellipse2D.Double(cx - size, cy - size, 2 * size, 2 * size);
      case ELLIPSE -> AffineTransform.getRotateInstance(Math.toRadians(25), cx, cy)
          .createTransformedShape(new Ellipse2D.Double(cx - 1.3 * size, cy - 0.7 * size, 2.6 * size, 1.4 * size));
      case STAR -> star(cx, cy, 1.2 * size, 0.55 * size, 5);
      case VASE -> vase(cx, cy, size);
    };
  }

  /** A vase-like outline: narrow neck, lip, round belly, flat foot (size ~ half height). */
  static Shape vase(double cx, double cy, double s) {
    Path2D.Double p = new Path2D.Double();
    double top = cy - 1.1 * s;
    double bottom = cy + 1.1 * s;
    p.moveTo(cx - 0.32 * s, top);
    p.lineTo(cx + 0.32 * s, top);
    p.quadTo(cx + 0.18 * s, cy - 0.7 * s, cx + 0.22 * s, cy - 0.45 * s);
    p.curveTo(cx + 0.95 * s, cy - 0.2 * s, cx + 0.9 * s, cy + 0.7 * s, cx + 0.35 * s, cy + 0.95 * s);
    p.lineTo(cx + 0.4 * s, bottom);
    p.lineTo(cx - 0.4 * s, bottom);
    p.lineTo(cx - 0.35 * s, cy + 0.95 * s);
    p.curveTo(cx - 0.9 * s, cy + 0.7 * s, cx - 0.95 * s, cy - 0.2 * s, cx - 0.22 * s, cy - 0.45 * s);
    p.quadTo(cx - 0.18 * s, cy - 0.7 * s, cx - 0.32 * s, top);
    p.closePath();
    return p;
  }

  static Shape star(double cx, double cy, double outer, double inner, int points) {
    Path2D.Double p = new Path2D.Double();
    for (int i = 0; i < 2 * points; i++) {
      double r = i % 2 == 0 ? outer : inner;
      double a = -Math.PI / 2 + i * Math.PI / points;
      double x = cx + r * Math.cos(a);
      double y = cy + r * Math.sin(a);
      if (i == 0) {
        p.moveTo(x, y);
      } else {
        p.lineTo(x, y);
      }
    }
    p.closePath();
    return p;
  }

  /** The background alone, TYPE_INT_ARGB, opaque. */
  static BufferedImage background(Background bg, int w, int h, long seed) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = img.createGraphics();
    switch (bg) {
      case PLAIN -> {
        g.setColor(new Color(236, 232, 224));
        g.fillRect(0, 0, w, h);
      }
      case LINEAR_GRADIENT -> {
        g.setPaint(new GradientPaint(0, 0, new Color(245, 245, 240), 0, h, new Color(170, 172, 180)));
        g.fillRect(0, 0, w, h);
      }
      case TWO_COLOUR_GRADIENT -> {
        g.setPaint(new GradientPaint(0, 0, new Color(250, 225, 160), w, h, new Color(120, 170, 220)));
        g.fillRect(0, 0, w, h);
      }
      case WALL_AND_FLOOR -> {
        g.setColor(new Color(226, 222, 214));
        g.fillRect(0, 0, w, h);
        g.setColor(new Color(150, 128, 104));
        g.fillRect(0, (int) (0.68 * h), w, h);
      }
      case NOISE -> {
        SplittableRandom rnd = new SplittableRandom(seed);
        int[] px = new int[w * h];
        for (int i = 0; i < px.length; i++) {
          int v = 205 + (int) Math.round(rnd.nextGaussian() * 18);
          v = Math.max(0, Math.min(255, v));
          px[i] = 0xff000000 | v << 16 | v << 8 | Math.min(255, v + 6);
        }
        img.setRGB(0, 0, w, h, px, 0, w);
      }
      case STRIPES -> {
        for (int x = 0; x < w; x += 6) {
          g.setColor(new Color(228, 226, 220));
          g.fillRect(x, 0, 3, h);
          g.setColor(new Color(178, 176, 170));
          g.fillRect(x + 3, 0, 3, h);
        }
      }
      case CHECKER -> {
        for (int y = 0; y < h; y += 4) {
          for (int x = 0; x < w; x += 4) {
            g.setColor(((x + y) / 4) % 2 == 0 ? new Color(232, 232, 232) : new Color(188, 190, 200));
            g.fillRect(x, y, 4, 4);
          }
        }
      }
    }
    g.dispose();
    return img;
  }

  /** Draws the shape, antialiased, with a shaded fill, onto the image. */
  static void drawObject(BufferedImage img, Shape s, Color light, Color dark) {
    Graphics2D g = img.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    var b = s.getBounds2D();
    g.setPaint(new GradientPaint(
        (float) b.getMinX(), (float) b.getMinY(), light, (float) b.getMaxX(), (float) b.getMaxY(), dark));
    g.fill(s);
    g.dispose();
  }

  /** The known mask: the shape filled without antialiasing (pixel centres inside). */
  static Mask mask(int w, int h, Shape... shapes) {
    BufferedImage m = new BufferedImage(w, h, BufferedImage.TYPE_BYTE_GRAY);
    Graphics2D g = m.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
    g.setColor(Color.WHITE);
    for (Shape s : shapes) {
      g.fill(s);
    }
    g.dispose();
    byte[] data = (byte[]) m.getRaster().getDataElements(0, 0, w, h, new byte[w * h]);
    for (int i = 0; i < data.length; i++) {
      data[i] = (byte) ((data[i] & 0xff) > 127 ? 1 : 0);
    }
    return new Mask(w, h, data);
  }

  static final Color OBJECT_LIGHT = new Color(176, 58, 52);
  static final Color OBJECT_DARK = new Color(92, 34, 60);
}
