package org.morphscout.demo;

/**
 * Paints a {@link Backdrop} into a linear-RGB buffer (3 floats per pixel, row-major), lit by the shot's
 * {@link Lighting}: light falls off away from the key side and toward the corners (vignette), as in a real studio.
 * Texture scales follow the picture size so a thumbnail and a full-size render look alike. Stateless.
 */
final class BackdropPainter {
  private BackdropPainter() {}

  static void paint(Shot shot, float[] out) {
    Backdrop bd = shot.backdrop();
    int w = shot.width();
    int h = shot.height();
    double[] a = new double[3];
    double[] b = new double[3];
    double[] c = new double[3];
    Colours.linear(bd.colourA(), a);
    Colours.linear(bd.colourB(), b);
    double lx = StrictMath.sin(Math.toRadians(shot.lighting().azimuthDeg()));
    double gain = 0.55 + 0.45 * Math.min(1.3, shot.lighting().intensity());
    double unit = Math.max(w, h) / 1024.0;
    long seed = bd.seed();
    double angle = (Noise.hash01(seed, 7, 7) - 0.5) * Math.PI / 3;
    double ga = StrictMath.sin(angle);
    double gb = StrictMath.cos(angle);
    // Broad, uneven paper/cloth: +-2 % over large distances.
    CoarseField blotch = new CoarseField(w, h,
        (x, y) -> 0.98 + 0.04 * Noise.value(seed ^ 0xB10L, x / (220.0 * unit), y / (220.0 * unit)));
    CoarseField slow = switch (bd.kind()) {
      case LINEN -> new CoarseField(w, h,
          (x, y) -> 0.88 + 0.24 * Noise.fractal(seed ^ 0x3L, x / (260.0 * unit), y / (170.0 * unit), 3));
      case SHELF -> new CoarseField(w, h,
          (x, y) -> 0.94 + 0.08 * Noise.fractal(seed ^ 0x5L, x / (90.0 * unit), 12.0 * y / h, 3));
      default -> null;
    };
    for (int y = 0; y < h; y++) {
      double fy = (y + 0.5) / h;
      for (int x = 0; x < w; x++) {
        double fx = (x + 0.5) / w;
        switch (bd.kind()) {
          case STUDIO_SWEEP -> sweep(fy, bd.horizon(), a, b, c);
          case GRADIENT -> mix(a, b, Noise.smooth(Noise.clamp(0.5 + (fx - 0.5) * ga + (fy - 0.5) * gb, 0, 1)), c);
          case LINEN -> linen(x / unit, y / unit, fy, bd.horizon(), seed, slow.at(x, y), a, b, c);
          case WOOD_TABLE -> woodTable(fx, fy, bd.horizon(), seed, a, b, c);
          case SHELF -> shelf(x / unit, fy, bd.horizon(), seed, slow.at(x, y), a, b, c);
        }
        // Key-side brighter, corners darker.
        double side = 1 - 0.18 * (fx - 0.5) * lx * 2;
        double vx = (fx - 0.5) * 2;
        double vy = (fy - 0.45) * 2;
        double vignette = 1 - 0.16 * (0.6 * vx * vx + 0.4 * vy * vy);
        double k = gain * blotch.at(x, y) * side * vignette;
        int i = 3 * (y * w + x);
        out[i] = (float) (c[0] * k);
        out[i + 1] = (float) (c[1] * k);
        out[i + 2] = (float) (c[2] * k);
      }
    }
  }

  private static void sweep(double fy, double horizon, double[] a, double[] b, double[] out) {
    // The paper curves from wall to floor over a wide band: no visible horizon line.
    mix(a, b, Noise.smoothstep(horizon - 0.3, horizon + 0.2, fy), out);
  }

  private static void linen(double x, double y, double fy, double horizon, long seed, double folds, double[] a,
      double[] b, double[] out) {
    mix(a, b, 0.35 * Noise.smoothstep(horizon - 0.2, horizon + 0.2, fy), out);
    double warp = Noise.value(seed, x / 2.2, y / 30.0);
    double weft = Noise.value(seed ^ 0x1L, x / 30.0, y / 2.2);
    double slub = Noise.value(seed ^ 0x2L, x / 14.0, y / 1.8);
    double t = (0.93 + 0.08 * (warp + weft - 1) + 0.05 * (slub - 0.5)) * folds;
    scale(out, t);
  }

  private static void woodTable(double fx, double fy, double horizon, long seed, double[] a, double[] b,
      double[] out) {
    if (fy < horizon) {
      // Wall, a little darker close to the table where the table blocks the bounce light.
      out[0] = a[0];
      out[1] = a[1];
      out[2] = a[2];
      scale(out, 0.9 + 0.1 * Noise.smoothstep(horizon, horizon - 0.25, fy));
      return;
    }
    double z = (fy - horizon) / (1 - horizon + 1e-9);
    woodGrain((fx - 0.5) * (z + 0.2) * 6, 1 / (z + 0.12), seed, b, out);
    // Back edge of the table: a thin darker line.
    if (fy - horizon < 0.004) {
      scale(out, 0.7);
    }
    scale(out, 0.85 + 0.15 * z);
  }

  private static void shelf(double xu, double fy, double horizon, long seed, double plaster, double[] a,
      double[] b, double[] out) {
    double front = Math.min(0.98, horizon + 0.14);
    double faceEnd = Math.min(1.0, front + 0.045);
    if (fy < horizon || fy >= faceEnd) {
      // Lime plaster wall; under the board it lies in the board's shadow.
      out[0] = a[0] * plaster;
      out[1] = a[1] * plaster;
      out[2] = a[2] * plaster;
      if (fy >= faceEnd) {
        scale(out, 0.45 + 0.35 * Noise.smoothstep(faceEnd, 1.25, fy));
      } else {
        scale(out, 0.88 + 0.12 * Noise.smoothstep(horizon, horizon - 0.3, fy));
      }
      return;
    }
    if (fy < front) {
      double z = (fy - horizon) / (front - horizon);
      woodGrain(xu / 700.0 * (z + 0.6), 1 / (z + 0.35), seed, b, out);
      scale(out, 0.8 + 0.2 * z);
    } else {
      // Front face of the board: end grain streaks, lit from above, slightly darker.
      woodGrain(xu / 700.0, 40 + (fy - front) * 60, seed, b, out);
      scale(out, 0.7);
    }
  }

  /** Plank grain at table coordinates (gx across, gy in depth): wavy growth rings, with board seams. */
  private static void woodGrain(double gx, double gy, long seed, double[] b, double[] out) {
    // Long streaks along the boards (x) with slowly wandering growth rings across them (depth).
    double distort = Noise.fractal(seed ^ 0x4L, gx * 0.25, gy * 0.8, 3);
    double phase = gy * 3.1 + 1.2 * distort;
    // Smoothed triangle wave in [0, 1]: ring profile without a sin call per pixel.
    double rings = Noise.smooth(Math.abs(2 * (phase - Math.floor(phase)) - 1));
    double streak = Noise.fractal(seed ^ 0x6L, gx * 0.35, gy * 28, 2);
    double fibre = Noise.value(seed ^ 0x8L, gx * 2.0, gy * 90);
    double t = 0.78 + 0.12 * rings + 0.16 * (streak - 0.5) + 0.06 * (fibre - 0.5);
    double board = gy / 1.7;
    double seam = board - Math.floor(board);
    if (seam < 0.01) {
      t *= 0.62;
    }
    out[0] = b[0] * t;
    out[1] = b[1] * t;
    out[2] = b[2] * t;
  }

  private static void mix(double[] a, double[] b, double t, double[] out) {
    out[0] = a[0] + (b[0] - a[0]) * t;
    out[1] = a[1] + (b[1] - a[1]) * t;
    out[2] = a[2] + (b[2] - a[2]) * t;
  }

  private static void scale(double[] c, double k) {
    c[0] *= k;
    c[1] *= k;
    c[2] *= k;
  }
}
