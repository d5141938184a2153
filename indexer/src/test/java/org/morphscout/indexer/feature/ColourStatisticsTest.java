package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.colour.CieLab;
import org.morphscout.indexer.silhouette.Mask;

class ColourStatisticsTest {
  private static final long SEED = 2017;

  @Test
  void meansAndDeviationsEqualAPlainComputation() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    int w = 60;
    int h = 40;
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    byte[] m = new byte[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int alpha = rnd.nextInt(10) == 0 ? 0 : 255;
        img.setRGB(x, y, alpha << 24 | (rnd.nextInt() & 0xFFFFFF));
        m[y * w + x] = (byte) (x > 20 && x < 45 && y > 10 ? 1 : 0);
      }
    }
    Mask mask = new Mask(w, h, m);
    ColourStats stats = new ColourStatistics().compute(img, mask);

    // Plain two-pass computation with the per-pixel Lab conversion (population deviation, as AdaIN uses).
    for (int fg = 0; fg <= 1; fg++) {
      double[] sum = new double[3];
      int n = 0;
      for (int y = 0; y < h; y++) {
        for (int x = 0; x < w; x++) {
          int p = img.getRGB(x, y);
          if ((p >>> 24) != 0 && mask.get(x, y) == (fg == 1)) {
            double[] lab = CieLab.toLab(p);
            for (int c = 0; c < 3; c++) {
              sum[c] += lab[c];
            }
            n++;
          }
        }
      }
      double[] mean = {sum[0] / n, sum[1] / n, sum[2] / n};
      double[] sq = new double[3];
      for (int y = 0; y < h; y++) {
        for (int x = 0; x < w; x++) {
          int p = img.getRGB(x, y);
          if ((p >>> 24) != 0 && mask.get(x, y) == (fg == 1)) {
            double[] lab = CieLab.toLab(p);
            for (int c = 0; c < 3; c++) {
              sq[c] += (lab[c] - mean[c]) * (lab[c] - mean[c]);
            }
          }
        }
      }
      double[] gotMean = fg == 1 ? stats.foregroundMean() : stats.backgroundMean();
      double[] gotStd = fg == 1 ? stats.foregroundStd() : stats.backgroundStd();
      for (int c = 0; c < 3; c++) {
        assertThat(gotMean[c]).as("seed %d fg %d c %d", SEED, fg, c).isCloseTo(mean[c], within(1e-3));
        assertThat(gotStd[c]).as("seed %d fg %d c %d", SEED, fg, c).isCloseTo(Math.sqrt(sq[c] / n), within(1e-3));
      }
    }
  }

  @Test
  void dominantColoursFindPlantedOnes() {
    // Three planted colours with 50/30/20 % of the foreground, plus small noise; background a fourth colour.
    int[] planted = {0xC83232, 0x3278C8, 0xE6D23C};
    double[] share = {0.5, 0.3, 0.2};
    SplittableRandom rnd = new SplittableRandom(SEED);
    int w = 100;
    int h = 100;
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    byte[] m = new byte[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        boolean fg = y >= 20;
        m[y * w + x] = (byte) (fg ? 1 : 0);
        int base;
        if (!fg) {
          base = 0x10F010;
        } else {
          double t = (x + 0.5) / w;
          base = t < share[0] ? planted[0] : t < share[0] + share[1] ? planted[1] : planted[2];
        }
        img.setRGB(x, y, 0xFF000000 | jitter(base, rnd));
      }
    }
    ColourStats stats = new ColourStatistics().compute(img, new Mask(w, h, m));
    List<ColourStats.DominantColour> dominant = stats.dominant();
    assertThat(dominant).as("seed %d", SEED).hasSizeBetween(3, 4);
    for (int k = 0; k < 3; k++) {
      double[] want = CieLab.toLab(planted[k]);
      ColourStats.DominantColour best = dominant.stream()
          .min((a, b) -> Double.compare(Ciede2000.difference(a.lab(), want), Ciede2000.difference(b.lab(), want)))
          .orElseThrow();
      assertThat(Ciede2000.difference(best.lab(), want)).as("seed %d colour %d", SEED, k).isLessThan(2.0);
      assertThat(best.weight()).as("seed %d colour %d", SEED, k).isCloseTo(share[k], within(0.03));
    }
    assertThat(dominant.get(0).weight()).isGreaterThanOrEqualTo(dominant.get(dominant.size() - 1).weight());
  }

  @Test
  void emptyMaskGivesNaNForegroundAndNoDominantColours() {
    BufferedImage img = new BufferedImage(10, 10, BufferedImage.TYPE_INT_ARGB);
    for (int i = 0; i < 100; i++) {
      img.setRGB(i % 10, i / 10, 0xFF808080);
    }
    ColourStats stats = new ColourStatistics().compute(img, Mask.empty(10, 10));
    assertThat(stats.foregroundMean()).containsOnly(Double.NaN);
    assertThat(stats.dominant()).isEmpty();
    assertThat(stats.backgroundMean()[0]).isCloseTo(CieLab.toLab(0x808080)[0], within(1e-3));
    assertThat(stats.backgroundStd()[0]).isCloseTo(0.0, within(1e-3));
  }

  private static int jitter(int rgb, SplittableRandom rnd) {
    int out = 0;
    for (int shift = 0; shift <= 16; shift += 8) {
      int v = ((rgb >> shift) & 0xFF) + rnd.nextInt(-3, 4);
      out |= Math.max(0, Math.min(255, v)) << shift;
    }
    return out;
  }
}
