package org.morphscout.demo;

/**
 * Darkens the backdrop under each vessel: a tight contact shadow around the foot and a soft cast shadow thrown
 * away from the key light. Analytic soft ellipses (no blur pass), so the cost is one pass over each shadow's box.
 */
final class FloorShadows {
  private FloorShadows() {}

  static void apply(Shot shot, VesselGeometry geo, float[] linear) {
    int w = shot.width();
    int h = shot.height();
    Lighting light = shot.lighting();
    double lx = StrictMath.sin(Math.toRadians(light.azimuthDeg()));
    double rMax = geo.profile.maxRadiusCm() * geo.scale;
    double heightPx = geo.heightCm * geo.scale;
    double tilt = Math.max(geo.tilt, 0.04);
    // Lower key lights throw longer shadows.
    double length = 0.35 + 0.9 * (1 - StrictMath.sin(Math.toRadians(light.elevationDeg())));
    double castCx = geo.cx - lx * rMax * length;
    double castCy = geo.floorY - rMax * tilt * 0.5;
    double castAx = rMax * (1.15 + 0.5 * Math.abs(lx) * length);
    double castAy = Math.max(3, rMax * tilt * 1.3 + heightPx * 0.03);
    double castDark = Noise.clamp(0.42 * light.intensity() * (1 - 0.5 * light.ambient()), 0, 0.6);
    double contactAx = geo.footR * 1.08 + 2;
    double contactAy = Math.max(2, geo.footR * tilt * 1.1 + 1.5);
    double contactDark = 0.55;
    int x0 = (int) Math.max(0, Math.floor(Math.min(castCx - castAx, geo.cx - contactAx)));
    int x1 = (int) Math.min(w - 1, Math.ceil(Math.max(castCx + castAx, geo.cx + contactAx)));
    int y0 = (int) Math.max(0, Math.floor(Math.min(castCy - castAy, geo.floorY - contactAy)));
    int y1 = (int) Math.min(h - 1, Math.ceil(Math.max(castCy + castAy, geo.floorY + contactAy)));
    for (int y = y0; y <= y1; y++) {
      for (int x = x0; x <= x1; x++) {
        double px = x + 0.5;
        double py = y + 0.5;
        double ce = ellipseDistance(px - castCx, py - castCy, castAx, castAy);
        double te = ellipseDistance(px - geo.cx, py - geo.floorY, contactAx, contactAy);
        double k = (1 - castDark * (1 - Noise.smoothstep(0.15, 1.0, ce)))
            * (1 - contactDark * (1 - Noise.smoothstep(0.55, 1.0, te)));
        if (k < 1) {
          int i = 3 * (y * w + x);
          linear[i] *= (float) k;
          linear[i + 1] *= (float) k;
          linear[i + 2] *= (float) k;
        }
      }
    }
  }

  private static double ellipseDistance(double dx, double dy, double ax, double ay) {
    return Math.sqrt((dx / ax) * (dx / ax) + (dy / ay) * (dy / ay));
  }
}
