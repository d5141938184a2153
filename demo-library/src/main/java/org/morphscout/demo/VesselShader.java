package org.morphscout.demo;

/**
 * Shades one placed vessel: Lambert diffuse with a little wrap-around (soft studio light), Blinn-Phong specular
 * (Blinn, SIGGRAPH 1977) whose exponent and strength follow the glaze's gloss, a Schlick-style grazing reflection
 * of the backdrop, and contact darkening near the floor. Works in linear RGB. Not thread-safe (scratch buffers);
 * make one per vessel and thread.
 */
final class VesselShader {
  /** Diffuse wrap: light reaches a little past the terminator, as with a large soft box. */
  private static final double WRAP = 0.2;
  private static final int TABLE = 4096;
  private static final double[] GAUSS = new double[TABLE + 2];

  static {
    for (int i = 0; i <= TABLE; i++) {
      GAUSS[i] = StrictMath.exp(-9.0 * i / TABLE);
    }
    GAUSS[TABLE + 1] = GAUSS[TABLE];
  }

  /** Vertical tolerance of the soft-box highlight (normal y units): a tall light gives a tall highlight. */
  private static final double SOFTBOX_SPREAD = 0.45;

  private final VesselGeometry geo;
  private final GlazeSurface surface;
  private final double lx;
  private final double ly;
  private final double lz;
  private final double hx;
  private final double hy;
  private final double hz;
  private final double hxzX;
  private final double hxzZ;
  private final double vy;
  private final double vz;
  private final double[] lightColour = new double[3];
  private final double ambient;
  private final double[] env = new double[3];
  private final double maxRadiusCm;
  private final double openness;
  private final double[] sharpLobe;
  private final double[] broadLobe;
  private final double[] tmp = new double[3];
  private final double[] alb = new double[3];

  VesselShader(VesselGeometry geo, Glaze glaze, Lighting light, int backdropRgb) {
    this.geo = geo;
    this.surface = new GlazeSurface(glaze, geo.heightCm);
    double az = Math.toRadians(light.azimuthDeg());
    double el = Math.toRadians(light.elevationDeg());
    lx = StrictMath.sin(az) * StrictMath.cos(el);
    ly = StrictMath.sin(el);
    lz = StrictMath.cos(az) * StrictMath.cos(el);
    vy = geo.tilt;
    vz = Math.sqrt(1 - geo.tilt * geo.tilt);
    double hxx = lx;
    double hyy = ly + vy;
    double hzz = lz + vz;
    double n = Math.sqrt(hxx * hxx + hyy * hyy + hzz * hzz);
    hx = hxx / n;
    hy = hyy / n;
    hz = hzz / n;
    double hxz = Math.sqrt(hx * hx + hz * hz);
    hxzX = hx / hxz;
    hxzZ = hz / hxz;
    double w = light.warmth();
    lightColour[0] = light.intensity() * (1 + 0.08 * w);
    lightColour[1] = light.intensity() * (1 + 0.01 * w);
    lightColour[2] = light.intensity() * (1 - 0.08 * w);
    ambient = light.ambient();
    Colours.linear(backdropRgb, env);
    maxRadiusCm = geo.profile.maxRadiusCm();
    // How much light gets into the opening: wide bowls are bright inside, narrow bottle necks are dark holes.
    openness = Noise.clamp(geo.profile.lipRadiusCm() / (geo.heightCm * 0.45), 0.12, 1.0);
    double specExponent = 10 + 150 * glaze.gloss() * glaze.gloss();
    sharpLobe = powTable(specExponent);
    broadLobe = powTable(specExponent / 8);
  }

  /** x^e sampled on [0, 1]: the highlight lobes, tabulated so a pixel costs no pow call. */
  private static double[] powTable(double e) {
    double[] t = new double[TABLE + 2];
    for (int i = 0; i <= TABLE; i++) {
      t[i] = StrictMath.pow((double) i / TABLE, e);
    }
    t[TABLE + 1] = 1;
    return t;
  }

  /** Linear interpolation in a table over [0, 1]. */
  private static double lookup(double[] table, double x) {
    double f = Noise.clamp(x, 0, 1) * TABLE;
    int i = (int) f;
    return table[i] + (table[i + 1] - table[i]) * (f - i);
  }

  /** exp(-q) for q &gt;= 0, tabulated on [0, 9] (beyond it the lobe is below 1.3e-4, taken as 0). */
  private static double gaussian(double q) {
    if (q >= 9) {
      return 0;
    }
    return lookup(GAUSS, q / 9);
  }

  /** Linear colour of the sample at (x, y) showing {@code region}; writes {@code out[0..2]}. */
  void shade(double x, double y, int region, double[] out) {
    switch (region) {
      case VesselGeometry.INTERIOR -> interior(x, y, out);
      case VesselGeometry.RIM -> rim(x, out);
      case VesselGeometry.HANDLE -> handle(x, y, out);
      default -> body(x, y, out);
    }
  }

  private void body(double x, double y, double[] out) {
    geo.bodyPoint(x, y, tmp);
    double h = tmp[0];
    double u = tmp[1];
    double cosT = Math.sqrt(Math.max(0, 1 - u * u));
    double slope = geo.slope(h);
    double nlen = Math.sqrt(1 + slope * slope);
    double nx = u / nlen;
    double ny = -slope / nlen;
    double nz = cosT / nlen;
    double gloss = surface.albedo(Noise.asin(u) * maxRadiusCm, h, alb);
    // Contact darkening: the floor blocks part of the fill light in the lowest centimetre.
    double contact = 0.72 + 0.28 * Noise.smoothstep(0, 1.2, h);
    light(nx, ny, nz, gloss, contact, out);
  }

  private void rim(double x, double[] out) {
    double u = Noise.clamp((x - geo.cx) / Math.max(1e-6, geo.lipR), -1, 1);
    surface.albedo(Noise.asin(u) * maxRadiusCm, geo.heightCm, alb);
    // The rim top faces up; glaze breaks thin and lighter on the edge.
    for (int c = 0; c < 3; c++) {
      alb[c] = Math.min(1, alb[c] * 1.12 + 0.02);
    }
    light(0.25 * u, 0.95, 0.2, 0.5, 1.0, out);
  }

  private void interior(double x, double y, double[] out) {
    double ex = Noise.clamp((x - geo.cx) / geo.innerR, -1, 1);
    double ey = Noise.clamp((y - geo.lipY) / Math.max(1e-6, geo.innerR * geo.tilt), -1, 1);
    surface.interior(Noise.asin(ex) * maxRadiusCm, ey, alb);
    // Far wall (top of the ellipse) faces the camera and the light; the near wall's inside is in its own shadow.
    double b = openness * (0.5 - 0.28 * ey);
    // The inner wall opposite the light is the lit one.
    b *= Noise.clamp(1 - 0.5 * ex * lx, 0.3, 1.6);
    double fill = ambient * 0.6 * openness;
    for (int c = 0; c < 3; c++) {
      out[c] = alb[c] * (fill + b * lightColour[c] * (1 - ambient));
    }
  }

  private void handle(double x, double y, double[] out) {
    double w = Math.min(1, geo.nearestHandle(x, y, tmp));
    double s = Math.sqrt(Math.max(0, 1 - w * w));
    // Screen y points down; surface normals point up when the offset does.
    double nx = tmp[0] * w;
    double ny = -tmp[1] * w;
    double gloss = surface.albedo(0, geo.heightCm * 0.7, alb);
    light(nx, ny, s, gloss, 1.0, out);
  }

  private void light(double nx, double ny, double nz, double gloss, double occlusion, double[] out) {
    double ndl = nx * lx + ny * ly + nz * lz;
    double diffuse = Math.max(0, (ndl + WRAP) / (1 + WRAP));
    // Departure from plain Blinn-Phong: the key is a tall soft box, so the lobe is Blinn-Phong around the axis
    // (horizontal alignment of normal and half vector) times a broad Gaussian in the vertical, which draws the
    // vertical streak highlights typical of glazed ware in studio photographs.
    double spec = 0;
    double nh = Math.sqrt(nx * nx + nz * nz);
    if (ndl > -0.1 && nh > 1e-9) {
      double ca = Math.max(0, (nx * hxzX + nz * hxzZ) / nh);
      double dv = (ny - hy * 0.6) / SOFTBOX_SPREAD;
      double vertical = gaussian(dv * dv);
      spec = gloss * vertical * (0.85 * lookup(sharpLobe, ca) + 0.1 * lookup(broadLobe, ca));
    }
    double ndv = Math.max(0, ny * vy + nz * vz);
    double f = 1 - ndv;
    double fresnel = gloss * 0.25 * f * f * f * f;
    double sky = ambient * (0.85 + 0.15 * ny);
    for (int c = 0; c < 3; c++) {
      double lit = alb[c] * (sky + (1 - ambient) * diffuse * lightColour[c]) * occlusion;
      out[c] = lit * (1 - fresnel) + fresnel * env[c] + spec * lightColour[c];
    }
  }
}
