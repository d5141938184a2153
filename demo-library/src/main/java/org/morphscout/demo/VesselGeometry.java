package org.morphscout.demo;

import java.awt.BasicStroke;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Area;
import java.awt.geom.CubicCurve2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;

/**
 * Screen-space geometry of one placed vessel seen slightly from above.
 *
 * <p>Model: every horizontal section at height h is a circle of radius r(h), imaged as an ellipse centred at
 * (footX, floorY - h * s) with semi-axes (r * s, r * s * k), where s is pixels per cm and k the camera tilt. The
 * silhouette is taken as the side profile (|x - footX| &lt;= r(h) s on the row of height h) plus the lip and foot
 * ellipses plus the handles: the exact envelope of all section ellipses differs from it by a fraction of a pixel for
 * the tilts used here, and this is the shape both the mask and the shading use. Handles are C-shaped cubic Bezier
 * straps stroked with round caps. Immutable.
 */
final class VesselGeometry {
  static final int OUTSIDE = 0;
  static final int BODY = 1;
  static final int RIM = 2;
  static final int INTERIOR = 3;
  static final int HANDLE = 4;

  private static final int OUTLINE_SAMPLES = 240;
  private static final int HANDLE_SAMPLES = 48;

  final VesselProfile profile;
  final double cx;
  final double floorY;
  final double scale;
  final double tilt;
  final double heightCm;
  final double lipY;
  final double lipR;
  final double innerR;
  final double footR;
  /** Profile samples per vessel: the per-pixel shading reads tables instead of evaluating the spline. */
  private static final int TABLE = 2048;
  private final double[] radiusTable = new double[TABLE + 1];
  private final double[] slopeTable = new double[TABLE + 1];
  private final double tableStep;
  private final double[][] handleLines;
  private final double[] handleHalfWidths;
  private final Shape outline;

  VesselGeometry(Placement p, double cameraTilt) {
    this.profile = p.profile();
    this.cx = p.footX();
    this.floorY = p.floorY();
    this.scale = p.pxPerCm();
    this.tilt = cameraTilt;
    this.heightCm = profile.heightCm();
    this.lipY = floorY - heightCm * scale;
    this.lipR = profile.lipRadiusCm() * scale;
    // Wall thickness about 0.5 cm, never more than a third of the opening.
    this.innerR = Math.max(0, lipR - Math.min(0.5 * scale, lipR / 3));
    this.footR = profile.footRadiusCm() * scale;
    for (int k = 0; k <= TABLE; k++) {
      double h = heightCm * k / TABLE;
      radiusTable[k] = profile.radiusAt(h) * scale;
      slopeTable[k] = profile.slopeAt(h);
    }
    this.tableStep = TABLE / heightCm;
    Handle[] handles = {profile.rightHandle(), profile.leftHandle()};
    int n = 0;
    for (Handle hd : handles) {
      n += hd.present() ? 1 : 0;
    }
    this.handleLines = new double[n][];
    this.handleHalfWidths = new double[n];
    Area area = new Area(bodyPolygon());
    area.add(new Area(ellipse(lipY, lipR)));
    area.add(new Area(ellipse(floorY, footR)));
    int i = 0;
    for (int side = 0; side < 2; side++) {
      Handle hd = handles[side];
      if (!hd.present()) {
        continue;
      }
      CubicCurve2D curve = handleCurve(hd, side == 0 ? 1 : -1);
      handleLines[i] = sample(curve);
      handleHalfWidths[i] = hd.thicknessCm() * scale / 2;
      BasicStroke stroke = new BasicStroke((float) (hd.thicknessCm() * scale), BasicStroke.CAP_ROUND,
          BasicStroke.JOIN_ROUND);
      area.add(new Area(stroke.createStrokedShape(curve)));
      i++;
    }
    this.outline = area;
  }

  Shape outline() {
    return outline;
  }

  Rectangle bounds() {
    return outline.getBounds();
  }

  /** Radius in pixels at height hCm (clamped), from the table: within 1e-3 px of the exact profile. */
  double radiusPx(double hCm) {
    return lookup(radiusTable, hCm);
  }

  /** dr/dh at height hCm (clamped), from the table. */
  double slope(double hCm) {
    return lookup(slopeTable, hCm);
  }

  private double lookup(double[] table, double hCm) {
    double f = Noise.clamp(hCm, 0, heightCm) * tableStep;
    int i = (int) f;
    if (i >= TABLE) {
      return table[TABLE];
    }
    return table[i] + (table[i + 1] - table[i]) * (f - i);
  }

  /** Which part of the vessel the point (x, y) shows; pixel centres are at integer + 0.5. */
  int region(double x, double y) {
    return region(x, y, rowRadius(y));
  }

  /** Body half-width (px) on the row at {@code y}, or -1 above the lip / below the foot: cacheable per row. */
  double rowRadius(double y) {
    double h0 = (floorY - y) / scale;
    return h0 >= 0 && h0 <= heightCm ? radiusPx(h0) : -1;
  }

  /** {@link #region(double, double)} with the row's {@link #rowRadius(double)} already known. */
  int region(double x, double y, double rowRadius) {
    double dx = x - cx;
    if (tilt > 0 && lipR > 0) {
      double ey = (y - lipY) / (lipR * tilt);
      double ex = dx / lipR;
      if (ex * ex + ey * ey <= 1) {
        if (innerR > 0) {
          double ix = dx / innerR;
          double iy = (y - lipY) / (innerR * tilt);
          if (ix * ix + iy * iy <= 1) {
            return INTERIOR;
          }
        }
        return RIM;
      }
    }
    if (rowRadius >= 0 && Math.abs(dx) <= rowRadius) {
      return BODY;
    }
    if (y > floorY && tilt > 0) {
      double ex = dx / footR;
      double ey = (y - floorY) / (footR * tilt);
      if (ex * ex + ey * ey <= 1) {
        return BODY;
      }
    }
    return nearestHandle(x, y, null) <= 1 ? HANDLE : OUTSIDE;
  }

  /**
   * The front surface point seen at (x, y): writes height (cm, clamped to the vessel) into {@code out[0]} and
   * u = sin(theta) in [-1, 1] into {@code out[1]}, theta being the angle around the axis (0 = facing the camera).
   * Solves y = floorY - h s + r(h) s k cos(theta) by fixed-point iteration (converges in a few steps for k &lt; 0.5).
   */
  void bodyPoint(double x, double y, double[] out) {
    double dx = x - cx;
    double h = (floorY - y) / scale;
    double u = 0;
    for (int it = 0; it < 3; it++) {
      double hc = Noise.clamp(h, 0, heightCm);
      double r = Math.max(1e-6, radiusPx(hc));
      u = Noise.clamp(dx / r, -1, 1);
      h = (floorY - y + r * tilt * Math.sqrt(1 - u * u)) / scale;
    }
    out[0] = Noise.clamp(h, 0, heightCm);
    double r = Math.max(1e-6, radiusPx(out[0]));
    out[1] = Noise.clamp(dx / r, -1, 1);
  }

  /**
   * Normalised distance (1 = on the strap's edge) from (x, y) to the nearest handle centreline; when {@code offset}
   * is given, the unit vector from the centreline to the point is written into it. Infinity without handles.
   */
  double nearestHandle(double x, double y, double[] offset) {
    double best = Double.POSITIVE_INFINITY;
    for (int hI = 0; hI < handleLines.length; hI++) {
      double[] line = handleLines[hI];
      double half = handleHalfWidths[hI];
      for (int k = 0; k + 3 < line.length; k += 2) {
        double ax = line[k];
        double ay = line[k + 1];
        double bx = line[k + 2];
        double by = line[k + 3];
        double vx = bx - ax;
        double vy = by - ay;
        double len2 = vx * vx + vy * vy;
        double t = len2 == 0 ? 0 : Noise.clamp(((x - ax) * vx + (y - ay) * vy) / len2, 0, 1);
        double px = x - (ax + t * vx);
        double py = y - (ay + t * vy);
        double d = Math.sqrt(px * px + py * py);
        double norm = d / half;
        if (norm < best) {
          best = norm;
          if (offset != null) {
            offset[0] = d == 0 ? 0 : px / d;
            offset[1] = d == 0 ? 0 : py / d;
          }
        }
      }
    }
    return best;
  }

  private Path2D bodyPolygon() {
    Path2D.Double path = new Path2D.Double();
    double[] xs = new double[OUTLINE_SAMPLES + 1];
    double[] ys = new double[OUTLINE_SAMPLES + 1];
    for (int i = 0; i <= OUTLINE_SAMPLES; i++) {
      double h = heightCm * i / OUTLINE_SAMPLES;
      xs[i] = profile.radiusAt(h) * scale;
      ys[i] = floorY - h * scale;
    }
    path.moveTo(cx + xs[0], ys[0]);
    for (int i = 1; i <= OUTLINE_SAMPLES; i++) {
      path.lineTo(cx + xs[i], ys[i]);
    }
    for (int i = OUTLINE_SAMPLES; i >= 0; i--) {
      path.lineTo(cx - xs[i], ys[i]);
    }
    path.closePath();
    return path;
  }

  private Ellipse2D ellipse(double centreY, double radius) {
    double ry = radius * tilt;
    return new Ellipse2D.Double(cx - radius, centreY - ry, 2 * radius, 2 * ry);
  }

  /** The strap's centreline: leaves the body at the upper attachment, swings out by the reach, returns lower. */
  private CubicCurve2D handleCurve(Handle hd, int side) {
    double thick = hd.thicknessCm() * scale;
    double hu = hd.upperFraction() * heightCm;
    double hl = hd.lowerFraction() * heightCm;
    double ru = radiusPx(hu);
    double rl = radiusPx(hl);
    double x0 = cx + side * (ru - 0.3 * thick);
    double y0 = floorY - hu * scale;
    double x3 = cx + side * (rl - 0.3 * thick);
    double y3 = floorY - hl * scale;
    double outer = cx + side * (Math.max(ru, rl) + hd.reachCm() * scale);
    // A cubic Bezier with both inner control points at x = c peaks at 0.125 x0 + 0.75 c + 0.125 x3.
    double c = (outer - 0.125 * (x0 + x3)) / 0.75;
    double span = y3 - y0;
    return new CubicCurve2D.Double(x0, y0, c, y0 - 0.12 * span, c, y3 + 0.02 * span, x3, y3);
  }

  private static double[] sample(CubicCurve2D c) {
    double[] pts = new double[2 * (HANDLE_SAMPLES + 1)];
    for (int i = 0; i <= HANDLE_SAMPLES; i++) {
      double t = (double) i / HANDLE_SAMPLES;
      double a = (1 - t) * (1 - t) * (1 - t);
      double b = 3 * (1 - t) * (1 - t) * t;
      double d = 3 * (1 - t) * t * t;
      double e = t * t * t;
      pts[2 * i] = a * c.getX1() + b * c.getCtrlX1() + d * c.getCtrlX2() + e * c.getX2();
      pts[2 * i + 1] = a * c.getY1() + b * c.getCtrlY1() + d * c.getCtrlY2() + e * c.getY2();
    }
    return pts;
  }
}
