package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.colour.CieLab;
import org.morphscout.indexer.silhouette.Mask;

/**
 * Computes {@link ColourStats} for one analysis image and its silhouette: per-channel CIELAB mean and (population)
 * standard deviation of the foreground (mask on) and of the background (mask off) separately, which are the
 * statistics adaptive instance normalisation blends (Huang and Belongie, "Arbitrary style transfer in real-time with
 * adaptive instance normalization", ICCV 2017), plus up to {@link LabKMeans#MAX_CLUSTERS} dominant foreground colours
 * from {@link LabKMeans}.
 *
 * <p>Fully transparent pixels (alpha 0) belong to neither region. A mask of another size than the image is sampled
 * nearest-neighbour, so a silhouette found at a lower resolution can be used as it is. Stateless and thread-safe.
 */
public final class ColourStatistics {
  private final LabKMeans kMeans;

  /** Uses the default k-means (4 clusters, fixed seed). */
  public ColourStatistics() {
    this(new LabKMeans(LabKMeans.MAX_CLUSTERS, LabKMeans.DEFAULT_SEED));
  }

  public ColourStatistics(LabKMeans kMeans) {
    this.kMeans = kMeans;
  }

  /**
   * @param image analysis image, TYPE_INT_ARGB sRGB (other types are read through {@code getRGB})
   * @param mask silhouette, 1 = object; may be empty (then the foreground statistics are NaN and there are no dominant
   *     colours)
   */
  public ColourStats compute(BufferedImage image, Mask mask) {
    int w = image.getWidth();
    int h = image.getHeight();
    int[] argb = ImageResampler.argbPixels(image);
    float[] lab = new float[3 * argb.length];
    CieLab.toLab(argb, lab);

    double[] fgSum = new double[3];
    double[] fgSq = new double[3];
    double[] bgSum = new double[3];
    double[] bgSq = new double[3];
    long fgCount = 0;
    long bgCount = 0;
    for (int y = 0; y < h; y++) {
      int my = (int) ((y + 0.5) * mask.height() / h);
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        if ((argb[i] >>> 24) == 0) {
          continue;
        }
        int mx = (int) ((x + 0.5) * mask.width() / w);
        boolean fg = mask.get(mx, my);
        double[] sum = fg ? fgSum : bgSum;
        double[] sq = fg ? fgSq : bgSq;
        for (int c = 0; c < 3; c++) {
          double v = lab[3 * i + c];
          sum[c] += v;
          sq[c] += v * v;
        }
        if (fg) {
          fgCount++;
        } else {
          bgCount++;
        }
      }
    }
    // Second pass: an evenly strided sample of at most LabKMeans.MAX_SAMPLES foreground pixels, so a large image
    // does not turn into millions of small arrays.
    long stride = Math.max(1, (fgCount + LabKMeans.MAX_SAMPLES - 1) / LabKMeans.MAX_SAMPLES);
    List<float[]> foreground = new ArrayList<>();
    long seen = 0;
    for (int y = 0; y < h && fgCount > 0; y++) {
      int my = (int) ((y + 0.5) * mask.height() / h);
      for (int x = 0; x < w; x++) {
        int i = y * w + x;
        if ((argb[i] >>> 24) != 0 && mask.get((int) ((x + 0.5) * mask.width() / w), my) && seen++ % stride == 0) {
          foreground.add(new float[] {lab[3 * i], lab[3 * i + 1], lab[3 * i + 2]});
        }
      }
    }
    return new ColourStats(
        mean(fgSum, fgCount),
        std(fgSum, fgSq, fgCount),
        mean(bgSum, bgCount),
        std(bgSum, bgSq, bgCount),
        kMeans.dominant(foreground));
  }

  private static double[] mean(double[] sum, long n) {
    double[] m = new double[3];
    for (int c = 0; c < 3; c++) {
      m[c] = n == 0 ? Double.NaN : sum[c] / n;
    }
    return m;
  }

  /** Population standard deviation (divides by n), as AdaIN uses. */
  private static double[] std(double[] sum, double[] sq, long n) {
    double[] s = new double[3];
    for (int c = 0; c < 3; c++) {
      if (n == 0) {
        s[c] = Double.NaN;
      } else {
        double m = sum[c] / n;
        s[c] = Math.sqrt(Math.max(0.0, sq[c] / n - m * m));
      }
    }
    return s;
  }
}
