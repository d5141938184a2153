package org.morphscout.indexer.warp;

/**
 * Dense, diffeomorphic registration of two coverage grids (aligned masks) by diffeomorphic demons.
 *
 * <p>Follows Algorithm 2 of Vercauteren, Pennec, Perchant and Ayache (2009, "Diffeomorphic demons: efficient
 * non-parametric image registration", NeuroImage 45(1)): at each iteration, (1) an update field {@code v} from the
 * demons forces of Thirion (1998, Medical Image Analysis 2(3)) with the step bounded through sigma_x, (2) fluid-like
 * Gaussian smoothing of {@code v}, (3) {@code exp(v)} by scaling and squaring, (4) composition {@code s <- s o
 * exp(v)}, (5) diffusion-like Gaussian smoothing of {@code s}. Paper terms map to code as: fixed image F =
 * {@code fixed}, moving image M = {@code moving}, transformation s = identity + {@code (ux, uy)}, update u =
 * {@code (vx, vy)}.
 *
 * <p>Departures from the paper, all deliberate: the images are truncated signed distance transforms of the masks
 * (not intensities), so the forces reach beyond the outline; the gradient is the symmetric (ESM) average of the fixed
 * and warped moving gradients, as the same authors recommend; the smoothing is applied to the displacement field
 * (s minus identity); a fixed iteration budget per pyramid level, with an early stop when the update vanishes or
 * the sum of squared differences stalls, replaces the paper's convergence test; scaling and squaring scales an update
 * down to at most one pixel, not half a pixel ({@link #EXP_MAX_STEP}); samples outside the grid are clamped to the
 * border.
 *
 * <p>Immutable and thread-safe: each call allocates its own working arrays.
 */
public final class DemonsRegistration {
  /** Relative energy improvement below which an iteration counts as stalled. */
  private static final double STALL_RATIO = 0.005;

  /**
   * Scaling and squaring halves an update until its longest vector is at most this, in pixels of the level, before
   * composing it with itself. The paper suggests half a pixel (from memory of its exponential-map section); one
   * pixel needs one composition fewer wherever the update
   * is longer than half a pixel (a third of the compositions on the demo library) and, measured on its 4,723 warped
   * pairs together with 5 instead of 6 iterations at the finest level, moves pair scores by 0.01 points on average
   * and at most 0.46 (of 100), the warped IoU by at most 0.011 (docs/BENCHMARKS.md).
   */
  private static final double EXP_MAX_STEP = 1.0;

  private final DemonsConfig config;

  public DemonsRegistration(DemonsConfig config) {
    this.config = config;
  }

  public DemonsConfig config() {
    return config;
  }

  /**
   * Finds {@code u} with {@code moving(x + u(x)) ~ fixed(x)}.
   *
   * @param fixed coverage in [0, 1] on a {@code gridSize x gridSize} grid (A)
   * @param moving coverage in [0, 1] on the same grid (B, already aligned)
   * @return the displacement field in grid pixels
   */
  public DisplacementField register(float[] fixed, float[] moving) {
    int n = config.gridSize();
    if (fixed.length != n * n || moving.length != n * n) {
      throw new IllegalArgumentException("demons inputs must be " + n + "x" + n + " grids");
    }
    int levels = config.levels();
    float[][] fixedPyr = new float[levels][];
    float[][] movingPyr = new float[levels][];
    fixedPyr[0] = fixed;
    movingPyr[0] = moving;
    for (int l = 1; l < levels; l++) {
      int s = n >> (l - 1);
      fixedPyr[l] = Grids.downsample(fixedPyr[l - 1], s, s);
      movingPyr[l] = Grids.downsample(movingPyr[l - 1], s, s);
    }
    float[] ux = null;
    float[] uy = null;
    for (int l = levels - 1; l >= 0; l--) {
      int s = n >> l;
      if (ux == null) {
        ux = new float[s * s];
        uy = new float[s * s];
      } else {
        ux = upsample(ux, s / 2);
        uy = upsample(uy, s / 2);
      }
      // Truncation: a quarter of the level's side keeps the far field (where every shape looks round) from
      // dominating, while still pulling outlines that start far apart.
      float limit = Math.max(3f, s / 4f);
      float[] f = SignedDistance.of(fixedPyr[l], s, s, limit);
      float[] m = SignedDistance.of(movingPyr[l], s, s, limit);
      int iterations = config.iterations().get(levels - 1 - l);
      new Level(s, f, m, ux, uy).run(iterations);
    }
    return new DisplacementField(n, n, ux, uy);
  }

  /**
   * Doubles a field's grid (bilinear) and its displacements. Each output column's and row's source indices and
   * fractions are computed once; the arithmetic is {@link Grids#bilinear}'s, so the result is the same to the last
   * bit as sampling each pixel on its own ({@code ReferenceKernelsTest}).
   */
  static float[] upsample(float[] u, int s) {
    int s2 = 2 * s;
    int[] i0 = new int[s2];
    int[] i1 = new int[s2];
    float[] frac = new float[s2];
    for (int x = 0; x < s2; x++) {
      double c = (x + 0.5) / 2 - 0.5;
      c = c < 0 ? 0 : (c > s - 1 ? s - 1 : c);
      i0[x] = (int) c;
      i1[x] = Math.min(i0[x] + 1, s - 1);
      frac[x] = (float) (c - i0[x]);
    }
    float[] out = new float[s2 * s2];
    for (int y = 0; y < s2; y++) {
      int r0 = i0[y] * s;
      int r1 = i1[y] * s;
      float fy = frac[y];
      for (int x = 0; x < s2; x++) {
        int x0 = i0[x];
        int x1 = i1[x];
        float fx = frac[x];
        float top = u[r0 + x0] + fx * (u[r0 + x1] - u[r0 + x0]);
        float bottom = u[r1 + x0] + fx * (u[r1 + x1] - u[r1 + x0]);
        out[y * s2 + x] = 2f * (top + fy * (bottom - top));
      }
    }
    return out;
  }

  /** The working state of one pyramid level. */
  private final class Level {
    private final int s;
    private final float[] f;
    private final float[] m;
    private final float[] ux;
    private final float[] uy;
    private final float[] gfx;
    private final float[] gfy;
    private final float[] wm;
    private final float[] vx;
    private final float[] vy;
    private final float[] tx;
    private final float[] ty;
    private final GaussianSmoother fluid;
    private final GaussianSmoother diffusion;

    Level(int s, float[] f, float[] m, float[] ux, float[] uy) {
      this.s = s;
      this.f = f;
      this.m = m;
      this.ux = ux;
      this.uy = uy;
      int len = s * s;
      gfx = new float[len];
      gfy = new float[len];
      gradient(f, s, gfx, gfy);
      wm = new float[len];
      vx = new float[len];
      vy = new float[len];
      tx = new float[len];
      ty = new float[len];
      fluid = new GaussianSmoother(config.sigmaFluid(), s, s);
      diffusion = new GaussianSmoother(config.sigmaDiffusion(), s, s);
    }

    void run(int iterations) {
      // sigma_x bounds each update: |v| <= sigma_x / 2 (Vercauteren et al. 2009, Section 2.2).
      float sigmaX = (float) (2 * config.maxStep());
      float invSigmaX2 = 1f / (sigmaX * sigmaX);
      float[] gwx = tx;
      float[] gwy = ty;
      double previousEnergy = Double.POSITIVE_INFINITY;
      int stalled = 0;
      for (int it = 0; it < iterations; it++) {
        Grids.warp(m, s, s, ux, uy, wm);
        gradient(wm, s, gwx, gwy);
        double moved = 0;
        double energy = 0;
        for (int i = 0; i < wm.length; i++) {
          float diff = f[i] - wm[i];
          energy += diff * diff;
          float jx = 0.5f * (gfx[i] + gwx[i]);
          float jy = 0.5f * (gfy[i] + gwy[i]);
          float denom = jx * jx + jy * jy + diff * diff * invSigmaX2;
          if (denom < 1e-9f) {
            vx[i] = 0;
            vy[i] = 0;
          } else {
            vx[i] = diff * jx / denom;
            vy[i] = diff * jy / denom;
          }
          moved += Math.abs(vx[i]) + Math.abs(vy[i]);
        }
        // Stop when the update vanishes, or when the similarity energy (sum of squared differences) has improved
        // by less than 0.5% for three iterations in a row.
        if (moved / wm.length < 1e-4) {
          break;
        }
        stalled = energy > previousEnergy * (1 - STALL_RATIO) ? stalled + 1 : 0;
        if (stalled >= 3) {
          break;
        }
        previousEnergy = Math.min(previousEnergy, energy);
        fluid.smooth(vx);
        fluid.smooth(vy);
        exponentiate();
        // s <- s o exp(v): u_new(x) = e(x) + u(x + e(x)); e is in (vx, vy).
        DisplacementField.composeInto(vx, vy, ux, uy, s, s, tx, ty);
        System.arraycopy(tx, 0, ux, 0, ux.length);
        System.arraycopy(ty, 0, uy, 0, uy.length);
        diffusion.smooth(ux);
        diffusion.smooth(uy);
      }
    }

    /**
     * exp(v) in place by scaling and squaring: scale until |v| <= {@link #EXP_MAX_STEP}, then compose with itself N
     * times.
     */
    private void exponentiate() {
      double max2 = 0;
      for (int i = 0; i < vx.length; i++) {
        max2 = Math.max(max2, vx[i] * vx[i] + vy[i] * vy[i]);
      }
      double max = Math.sqrt(max2);
      int steps = max <= EXP_MAX_STEP ? 0 : (int) Math.ceil(Math.log(max / EXP_MAX_STEP) / Math.log(2));
      if (steps == 0) {
        return; // already small: exp(v) ~ id + v to first order, as in the paper's N = 0 case
      }
      float k = (float) Math.scalb(1.0, -steps);
      for (int i = 0; i < vx.length; i++) {
        vx[i] *= k;
        vy[i] *= k;
      }
      for (int step = 0; step < steps; step++) {
        DisplacementField.composeInto(vx, vy, vx, vy, s, s, tx, ty);
        System.arraycopy(tx, 0, vx, 0, vx.length);
        System.arraycopy(ty, 0, vy, 0, vy.length);
      }
    }
  }

  /**
   * The gradient of an {@code s x s} grid: central differences, one-sided at the border. Halving is a multiplication
   * by 0.5 (exact, so the same as dividing by 2). Each interior difference runs over the whole grid as one long loop
   * (a loop per row of 16 to 64 pixels spends much of its time entering and leaving); the x differences it computes
   * across a row's ends are then replaced by the one-sided ones. Identical to a per-pixel loop
   * ({@code ReferenceKernelsTest}).
   */
  static void gradient(float[] img, int s, float[] gx, float[] gy) {
    int n = s * s;
    for (int i = 1; i < n - 1; i++) {
      gx[i] = (img[i + 1] - img[i - 1]) * 0.5f;
    }
    for (int r = 0; r < n; r += s) {
      gx[r] = img[r + 1] - img[r];
      gx[r + s - 1] = img[r + s - 1] - img[r + s - 2];
    }
    int last = n - s;
    for (int x = 0; x < s; x++) {
      gy[x] = img[s + x] - img[x];
      gy[last + x] = img[last + x] - img[last - s + x];
    }
    for (int i = s; i < last; i++) {
      gy[i] = (img[i + s] - img[i - s]) * 0.5f;
    }
  }
}
