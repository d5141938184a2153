package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;
import java.util.Objects;
import org.morphscout.indexer.colour.CieLab;

/**
 * The default silhouette extractor for photographs of an object in front of a background: it learns the background
 * from a band along the image border ({@link BackgroundModel}) and keeps what differs from it.
 *
 * <p>Steps, all at a reduced working resolution (long side {@link BorderModelOptions#workingLongSide()}):
 * <ol>
 *   <li>area-average downsampling in linear light, conversion to CIELAB (D65), Gaussian smoothing so that fine
 *       texture averages out;</li>
 *   <li>background model from the border band; per pixel the Lab distance to it, divided by the band's robust
 *       spread;</li>
 *   <li>Otsu's threshold of that distance map (Otsu 1979), raised where needed to at least
 *       {@code minNormalisedDistance} spreads and {@code minContrast} Delta E, so that a plain image stays empty;</li>
 *   <li>opening then closing (disks), counting sizeable components, keeping the largest, filling holes, bilinear
 *       upsampling of the mask to the input size ({@link MaskCleanup}).</li>
 * </ol>
 *
 * <p>Confidence, in [0, 1], is the geometric mean of two separations: Otsu's eta (between-class over total variance
 * of the distance map at the threshold t used) and a gap term {@code 1 - n(ambiguous) / n(object)}, where a pixel is
 * ambiguous when its distance lies in the middle half of the span between the two class means (from halfway between
 * the background mean and t to halfway between t and the object mean). A crisp object has few such pixels (only its
 * antialiased rim) compared with its area. Both terms are near 1 for a crisp object on a clean background and fall
 * as object and background distances overlap. Empty results have 0.
 *
 * <p>Immutable and thread-safe.
 */
public final class BorderModelSilhouettes implements SilhouetteExtractor {
  private static final int BINS = 512;

  private final BorderModelOptions options;

  public BorderModelSilhouettes(BorderModelOptions options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** With {@link BorderModelOptions#DEFAULTS}. */
  public BorderModelSilhouettes() {
    this(BorderModelOptions.DEFAULTS);
  }

  @Override
  public String name() {
    return "border-model";
  }

  @Override
  public Silhouette extract(BufferedImage image) {
    int outW = image.getWidth();
    int outH = image.getHeight();
    double scale = Math.min(1.0, options.workingLongSide() / (double) Math.max(outW, outH));
    int w = Math.max(1, (int) Math.round(outW * scale));
    int h = Math.max(1, (int) Math.round(outH * scale));
    if (w < 8 || h < 8) {
      return empty(outW, outH);
    }
    float[][] lab = downsampleToLab(Pixels.argb(image), outW, outH, w, h);
    for (float[] plane : lab) {
      GaussianBlur.blur(plane, w, h, options.smoothingSigma());
    }
    BackgroundModel.Fit fit = BackgroundModel.fit(lab, w, h, options);
    float[] d = fit.distance();
    float max = 0;
    for (int i = 0; i < d.length; i++) {
      d[i] /= (float) fit.spread();
      max = Math.max(max, d[i]);
    }
    double minThreshold = Math.max(options.minNormalisedDistance(), options.minContrast() / fit.spread());
    if (max <= minThreshold) {
      return empty(outW, outH);
    }
    int[] hist = new int[BINS];
    double binWidth = max / BINS;
    for (float v : d) {
      hist[Math.min(BINS - 1, (int) (v / binWidth))]++;
    }
    int k = Otsu.threshold(hist);
    // Raise the split to the minimum distance when Otsu would cut inside the background's own spread.
    k = Math.max(k, Math.min(BINS - 1, (int) Math.ceil(minThreshold / binWidth) - 1));
    double threshold = (k + 1) * binWidth;
    byte[] raw = new byte[d.length];
    int fgCount = 0;
    for (int i = 0; i < d.length; i++) {
      if (d[i] > threshold) {
        raw[i] = 1;
        fgCount++;
      }
    }
    if (fgCount == 0) {
      return empty(outW, outH);
    }
    double eta = Otsu.eta(hist, k);
    double sumBg = 0;
    double sumFg = 0;
    for (float v : d) {
      if (v > threshold) {
        sumFg += v;
      } else {
        sumBg += v;
      }
    }
    double lo = 0.5 * (sumBg / Math.max(1, d.length - fgCount) + threshold);
    double hi = 0.5 * (threshold + sumFg / fgCount);
    int ambiguous = 0;
    for (float v : d) {
      ambiguous += (v > lo && v <= hi) ? 1 : 0;
    }
    double gap = Math.max(0, Math.min(1, 1 - ambiguous / (double) fgCount));
    double confidence = Math.sqrt(Math.max(0, eta) * gap);
    MaskCleanup.Settings settings =
        new MaskCleanup.Settings(options.openRadius(), options.closeRadius(), options.minComponentFraction());
    return MaskCleanup.finish(raw, w, h, settings, outW, outH, confidence, name());
  }

  private Silhouette empty(int w, int h) {
    return new Silhouette(Mask.empty(w, h), 0, false, 0, 0, name());
  }

  /**
   * Box (area) averaging in linear light from {@code W x H} to {@code w x h}, then CIELAB. Each working pixel
   * averages the input pixels whose index maps into it, so every input pixel counts exactly once.
   */
  static float[][] downsampleToLab(int[] argb, int bigW, int bigH, int w, int h) {
    int[] colOf = new int[bigW];
    for (int x = 0; x < bigW; x++) {
      colOf[x] = Math.min(w - 1, (int) ((long) x * w / bigW));
    }
    float[] l = new float[w * h];
    float[] a = new float[w * h];
    float[] b = new float[w * h];
    double[] sr = new double[w];
    double[] sg = new double[w];
    double[] sb = new double[w];
    int[] cnt = new int[w];
    double[] out = new double[3];
    int srcRow = 0;
    for (int y = 0; y < h; y++) {
      int rowEnd = (int) ((long) (y + 1) * bigH / h);
      java.util.Arrays.fill(sr, 0);
      java.util.Arrays.fill(sg, 0);
      java.util.Arrays.fill(sb, 0);
      java.util.Arrays.fill(cnt, 0);
      for (; srcRow < rowEnd; srcRow++) {
        int base = srcRow * bigW;
        for (int x = 0; x < bigW; x++) {
          int p = argb[base + x];
          int c = colOf[x];
          sr[c] += CieLab.linear(p >> 16);
          sg[c] += CieLab.linear(p >> 8);
          sb[c] += CieLab.linear(p);
          cnt[c]++;
        }
      }
      for (int x = 0; x < w; x++) {
        int n = Math.max(1, cnt[x]);
        CieLab.linearToLab(sr[x] / n, sg[x] / n, sb[x] / n, out);
        int i = y * w + x;
        l[i] = (float) out[0];
        a[i] = (float) out[1];
        b[i] = (float) out[2];
      }
    }
    return new float[][] {l, a, b};
  }
}
