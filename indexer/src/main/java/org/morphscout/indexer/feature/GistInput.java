package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;

/**
 * Prepares the input tensor of the built-in GIST model for one image: float32 [4, 128, 128], row-major.
 *
 * <ul>
 *   <li>The image is stretched to 128x128 with alpha composited over mid-grey ({@link ImageResampler}).
 *   <li>Channel 0: luminance t = L* / 100 in [0, 1], locally contrast-normalised as in the prefilter of Oliva and
 *       Torralba (2001): {@code (t - G*t) / (sqrt(G*(t - G*t)^2) + }{@link #CONTRAST_FLOOR}{@code )}, where G* is a
 *       Gaussian blur of {@link #LCN_SIGMA} px (edges clamped). This removes illumination gradients (wavelengths
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

  /** Standard deviation of the local mean and local contrast windows, in px of the 128 px input. */
  public static final double LCN_SIGMA = 8.0;

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
      out[i] = (float) (d[i] / (Math.sqrt(var[i]) + CONTRAST_FLOOR));
    }
    return out;
  }

  /** Separable Gaussian blur of a SIZE x SIZE plane, radius 3 sigma, edges clamped. */
  private static double[] blur(double[] plane) {
    int radius = (int) Math.ceil(3 * LCN_SIGMA);
    double[] k = new double[2 * radius + 1];
    double sum = 0;
    for (int i = -radius; i <= radius; i++) {
      k[i + radius] = Math.exp(-i * i / (2 * LCN_SIGMA * LCN_SIGMA));
      sum += k[i + radius];
    }
    for (int i = 0; i < k.length; i++) {
      k[i] /= sum;
    }
    double[] tmp = new double[PLANE];
    double[] out = new double[PLANE];
    for (int y = 0; y < SIZE; y++) {
      for (int x = 0; x < SIZE; x++) {
        double s = 0;
        for (int j = -radius; j <= radius; j++) {
          s += k[j + radius] * plane[y * SIZE + Math.min(SIZE - 1, Math.max(0, x + j))];
        }
        tmp[y * SIZE + x] = s;
      }
    }
    for (int y = 0; y < SIZE; y++) {
      for (int x = 0; x < SIZE; x++) {
        double s = 0;
        for (int j = -radius; j <= radius; j++) {
          s += k[j + radius] * tmp[Math.min(SIZE - 1, Math.max(0, y + j)) * SIZE + x];
        }
        out[y * SIZE + x] = s;
      }
    }
    return out;
  }
}
