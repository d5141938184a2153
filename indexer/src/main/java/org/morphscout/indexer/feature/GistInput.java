package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;
import org.morphscout.indexer.colour.CieLab;

/**
 * Prepares the input tensor of the built-in GIST model for one image: float32 [4, 128, 128], row-major.
 *
 * <ul>
 *   <li>The image is stretched to 128x128 with alpha composited over mid-grey ({@link ImageResampler}).
 *   <li>Channel 0: luminance t = L* / 100 in [0, 1], locally contrast-normalised as in the prefilter of Oliva and
 *       Torralba (2001): {@code (t - G*t) / (sqrt(G*(t - G*t)^2) + }{@link #CONTRAST_FLOOR}{@code )}, where G* is a
 *       near-Gaussian blur of about 8.5 px ({@link #blur}). This removes illumination gradients (wavelengths
 *       above ~50 px are attenuated) and equalises contrast, so the Gabor energies describe structure, not exposure.
 *       The floor keeps flat, noisy regions from being blown up.
 *   <li>Channels 1..3: L* / 50 - 1, a* / 100, b* / 100 (each roughly in [-1, 1]).
 * </ul>
 *
 * Stateless and thread-safe.
 */
public final class GistInput {
  public static final int SIZE = GistModelBuilder.SIZE;
  public static final int PLANE = SIZE * SIZE;

  /**
   * Radius of the box filter whose three-fold repetition gives the local mean and local contrast windows: width 17 px,
   * an almost Gaussian window of standard deviation about 8.5 px on the 128 px input.
   */
  public static final int BOX_RADIUS = 8;

  /** Added to the local standard deviation of t (t in [0, 1]) before dividing. */
  public static final double CONTRAST_FLOOR = 0.05;

  private GistInput() {}

  /** The [4, 128, 128] tensor of one image. */
  public static float[] prepare(BufferedImage image) {
    int[] rgb = ImageResampler.resize(image, SIZE, SIZE);
    float[] lab = new float[3 * PLANE];
    CieLab.toLab(rgb, lab);
    float[] out = new float[4 * PLANE];
    double[] t = new double[PLANE];
    for (int i = 0; i < PLANE; i++) {
      t[i] = lab[3 * i] / 100.0;
      out[PLANE + i] = lab[3 * i] / 50f - 1f;
      out[2 * PLANE + i] = lab[3 * i + 1] / 100f;
      out[3 * PLANE + i] = lab[3 * i + 2] / 100f;
    }
    double[] mean = blur(t);
    double[] d = new double[PLANE];
    double[] d2 = new double[PLANE];
    for (int i = 0; i < PLANE; i++) {
      d[i] = t[i] - mean[i];
      d2[i] = d[i] * d[i];
    }
    double[] var = blur(d2);
    for (int i = 0; i < PLANE; i++) {
      // The running-sum blur can leave a variance of -1e-17 where the image is flat; sqrt would give NaN.
      out[i] = (float) (d[i] / (Math.sqrt(Math.max(0, var[i])) + CONTRAST_FLOOR));
    }
    return out;
  }

  /**
   * Approximately Gaussian blur of a SIZE x SIZE plane: three passes of a {@link #BOX_RADIUS} box filter in each
   * direction (Wells, "Efficient synthesis of Gaussian filters by cascaded uniform filters", IEEE PAMI 8(2), 1986),
   * edges clamped. Standard deviation sqrt(3 (w^2 - 1) / 12) with w = 17: about 8.5 px.
   */
  static double[] blur(double[] plane) {
    double[] a = plane.clone();
    double[] b = new double[PLANE];
    for (int pass = 0; pass < 3; pass++) {
      boxRows(a, b);
      boxColumns(b, a);
    }
    return a;
  }

  private static void boxRows(double[] in, double[] out) {
    int r = BOX_RADIUS;
    double inv = 1.0 / (2 * r + 1);
    for (int y = 0; y < SIZE; y++) {
      int row = y * SIZE;
      double sum = 0;
      for (int j = -r; j <= r; j++) {
        sum += in[row + clamp(j)];
      }
      for (int x = 0; x < SIZE; x++) {
        out[row + x] = sum * inv;
        sum += in[row + clamp(x + r + 1)] - in[row + clamp(x - r)];
      }
    }
  }

  private static void boxColumns(double[] in, double[] out) {
    int r = BOX_RADIUS;
    double inv = 1.0 / (2 * r + 1);
    for (int x = 0; x < SIZE; x++) {
      double sum = 0;
      for (int j = -r; j <= r; j++) {
        sum += in[clamp(j) * SIZE + x];
      }
      for (int y = 0; y < SIZE; y++) {
        out[y * SIZE + x] = sum * inv;
        sum += in[clamp(y + r + 1) * SIZE + x] - in[clamp(y - r) * SIZE + x];
      }
    }
  }

  private static int clamp(int i) {
    return Math.min(SIZE - 1, Math.max(0, i));
  }
}
