package org.morphscout.indexer.warp;

/**
 * A dense displacement field {@code u} on a {@code width x height} grid, in grid pixels: grid point {@code x} (index
 * coordinates, pixel centres at integers) corresponds to {@code x + u(x)}. In a {@link WarpResult} the grid is the
 * {@link Canvas}, {@code x} a point of A and {@code x + u(x)} the matching point of B after alignment.
 *
 * <p>The arrays are row-major and shared, not copied, so hot loops and previews need no copies: do not modify them.
 *
 * @param dx x components, length {@code width * height}
 * @param dy y components, length {@code width * height}
 */
public record DisplacementField(int width, int height, float[] dx, float[] dy) {

  public DisplacementField {
    if (width <= 0 || height <= 0) {
      throw new IllegalArgumentException("field size must be positive: " + width + "x" + height);
    }
    if (dx.length != width * height || dy.length != width * height) {
      throw new IllegalArgumentException("field arrays must hold width * height values");
    }
  }

  /** The zero field. */
  public static DisplacementField zero(int width, int height) {
    return new DisplacementField(width, height, new float[width * height], new float[width * height]);
  }

  /** x component at fractional index coordinates, bilinear, clamped to the border. */
  public float sampleDx(double x, double y) {
    return Grids.bilinear(dx, width, height, x, y);
  }

  /** y component at fractional index coordinates, bilinear, clamped to the border. */
  public float sampleDy(double x, double y) {
    return Grids.bilinear(dy, width, height, x, y);
  }

  /** This field times {@code t} (for in-between shapes). */
  public DisplacementField scaled(double t) {
    float[] sx = new float[dx.length];
    float[] sy = new float[dy.length];
    for (int i = 0; i < sx.length; i++) {
      sx[i] = (float) (dx[i] * t);
      sy[i] = (float) (dy[i] * t);
    }
    return new DisplacementField(width, height, sx, sy);
  }

  /**
   * The field of the mapping "first this, then {@code next}": {@code x -> y = x + u(x) -> y + v(y)}, so the result
   * is {@code u(x) + v(x + u(x))} with {@code v} sampled bilinearly.
   */
  public DisplacementField compose(DisplacementField next) {
    if (next.width != width || next.height != height) {
      throw new IllegalArgumentException("fields differ in size");
    }
    float[] cx = new float[dx.length];
    float[] cy = new float[dy.length];
    composeInto(dx, dy, next.dx, next.dy, width, height, cx, cy);
    return new DisplacementField(width, height, cx, cy);
  }

  /** out = u + v o (id + u); out may not alias the inputs. Bilinear weights are shared by both components. */
  static void composeInto(float[] ux, float[] uy, float[] vx, float[] vy, int w, int h, float[] outX, float[] outY) {
    float maxX = w - 1;
    float maxY = h - 1;
    for (int y = 0, i = 0; y < h; y++) {
      for (int x = 0; x < w; x++, i++) {
        float px = x + ux[i];
        float py = y + uy[i];
        px = px < 0 ? 0 : (px > maxX ? maxX : px);
        py = py < 0 ? 0 : (py > maxY ? maxY : py);
        int x0 = (int) px;
        int y0 = (int) py;
        int x1 = x0 < w - 1 ? x0 + 1 : x0;
        int y1 = y0 < h - 1 ? y0 + 1 : y0;
        float fx = px - x0;
        float fy = py - y0;
        int a = y0 * w + x0;
        int b = y0 * w + x1;
        int c = y1 * w + x0;
        int d = y1 * w + x1;
        float w00 = (1 - fx) * (1 - fy);
        float w10 = fx * (1 - fy);
        float w01 = (1 - fx) * fy;
        float w11 = fx * fy;
        outX[i] = ux[i] + w00 * vx[a] + w10 * vx[b] + w01 * vx[c] + w11 * vx[d];
        outY[i] = uy[i] + w00 * vy[a] + w10 * vy[b] + w01 * vy[c] + w11 * vy[d];
      }
    }
  }

  /**
   * Jacobian determinant of {@code x -> x + u(x)} at every grid point: {@code (1 + dux/dx)(1 + duy/dy) -
   * (dux/dy)(duy/dx)}, with central differences inside and one-sided differences at the border. A value &lt;= 0
   * means the mapping folds there.
   */
  public float[] jacobianDeterminant() {
    float[] det = new float[width * height];
    for (int y = 0; y < height; y++) {
      int ym = Math.max(0, y - 1);
      int yp = Math.min(height - 1, y + 1);
      float sy = yp - ym == 0 ? 0 : 1f / (yp - ym);
      for (int x = 0; x < width; x++) {
        int xm = Math.max(0, x - 1);
        int xp = Math.min(width - 1, x + 1);
        float sx = xp - xm == 0 ? 0 : 1f / (xp - xm);
        int r = y * width;
        float uxx = (dx[r + xp] - dx[r + xm]) * sx;
        float uyx = (dy[r + xp] - dy[r + xm]) * sx;
        float uxy = (dx[yp * width + x] - dx[ym * width + x]) * sy;
        float uyy = (dy[yp * width + x] - dy[ym * width + x]) * sy;
        det[r + x] = (1 + uxx) * (1 + uyy) - uxy * uyx;
      }
    }
    return det;
  }

  /**
   * Fraction of the region's pixels (coverage &gt;= 0.5) where the Jacobian determinant is &lt;= 0; 0 for an empty
   * region.
   */
  public double foldFraction(float[] region) {
    if (region.length != width * height) {
      throw new IllegalArgumentException("region must match the field's grid");
    }
    float[] det = jacobianDeterminant();
    int inside = 0;
    int folded = 0;
    for (int i = 0; i < det.length; i++) {
      if (region[i] >= 0.5f) {
        inside++;
        if (det[i] <= 0) {
          folded++;
        }
      }
    }
    return inside == 0 ? 0 : folded / (double) inside;
  }

  /** Largest displacement length, in grid pixels. */
  public double maxLength() {
    double m = 0;
    for (int i = 0; i < dx.length; i++) {
      m = Math.max(m, Math.hypot(dx[i], dy[i]));
    }
    return m;
  }
}
