package org.morphscout.indexer.warp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The optimised grid kernels against plain reference versions (brute force, unfused). */
class ReferenceKernelsTest {
  private static final long SEED = 977L;

  @Test
  void signedDistanceMatchesBruteForce() {
    Random r = new Random(SEED);
    int w = 23;
    int h = 17;
    float[] cov = new float[w * h];
    for (int i = 0; i < cov.length; i++) {
      cov[i] = r.nextDouble() < 0.3 ? 1f : 0f;
    }
    float[] fast = SignedDistance.of(cov, w, h, 100f);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        boolean inside = cov[y * w + x] >= 0.5f;
        double best = Double.POSITIVE_INFINITY;
        for (int yy = 0; yy < h; yy++) {
          for (int xx = 0; xx < w; xx++) {
            if ((cov[yy * w + xx] >= 0.5f) != inside) {
              best = Math.min(best, Math.hypot(xx - x, yy - y));
            }
          }
        }
        double expected = inside ? best - 0.5 : 0.5 - best;
        assertThat((double) fast[y * w + x]).as("(%s,%s) seed %s", x, y, SEED).isCloseTo(expected, within(1e-3));
      }
    }
  }

  @Test
  void gaussianMatchesPlainConvolutionAndKeepsConstants() {
    gaussianMatchesPlainConvolution(20, 1.3);
  }

  @Test
  void gaussianOnGridsNarrowerThanItsKernel() {
    // No pixel of a 6-pixel row has the whole 9-tap kernel inside: every one takes the renormalised border path.
    gaussianMatchesPlainConvolution(6, 1.3);
    gaussianMatchesPlainConvolution(9, 1.3);
  }

  @Test
  void gaussianEqualsAPlainPerPixelLoopExactly() {
    // Square and oblong grids, interiors of every size down to none, the default sigma and others.
    int[][] sizes = {{64, 64}, {16, 16}, {32, 20}, {7, 12}, {6, 6}, {9, 40}};
    double[] sigmas = {1.0, 0.5, 1.3, 2.2};
    Random r = new Random(SEED);
    for (int[] size : sizes) {
      for (double sigma : sigmas) {
        int w = size[0];
        int h = size[1];
        float[] img = new float[w * h];
        for (int i = 0; i < img.length; i++) {
          img[i] = (float) (4 * r.nextGaussian());
        }
        float[] fast = img.clone();
        GaussianSmoother smoother = new GaussianSmoother(sigma, w, h);
        smoother.smooth(fast);
        float[] plain = plainGaussian(img, w, h, sigma);
        assertThat(fast).as("%dx%d, sigma %s, seed %s", w, h, sigma, SEED).containsExactly(plain);
        // Scratch left from one call must not leak into the next.
        float[] again = img.clone();
        smoother.smooth(again);
        assertThat(again).as("second call, %dx%d, sigma %s, seed %s", w, h, sigma, SEED).containsExactly(plain);
      }
    }
  }

  @Test
  void gradientEqualsAPlainPerPixelLoopExactly() {
    Random r = new Random(SEED);
    for (int s : new int[] {8, 16, 33, 64}) {
      float[] img = new float[s * s];
      for (int i = 0; i < img.length; i++) {
        img[i] = (float) (3 * r.nextGaussian());
      }
      float[] gx = new float[s * s];
      float[] gy = new float[s * s];
      DemonsRegistration.gradient(img, s, gx, gy);
      for (int y = 0; y < s; y++) {
        for (int x = 0; x < s; x++) {
          // Central differences inside, one-sided at the border (common practice).
          int xm = Math.max(0, x - 1);
          int xp = Math.min(s - 1, x + 1);
          int ym = Math.max(0, y - 1);
          int yp = Math.min(s - 1, y + 1);
          float ex = (img[y * s + xp] - img[y * s + xm]) / (xp - xm);
          float ey = (img[yp * s + x] - img[ym * s + x]) / (yp - ym);
          assertThat(gx[y * s + x]).as("gx (%d,%d) of %d, seed %s", x, y, s, SEED).isEqualTo(ex);
          assertThat(gy[y * s + x]).as("gy (%d,%d) of %d, seed %s", x, y, s, SEED).isEqualTo(ey);
        }
      }
    }
  }

  /**
   * The smoothing one pixel at a time, in the order the smoother documents: along rows the centre, then the pairs at
   * distance 1, 2, ... (times 1 / the kernel's sum inside, divided by the cut kernel's sum near the border); along
   * columns the centre, then the taps from the top down, times 1 / their sum.
   */
  private static float[] plainGaussian(float[] img, int w, int h, double sigma) {
    int radius = (int) Math.ceil(3 * sigma);
    float[] k = new float[radius + 1];
    for (int i = 0; i <= radius; i++) {
      k[i] = (float) Math.exp(-0.5 * i * i / (sigma * sigma));
    }
    float full = k[0];
    for (int i = 1; i <= radius; i++) {
      full += 2 * k[i];
    }
    float invFull = 1f / full;
    float[] rows = new float[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        if (x >= radius && x < w - radius) {
          float acc = k[0] * img[i];
          for (int d = 1; d <= radius; d++) {
            acc += k[d] * (img[i - d] + img[i + d]);
          }
          rows[i] = acc * invFull;
        } else {
          float acc = k[0] * img[i];
          float norm = k[0];
          for (int d = -radius; d <= radius; d++) {
            if (d != 0 && x + d >= 0 && x + d < w) {
              acc += k[Math.abs(d)] * img[i + d];
              norm += k[Math.abs(d)];
            }
          }
          rows[i] = acc / norm;
        }
      }
    }
    float[] out = new float[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        float acc = k[0] * rows[y * w + x];
        float norm = k[0];
        for (int d = -radius; d <= radius; d++) {
          if (d != 0 && y + d >= 0 && y + d < h) {
            acc += k[Math.abs(d)] * rows[(y + d) * w + x];
            norm += k[Math.abs(d)];
          }
        }
        out[y * w + x] = acc * (1f / norm);
      }
    }
    return out;
  }

  @Test
  void quarterIouEqualsTheSoftIouExactly() {
    Random r = new Random(SEED);
    for (int round = 0; round < 200; round++) {
      int n = 1 + r.nextInt(4096);
      float[] a = new float[n];
      float[] b = new float[n];
      double fill = r.nextDouble();
      for (int i = 0; i < n; i++) {
        a[i] = r.nextDouble() < fill ? r.nextInt(5) * 0.25f : 0f;
        b[i] = r.nextDouble() < fill ? r.nextInt(5) * 0.25f : 0f;
      }
      assertThat(Grids.quarterIou(a, b)).as("round %d, seed %s", round, SEED).isEqualTo(Grids.iou(a, b));
    }
    assertThat(Grids.quarterIou(new float[16], new float[16])).isEqualTo(Grids.iou(new float[16], new float[16]));
  }

  @Test
  void rasterisingEqualsAPlainPerSampleLoopExactly() {
    Random r = new Random(SEED);
    // A large object, and a small one off-centre in its mask (a box much smaller than the mask).
    org.morphscout.indexer.silhouette.Mask[] masks = {TestMasks.ellipse(97, 80, 45, 38, 30, 21),
        TestMasks.ellipse(97, 80, 72, 18, 9, 6)};
    double[] covered = new double[2];
    for (int round = 0; round < 200; round++) {
      org.morphscout.indexer.silhouette.Mask mask = masks[round % 2];
      MaskMoments box = MaskMoments.of(mask);
      int n = 8 + r.nextInt(60);
      Canvas canvas = new Canvas(n, 0.3 + r.nextDouble(), -20 + 30 * r.nextDouble(), -20 + 30 * r.nextDouble());
      Similarity sim = Similarity.through(0.5 + r.nextDouble(), (r.nextDouble() - 0.5) * 2 * Math.PI,
          r.nextBoolean(), 45, 38, 40 + 10 * r.nextDouble(), 30 + 10 * r.nextDouble());
      assertThat(Grids.rasterise(mask, canvas)).as("A, round %d, seed %s", round, SEED)
          .containsExactly(plainRasterise(mask, canvas, new double[] {1, 0, 0, 0, 1, 0}));
      assertThat(Grids.rasterise(mask, canvas, sim)).as("B, round %d, seed %s", round, SEED)
          .containsExactly(plainRasterise(mask, canvas, sim.inverseMatrix()));
      // Knowing the object's box, samples outside it are skipped: the same grids.
      assertThat(Grids.rasterise(mask, box, canvas)).as("A in its box, round %d, seed %s", round, SEED)
          .containsExactly(plainRasterise(mask, canvas, new double[] {1, 0, 0, 0, 1, 0}));
      assertThat(Grids.rasterise(mask, box, canvas, sim)).as("B in its box, round %d, seed %s", round, SEED)
          .containsExactly(plainRasterise(mask, canvas, sim.inverseMatrix()));
      covered[round % 2] += Grids.sum(Grids.rasterise(mask, canvas, sim)) + Grids.sum(Grids.rasterise(mask, canvas));
    }
    assertThat(covered[0]).as("the canvases must see the large object, seed %s", SEED).isGreaterThan(50);
    assertThat(covered[1]).as("the canvases must see the small object, seed %s", SEED).isGreaterThan(50);
  }

  /** 2x2 supersampling, each sample's mask coordinates computed on its own. */
  private static float[] plainRasterise(org.morphscout.indexer.silhouette.Mask mask, Canvas canvas, double[] m) {
    int n = canvas.size();
    float[] out = new float[n * n];
    for (int j = 0; j < n; j++) {
      for (int i = 0; i < n; i++) {
        int hits = 0;
        for (double oy : new double[] {-0.25, 0.25}) {
          for (double ox : new double[] {-0.25, 0.25}) {
            double ax = canvas.maskX(i + ox);
            double ay = canvas.maskY(j + oy);
            int x = (int) Math.floor(m[0] * ax + m[1] * ay + m[2]);
            int y = (int) Math.floor(m[3] * ax + m[4] * ay + m[5]);
            if (x >= 0 && y >= 0 && x < mask.width() && y < mask.height() && mask.data()[y * mask.width() + x] != 0) {
              hits++;
            }
          }
        }
        out[j * n + i] = hits * 0.25f;
      }
    }
    return out;
  }

  @Test
  void upsamplingEqualsPerPixelBilinearExactly() {
    Random r = new Random(SEED);
    for (int s : new int[] {1, 2, 8, 16, 32}) {
      float[] u = new float[s * s];
      for (int i = 0; i < u.length; i++) {
        u[i] = (float) (5 * r.nextGaussian());
      }
      float[] fast = DemonsRegistration.upsample(u, s);
      int s2 = 2 * s;
      for (int y = 0; y < s2; y++) {
        for (int x = 0; x < s2; x++) {
          float plain = 2f * Grids.bilinear(u, s, s, (x + 0.5) / 2 - 0.5, (y + 0.5) / 2 - 0.5);
          assertThat(fast[y * s2 + x]).as("(%d,%d) of %d, seed %s", x, y, s, SEED).isEqualTo(plain);
        }
      }
    }
  }

  @Test
  void angleNormalisationEqualsTheIeeeRemainder() {
    Random r = new Random(SEED);
    double[] edges = {0, -0.0, Math.PI, -Math.PI, 2 * Math.PI, -2 * Math.PI, 2.5 * Math.PI, -2.5 * Math.PI,
        3 * Math.PI, -3 * Math.PI, Math.nextUp(Math.PI), Math.nextDown(-Math.PI), 1e-300, 40};
    for (int i = 0; i < 20_000 + edges.length; i++) {
      double angle = i < edges.length ? edges[i] : (r.nextDouble() - 0.5) * 12 * Math.PI;
      double plain = Math.IEEEremainder(angle, 2 * Math.PI);
      plain = plain <= -Math.PI ? plain + 2 * Math.PI : plain;
      // Equal in value (a zero's sign may differ, which no caller can tell apart).
      assertThat(Similarity.normalise(angle)).as("angle %s, seed %s", angle, SEED).isCloseTo(plain, within(0.0));
    }
  }

  private static void gaussianMatchesPlainConvolution(int n, double sigma) {
    Random r = new Random(SEED);
    float[] img = new float[n * n];
    for (int i = 0; i < img.length; i++) {
      img[i] = (float) r.nextGaussian();
    }
    float[] fast = img.clone();
    new GaussianSmoother(sigma, n, n).smooth(fast);
    int radius = (int) Math.ceil(3 * sigma);
    for (int y = 0; y < n; y++) {
      for (int x = 0; x < n; x++) {
        // Separable kernel cut at the border and renormalised per axis: plain double loops.
        double acc = 0;
        double norm = 0;
        for (int dy = -radius; dy <= radius; dy++) {
          for (int dx = -radius; dx <= radius; dx++) {
            int xx = x + dx;
            int yy = y + dy;
            if (xx >= 0 && yy >= 0 && xx < n && yy < n) {
              double k = Math.exp(-0.5 * (dx * dx + dy * dy) / (sigma * sigma));
              acc += k * img[yy * n + xx];
              norm += k;
            }
          }
        }
        assertThat((double) fast[y * n + x]).as("seed %s", SEED).isCloseTo(acc / norm, within(1e-4));
      }
    }
    float[] constant = new float[n * n];
    java.util.Arrays.fill(constant, 2.5f);
    new GaussianSmoother(sigma, n, n).smooth(constant);
    for (float v : constant) {
      assertThat(v).isCloseTo(2.5f, within(1e-5f));
    }
  }

  @Test
  void fusedWarpAndComposeMatchPerSampleBilinear() {
    Random r = new Random(SEED);
    int n = 16;
    float[] img = new float[n * n];
    float[] ux = new float[n * n];
    float[] uy = new float[n * n];
    float[] vx = new float[n * n];
    float[] vy = new float[n * n];
    for (int i = 0; i < img.length; i++) {
      img[i] = r.nextFloat();
      ux[i] = (float) (3 * r.nextGaussian());
      uy[i] = (float) (3 * r.nextGaussian());
      vx[i] = (float) r.nextGaussian();
      vy[i] = (float) r.nextGaussian();
    }
    float[] warped = new float[n * n];
    Grids.warp(img, n, n, ux, uy, warped);
    float[] cx = new float[n * n];
    float[] cy = new float[n * n];
    DisplacementField.composeInto(ux, uy, vx, vy, n, n, cx, cy);
    for (int y = 0; y < n; y++) {
      for (int x = 0; x < n; x++) {
        int i = y * n + x;
        double px = x + ux[i];
        double py = y + uy[i];
        assertThat(warped[i]).isCloseTo(Grids.bilinear(img, n, n, px, py), within(1e-5f));
        assertThat(cx[i]).isCloseTo(ux[i] + Grids.bilinear(vx, n, n, px, py), within(1e-4f));
        assertThat(cy[i]).isCloseTo(uy[i] + Grids.bilinear(vy, n, n, px, py), within(1e-4f));
      }
    }
  }
}
