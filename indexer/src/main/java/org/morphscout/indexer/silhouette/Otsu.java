package org.morphscout.indexer.silhouette;

/**
 * Otsu's threshold: the split of a histogram into two classes that maximises the between-class variance (N. Otsu,
 * "A threshold selection method from gray-level histograms", IEEE Trans. SMC 9(1), 1979).
 *
 * <p>Convention (the same as OpenCV's {@code THRESH_OTSU}): the returned bin index {@code k} is the last bin of the
 * lower class, so values in bins {@code > k} are foreground. Ties keep the first (lowest) maximising bin, as
 * OpenCV does. Stateless and thread-safe.
 */
public final class Otsu {
  /** Otsu's split of float values: {@code threshold} in value units (values above it are foreground). */
  public record Result(double threshold, double eta) {}

  private static final double FLT_EPSILON = 1.1920928955078125E-7;

  private Otsu() {}

  /**
   * The threshold bin of a histogram (counts per bin, all {@code >= 0}); 0 when the histogram holds a single value or
   * nothing.
   */
  public static int threshold(int[] histogram) {
    long n = 0;
    double mu = 0;
    for (int i = 0; i < histogram.length; i++) {
      n += histogram[i];
      mu += (double) i * histogram[i];
    }
    if (n == 0) {
      return 0;
    }
    double scale = 1.0 / n;
    mu *= scale;
    double mu1 = 0;
    double q1 = 0;
    double maxSigma = 0;
    int best = 0;
    // Same running update as OpenCV's getThreshVal_Otsu_8u so that ties and rounding agree.
    for (int i = 0; i < histogram.length; i++) {
      double pi = histogram[i] * scale;
      mu1 *= q1;
      q1 += pi;
      double q2 = 1.0 - q1;
      if (Math.min(q1, q2) < FLT_EPSILON || Math.max(q1, q2) > 1.0 - FLT_EPSILON) {
        continue;
      }
      mu1 = (mu1 + i * pi) / q1;
      double mu2 = (mu - q1 * mu1) / q2;
      double sigma = q1 * q2 * (mu1 - mu2) * (mu1 - mu2);
      if (sigma > maxSigma) {
        maxSigma = sigma;
        best = i;
      }
    }
    return best;
  }

  /**
   * Otsu's separability measure eta = between-class variance / total variance for the split after bin {@code k}, in
   * [0, 1]; 0 for a histogram without spread.
   */
  public static double eta(int[] histogram, int k) {
    double n = 0;
    double sum = 0;
    double sumSq = 0;
    double n1 = 0;
    double sum1 = 0;
    for (int i = 0; i < histogram.length; i++) {
      double h = histogram[i];
      n += h;
      sum += i * h;
      sumSq += (double) i * i * h;
      if (i <= k) {
        n1 += h;
        sum1 += i * h;
      }
    }
    if (n == 0) {
      return 0;
    }
    double mean = sum / n;
    double total = sumSq / n - mean * mean;
    double n2 = n - n1;
    if (total <= 1e-12 || n1 == 0 || n2 == 0) {
      return 0;
    }
    double m1 = sum1 / n1;
    double m2 = (sum - sum1) / n2;
    double between = (n1 / n) * (n2 / n) * (m1 - m2) * (m1 - m2);
    return Math.min(1.0, between / total);
  }

  /**
   * Otsu's threshold of float values, histogrammed into {@code bins} equal bins over [min, max]. The threshold is the
   * upper edge of the last lower-class bin. All values equal: threshold = that value, eta = 0.
   */
  public static Result threshold(float[] values, int bins) {
    if (bins < 2) {
      throw new IllegalArgumentException("at least 2 bins needed, got " + bins);
    }
    if (values.length == 0) {
      return new Result(0, 0);
    }
    float min = Float.POSITIVE_INFINITY;
    float max = Float.NEGATIVE_INFINITY;
    for (float v : values) {
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
    if (!(max > min)) {
      return new Result(min, 0);
    }
    int[] hist = new int[bins];
    double scale = bins / (double) (max - min);
    for (float v : values) {
      hist[Math.min(bins - 1, (int) ((v - min) * scale))]++;
    }
    int k = threshold(hist);
    return new Result(min + (k + 1) / scale, eta(hist, k));
  }
}
