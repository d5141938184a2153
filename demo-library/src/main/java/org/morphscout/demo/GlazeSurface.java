package org.morphscout.demo;

/**
 * Albedo (linear RGB reflectance) of a glazed surface at a point given in surface coordinates: {@code arc}, the
 * distance around the vessel in cm (theta times the largest radius, so vertical features stay vertical), and
 * {@code h}, the height in cm. Adds what real glazes show: thickness variation, pooling above the foot, an unglazed
 * clay foot ring, and the texture. Stateless after construction; thread-safe.
 */
final class GlazeSurface {
  /** Height of the unglazed foot ring, cm. */
  private static final double FOOT_BAND_CM = 0.6;
  private static final int CLAY_BUFF = 0xCDB592;

  private final Glaze glaze;
  private final double heightCm;
  private final long seed;
  private final double[] base = new double[3];
  private final double[] accent = new double[3];
  private final double[] clay = new double[3];
  private final double[] speck = new double[3];
  private final double speckDensity;
  private final double speckSize;
  private final double stripePeriod;
  private final double stripeWidth;
  private final double dipLine;

  GlazeSurface(Glaze glaze, double heightCm) {
    this.glaze = glaze;
    this.heightCm = heightCm;
    this.seed = glaze.patternSeed();
    Colours.linear(glaze.baseRgb(), base);
    Colours.linear(glaze.accentRgb(), accent);
    Colours.linear(glaze.gloss() < 0.2 ? glaze.baseRgb() : CLAY_BUFF,
        clay);
    double lum = 0.2126 * base[0] + 0.7152 * base[1] + 0.0722 * base[2];
    // Iron spots show dark on light glazes; on dark glazes the speckle shows as pale crystals.
    Colours.linear(lum > 0.18 ? 0x35261B : 0xCFC3AC, speck);
    this.speckDensity = lum > 0.18 ? 0.35 : 0.18;
    this.speckSize = lum > 0.18 ? 1.0 : 0.75;
    this.stripePeriod = Math.max(0.9, heightCm / (5 + 6 * Noise.hash01(seed, 1, 0)));
    this.stripeWidth = 0.18 + 0.22 * Noise.hash01(seed, 2, 0);
    this.dipLine = heightCm * (0.48 + 0.2 * Noise.hash01(seed, 3, 0));
  }

  /** Albedo at (arc, h) into {@code out}; returns the local gloss factor in [0, 1] (0 on bare clay). */
  double albedo(double arc, double h, double[] out) {
    // Glaze thickness variation: +-8 % brightness over a few cm.
    double thick = Noise.fractal(seed ^ 0x7A3L, arc / 3.0, h / 3.0, 3);
    double shade = 0.92 + 0.16 * thick;
    // Glaze pools a little thicker and darker just above the foot.
    shade *= 1 - 0.12 * (1 - Noise.smoothstep(FOOT_BAND_CM, FOOT_BAND_CM + 2.0, h));
    out[0] = base[0] * shade;
    out[1] = base[1] * shade;
    out[2] = base[2] * shade;
    double gloss = glaze.gloss();
    switch (glaze.texture()) {
      case SPECKLE -> speckle(arc, h, out);
      case CRACKLE -> crackle(arc, h, out);
      case STRIPES -> stripes(arc, h, out);
      case DRIP_BAND -> dripBand(arc, h, out);
      case PLAIN -> { }
    }
    // Unglazed foot ring with a slightly wavy wax-resist edge.
    double edge = FOOT_BAND_CM + 0.12 * (Noise.value(seed ^ 0x55L, arc / 1.5, 0) - 0.5);
    double bare = 1 - Noise.smoothstep(edge - 0.05, edge + 0.05, h);
    if (bare > 0) {
      mix(out, clay, bare);
      gloss *= 1 - bare;
    }
    return gloss;
  }

  /** Albedo of the inside of the vessel (seen through the opening). */
  void interior(double arc, double depth, double[] out) {
    double[] c = glaze.texture() == GlazeTexture.DRIP_BAND ? accent : base;
    double shade = 0.92 + 0.16 * Noise.fractal(seed ^ 0x1F1L, arc / 3.0, depth / 3.0, 2);
    out[0] = c[0] * shade;
    out[1] = c[1] * shade;
    out[2] = c[2] * shade;
  }

  private void speckle(double arc, double h, double[] out) {
    double cell = 0.42;
    double gx = arc / cell;
    double gy = h / cell;
    long ix = (long) Math.floor(gx);
    long iy = (long) Math.floor(gy);
    double strength = 0;
    for (long j = iy - 1; j <= iy + 1; j++) {
      for (long i = ix - 1; i <= ix + 1; i++) {
        if (Noise.hash01(seed, i, j) > speckDensity) {
          continue;
        }
        double px = i + Noise.hash01(seed ^ 0x11L, i, j);
        double py = j + Noise.hash01(seed ^ 0x22L, i, j);
        double rad = speckSize * (0.07 + 0.2 * Noise.hash01(seed ^ 0x33L, i, j));
        double d = Math.sqrt((gx - px) * (gx - px) + (gy - py) * (gy - py));
        strength = Math.max(strength, 1 - Noise.smoothstep(rad * 0.6, rad, d));
      }
    }
    mix(out, speck, 0.85 * strength);
  }

  private void crackle(double arc, double h, double[] out) {
    double coarse = Noise.cellBorder(seed, arc / 1.3, h / 1.3);
    double fine = Noise.cellBorder(seed ^ 0x9L, arc / 0.55, h / 0.55);
    double line = Math.max(1 - Noise.smoothstep(0.015, 0.06, coarse), 0.6 * (1 - Noise.smoothstep(0.01, 0.05, fine)));
    // Crazing lines take up stain: a darker shade of the accent.
    double[] stain = {accent[0] * 0.5, accent[1] * 0.5, accent[2] * 0.5};
    mix(out, stain, 0.75 * line);
  }

  private void stripes(double arc, double h, double[] out) {
    double lo = heightCm * 0.18;
    double hi = heightCm * 0.86;
    if (h < lo || h > hi) {
      return;
    }
    double wobble = 0.25 * (Noise.value(seed ^ 0x44L, arc / 5.0, 0) - 0.5);
    double phase = (h - lo + wobble) / stripePeriod;
    double f = phase - Math.floor(phase);
    // Soft-edged band of width stripeWidth (fraction of a period), brushed edges.
    double band = Noise.smoothstep(0, 0.04, f) * (1 - Noise.smoothstep(stripeWidth, stripeWidth + 0.04, f));
    double brush = 0.8 + 0.2 * Noise.value(seed ^ 0x66L, arc / 0.4, h / 2.0);
    mix(out, accent, band * brush);
  }

  private void dripBand(double arc, double h, double[] out) {
    double runCell = 1.3;
    double g = arc / runCell;
    long ig = (long) Math.floor(g);
    double run = 0;
    for (long i = ig - 1; i <= ig + 1; i++) {
      double centre = i + Noise.hash01(seed ^ 0x77L, i, 0);
      double len = 0.3 + 3.2 * Noise.hash01(seed ^ 0x88L, i, 0) * Noise.hash01(seed ^ 0x99L, i, 0);
      double width = 0.22 + 0.12 * Noise.hash01(seed ^ 0xAAL, i, 0);
      double d = (g - centre) / width;
      // Compact bump (1 - d^2)^2: the rounded tip of a run, no exp needed.
      if (d > -1 && d < 1) {
        double q = 1 - d * d;
        run = Math.max(run, len * q * q);
      }
    }
    double boundary = dipLine - 0.4 * (Noise.value(seed ^ 0xBBL, arc / 4.0, 0) - 0.5) - run;
    double cover = Noise.smoothstep(boundary - 0.08, boundary + 0.08, h);
    if (cover <= 0) {
      return;
    }
    // The dipped glaze is thicker (darker) just at its edge, where it beads.
    double bead = 1 - 0.25 * (1 - Noise.smoothstep(boundary, boundary + 0.5, h));
    double[] c = {accent[0] * bead, accent[1] * bead, accent[2] * bead};
    mix(out, c, cover);
  }

  private static void mix(double[] out, double[] c, double t) {
    out[0] += (c[0] - out[0]) * t;
    out[1] += (c[1] - out[1]) * t;
    out[2] += (c[2] - out[2]) * t;
  }
}
