package org.morphscout.indexer.warp;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import org.morphscout.indexer.silhouette.Mask;

/** Masks and grids drawn for tests (shared by the warp, pairing and preview tests). */
public final class TestMasks {
  private TestMasks() {}

  /** Fills {@code shape} (in pixel coordinates) into a w x h mask, without antialiasing. */
  public static Mask draw(int w, int h, Shape shape) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_BYTE_GRAY);
    Graphics2D g = img.createGraphics();
    g.setColor(Color.WHITE);
    g.fill(shape);
    g.dispose();
    byte[] d = new byte[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        d[y * w + x] = (byte) ((img.getRaster().getSample(x, y, 0) > 127) ? 1 : 0);
      }
    }
    return new Mask(w, h, d);
  }

  public static Mask ellipse(int w, int h, double cx, double cy, double rx, double ry) {
    return draw(w, h, new Ellipse2D.Double(cx - rx, cy - ry, 2 * rx, 2 * ry));
  }

  /** Coverage grid (0/1 floats) of a disc with centre (cx, cy) in index coordinates. */
  public static float[] disc(int n, double cx, double cy, double r) {
    return ellipseGrid(n, cx, cy, r, r);
  }

  /** Coverage grid of an axis-aligned ellipse, index coordinates. */
  public static float[] ellipseGrid(int n, double cx, double cy, double rx, double ry) {
    float[] g = new float[n * n];
    for (int y = 0; y < n; y++) {
      for (int x = 0; x < n; x++) {
        double u = (x - cx) / rx;
        double v = (y - cy) / ry;
        g[y * n + x] = u * u + v * v <= 1 ? 1f : 0f;
      }
    }
    return g;
  }

  /**
   * An asymmetric outline (a boot: a tall shaft with a toe to one side and a notch), centred near (0, 0), about 100
   * units tall. No rotation or mirror symmetry, so alignment has a single right answer.
   */
  public static Shape boot() {
    Path2D.Double p = new Path2D.Double();
    p.moveTo(-20, -50);
    p.lineTo(10, -50);
    p.lineTo(12, 10);
    p.lineTo(45, 25);
    p.lineTo(45, 45);
    p.lineTo(-20, 45);
    p.lineTo(-20, 5);
    p.lineTo(-10, 0);
    p.lineTo(-20, -5);
    p.closePath();
    return p;
  }

  /** A vase outline whose neck half-width grows with t in [0, 1]; drawn about (0, 0), about 100 units tall. */
  public static Shape vase(double t) {
    double neck = 8 + 22 * t;
    Path2D.Double p = new Path2D.Double();
    p.moveTo(-neck, -50);
    p.lineTo(neck, -50);
    p.curveTo(neck, -20, 35, -15, 35, 15);
    p.curveTo(35, 40, 20, 50, 0, 50);
    p.curveTo(-20, 50, -35, 40, -35, 15);
    p.curveTo(-35, -15, -neck, -20, -neck, -50);
    p.closePath();
    return p;
  }

  public static Shape transformed(Shape s, AffineTransform t) {
    return t.createTransformedShape(s);
  }
}
