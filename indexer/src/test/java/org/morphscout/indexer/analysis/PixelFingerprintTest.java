package org.morphscout.indexer.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.ImageCodec;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.silhouette.DefaultSilhouettes;
import org.morphscout.indexer.silhouette.Mask;

class PixelFingerprintTest {
  private static final long SEED = 7202;
  private static final double THRESHOLD = NearDuplicateConfig.DEFAULTS.minFingerprintCorrelation();

  // ---- the optimised (separable) area average against a plain four-loop version ----

  /** Plain reference: every cell visits every pixel of the padded range and weighs it by its overlap area. */
  private static double[] referenceAreaAverage(double[][] luma, double x0, double y0, double ww, double wh, int g) {
    int h = luma.length;
    int w = luma[0].length;
    double[] out = new double[g * g];
    double cw = ww / g;
    double ch = wh / g;
    for (int cy = 0; cy < g; cy++) {
      for (int cx = 0; cx < g; cx++) {
        double lx = x0 + cx * cw;
        double hx = lx + cw;
        double ly = y0 + cy * ch;
        double hy = ly + ch;
        double sum = 0;
        for (int py = (int) Math.floor(ly) - 1; py <= (int) Math.ceil(hy); py++) {
          for (int px = (int) Math.floor(lx) - 1; px <= (int) Math.ceil(hx); px++) {
            double ox = Math.max(0, Math.min(hx, px + 1) - Math.max(lx, px));
            double oy = Math.max(0, Math.min(hy, py + 1) - Math.max(ly, py));
            int sx = Math.min(w - 1, Math.max(0, px));
            int sy = Math.min(h - 1, Math.max(0, py));
            sum += ox * oy * luma[sy][sx];
          }
        }
        out[cy * g + cx] = sum / (cw * ch);
      }
    }
    return out;
  }

  @Test
  void separableAreaAverageAgreesWithThePlainReference() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    for (int trial = 0; trial < 40; trial++) {
      int w = 5 + rnd.nextInt(90);
      int h = 5 + rnd.nextInt(90);
      double[][] luma = new double[h][w];
      for (double[] row : luma) {
        for (int x = 0; x < w; x++) {
          row[x] = rnd.nextDouble() * 255;
        }
      }
      // Windows inside, across and beyond the frame, with fractional corners, larger and smaller than the grid.
      double x0 = (rnd.nextDouble() - 0.3) * w;
      double y0 = (rnd.nextDouble() - 0.3) * h;
      double ww = 2 + rnd.nextDouble() * 1.4 * w;
      double wh = 2 + rnd.nextDouble() * 1.4 * h;
      int g = 4 + rnd.nextInt(30);
      double[] fast = PixelFingerprint.areaAverage(luma, x0, y0, ww, wh, g);
      double[] plain = referenceAreaAverage(luma, x0, y0, ww, wh, g);
      for (int i = 0; i < fast.length; i++) {
        assertThat(fast[i]).as("seed %d, trial %d, cell %d", SEED, trial, i).isCloseTo(plain[i], within(1e-7));
      }
    }
  }

  @Test
  void areaAverageOfAnIntegerDownscaleIsTheBlockMean() {
    // Common practice (box filter): a 4x4 image onto a 2x2 grid over the whole frame gives the 2x2 block means.
    double[][] luma = {{0, 2, 10, 10}, {4, 6, 10, 10}, {1, 1, 0, 0}, {1, 1, 0, 8}};
    assertThat(PixelFingerprint.areaAverage(luma, 0, 0, 4, 4, 2)).containsExactly(3, 10, 1, 2);
  }

  // ---- normalisation and correlation ----

  /** Textbook two-pass Pearson correlation. */
  private static double pearson(float[] a, float[] b) {
    double ma = 0;
    double mb = 0;
    for (int i = 0; i < a.length; i++) {
      ma += a[i] / (double) a.length;
      mb += b[i] / (double) b.length;
    }
    double num = 0;
    double da = 0;
    double db = 0;
    for (int i = 0; i < a.length; i++) {
      num += (a[i] - ma) * (b[i] - mb);
      da += (a[i] - ma) * (a[i] - ma);
      db += (b[i] - mb) * (b[i] - mb);
    }
    return num / Math.sqrt(da * db);
  }

  @Test
  void correlationIsPearsonsRAndIgnoresLinearChanges() {
    SplittableRandom rnd = new SplittableRandom(SEED + 1);
    for (int trial = 0; trial < 20; trial++) {
      double[] raw = new double[PixelFingerprint.LENGTH];
      double[] other = new double[raw.length];
      for (int i = 0; i < raw.length; i++) {
        raw[i] = rnd.nextDouble() * 200;
        other[i] = raw[i] * rnd.nextDouble() + rnd.nextDouble() * 100;
      }
      float[] a = PixelFingerprint.zNormalised(raw);
      float[] b = PixelFingerprint.zNormalised(other);
      double mean = 0;
      double sq = 0;
      for (float v : a) {
        mean += v;
        sq += v * v;
      }
      // Definition of z-scores: mean 0, population variance 1.
      assertThat(mean / a.length).isCloseTo(0, within(1e-5));
      assertThat(sq / a.length).isCloseTo(1, within(1e-4));
      assertThat(PixelFingerprint.correlation(a, b)).as("seed %d", SEED + 1).isCloseTo(pearson(a, b), within(1e-9));
      // Pearson's r is invariant under a positive linear change of either argument (definition) and flips sign
      // under a negative one: a global brightness/contrast edit cannot move it.
      double[] edited = new double[raw.length];
      for (int i = 0; i < raw.length; i++) {
        edited[i] = 1.3 * raw[i] - 17;
      }
      assertThat(PixelFingerprint.correlation(a, PixelFingerprint.zNormalised(edited))).isCloseTo(1, within(1e-6));
      float[] negated = a.clone();
      for (int i = 0; i < negated.length; i++) {
        negated[i] = -negated[i];
      }
      assertThat(PixelFingerprint.correlation(a, negated)).isCloseTo(-1, within(1e-6));
    }
  }

  @Test
  void unknownOrFlatFingerprintsHaveNoCorrelation() {
    float[] some = PixelFingerprint.zNormalised(new double[] {1, 2, 3, 4});
    float[] flat = PixelFingerprint.zNormalised(new double[] {5, 5, 5, 5});
    assertThat(flat).containsOnly(0f);
    assertThat(PixelFingerprint.correlation(some, null)).isNaN();
    assertThat(PixelFingerprint.correlation(some, flat)).isNaN();
    assertThat(PixelFingerprint.correlation(some, new float[] {1, 2, 3})).isNaN();
  }

  @Test
  void windowIsASquareAroundTheObjectOrTheWholeFrame() {
    // A solid 40 x 60 px rectangle at (80..120, 20..80) in a 200 x 100 mask: centroid (100, 50). The pixel rows are
    // a discrete uniform distribution over n = 60 values, variance (n^2 - 1) / 12 (standard result), so the window
    // side is 2 sqrt(3) sqrt((n^2 - 1) / 12) (1 + 2 * 0.15) = sqrt(n^2 - 1) * 1.3, just under 60 * 1.3 = 78 px.
    byte[] bits = new byte[200 * 100];
    for (int y = 20; y < 80; y++) {
      for (int x = 80; x < 120; x++) {
        bits[y * 200 + x] = 1;
      }
    }
    double side = Math.sqrt(60 * 60 - 1) * 1.3;
    assertThat(PixelFingerprint.window(200, 100, new Mask(200, 100, bits), 0.15))
        .containsExactly(new double[] {100 - side / 2, 50 - side / 2, side, side}, within(1e-9));
    // The same rectangle in a mask at half the image's resolution: n = 30 mask rows, each 2 image pixels.
    byte[] half = new byte[100 * 50];
    for (int y = 10; y < 40; y++) {
      for (int x = 40; x < 60; x++) {
        half[y * 100 + x] = 1;
      }
    }
    double halfSide = 2 * Math.sqrt(30 * 30 - 1) * 1.3;
    assertThat(PixelFingerprint.window(200, 100, new Mask(100, 50, half), 0.15))
        .containsExactly(new double[] {100 - halfSide / 2, 50 - halfSide / 2, halfSide, halfSide}, within(1e-9));
    assertThat(PixelFingerprint.window(200, 100, Mask.empty(200, 100), 0.15)).containsExactly(0, 0, 200, 100);
  }

  // ---- rendered pictures: edited copies above the threshold, neighbouring family members below ----

  private final DefaultSilhouettes silhouettes = new DefaultSilhouettes();

  private float[] fingerprint(BufferedImage image) {
    BufferedImage argb = new BufferedImage(image.getWidth(), image.getHeight(), BufferedImage.TYPE_INT_ARGB);
    argb.createGraphics().drawImage(image, 0, 0, null);
    return PixelFingerprint.of(argb, silhouettes.extract(argb).mask());
  }

  /** A global brightness and contrast edit: v' = 1.08 (v - 128) + 128 + 5, per channel, clipped to [0, 255]. */
  private static BufferedImage brighterAndHarder(BufferedImage src) {
    BufferedImage out = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_RGB);
    for (int y = 0; y < src.getHeight(); y++) {
      for (int x = 0; x < src.getWidth(); x++) {
        int p = src.getRGB(x, y);
        int r = edit((p >> 16) & 0xff);
        int g = edit((p >> 8) & 0xff);
        int b = edit(p & 0xff);
        out.setRGB(x, y, (r << 16) | (g << 8) | b);
      }
    }
    return out;
  }

  private static int edit(int v) {
    return (int) Math.max(0, Math.min(255, Math.round(1.08 * (v - 128) + 128 + 5)));
  }

  @Test
  void editedCopiesCorrelateAboveTheThresholdAndFamilyNeighboursBelow() throws IOException {
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 8, Archetype.VASE, Archetype.BOTTLE);
    List<float[]> members = new ArrayList<>();
    for (FamilyItem item : family) {
      members.add(fingerprint(item.image()));
    }
    for (int i = 0; i + 1 < members.size(); i++) {
      // Neighbouring members (t 1/7 apart): different vessels, same glaze, backdrop and light.
      assertThat(PixelFingerprint.correlation(members.get(i), members.get(i + 1)))
          .as("seed %d, members %d and %d", SEED, i, i + 1).isLessThan(THRESHOLD);
    }
    for (int i : new int[] {1, 4, 6}) {
      BufferedImage original = family.get(i).image();
      int w = original.getWidth();
      int h = original.getHeight();
      float[] fo = members.get(i);
      BufferedImage resized = ImageCodec.decode(ImageCodec.jpeg(ImageCodec.resize(original, w * 3 / 4, h * 3 / 4),
          0.9f));
      BufferedImage recompressed = ImageCodec.decode(ImageCodec.jpeg(original, 0.60f));
      BufferedImage edited = brighterAndHarder(original);
      assertThat(PixelFingerprint.correlation(fo, fingerprint(resized))).as("seed %d, member %d resized", SEED, i)
          .isGreaterThanOrEqualTo(THRESHOLD);
      assertThat(PixelFingerprint.correlation(fo, fingerprint(recompressed)))
          .as("seed %d, member %d at JPEG q0.60", SEED, i).isGreaterThanOrEqualTo(THRESHOLD);
      assertThat(PixelFingerprint.correlation(fo, fingerprint(edited)))
          .as("seed %d, member %d brighter and harder", SEED, i).isGreaterThanOrEqualTo(THRESHOLD);
    }
  }
}
