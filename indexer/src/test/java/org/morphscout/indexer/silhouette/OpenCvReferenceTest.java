package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Shape;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.opencv.core.CvType;
import org.opencv.core.Mat;
import org.opencv.imgproc.Imgproc;
import org.opencv.imgproc.Moments;

/**
 * Otsu thresholds and Hu moments checked against OpenCV 4.9 (org.openpnp:opencv): {@code Imgproc.threshold} with
 * {@code THRESH_OTSU} and {@code Imgproc.moments(binary) + Imgproc.HuMoments}, on the same seeded images.
 */
class OpenCvReferenceTest {
  private static final long SEED = 20261201L;

  @BeforeAll
  static void loadOpenCv() {
    nu.pattern.OpenCV.loadLocally();
  }

  /** A bimodal grey image: two clipped Gaussian populations with seeded means, spreads and mix. */
  private static byte[] bimodal(SplittableRandom rnd, int n) {
    double m1 = 30 + rnd.nextDouble(80);
    double m2 = m1 + 40 + rnd.nextDouble(100);
    double s1 = 5 + rnd.nextDouble(25);
    double s2 = 5 + rnd.nextDouble(25);
    double share = 0.1 + rnd.nextDouble(0.8);
    byte[] px = new byte[n];
    for (int i = 0; i < n; i++) {
      double v = rnd.nextDouble() < share ? m1 + s1 * rnd.nextGaussian() : m2 + s2 * rnd.nextGaussian();
      px[i] = (byte) Math.max(0, Math.min(255, (int) Math.round(v)));
    }
    return px;
  }

  @Test
  void otsuMatchesOpenCvOnBimodalGreyImages() {
    int w = 160;
    int h = 120;
    for (int trial = 0; trial < 40; trial++) {
      long seed = SEED + trial;
      byte[] px = bimodal(new SplittableRandom(seed), w * h);
      // Pin the extremes so that the float variant's 256 bins over [min, max] are exactly the grey levels.
      px[0] = 0;
      px[1] = (byte) 255;
      Mat src = new Mat(h, w, CvType.CV_8UC1);
      src.put(0, 0, px);
      Mat dst = new Mat();
      // Source: OpenCV 4.9 Imgproc.threshold with THRESH_OTSU returns the chosen threshold.
      double expected = Imgproc.threshold(src, dst, 0, 255, Imgproc.THRESH_BINARY | Imgproc.THRESH_OTSU);

      int[] hist = new int[256];
      float[] values = new float[px.length];
      for (int i = 0; i < px.length; i++) {
        hist[px[i] & 0xff]++;
        values[i] = px[i] & 0xff;
      }
      assertThat(Otsu.threshold(hist)).as("seed %d", seed).isEqualTo((int) expected);

      // The float variant must split the same pixels as OpenCV's binary output (values > threshold are 255).
      Otsu.Result r = Otsu.threshold(values, 256);
      byte[] cv = new byte[px.length];
      dst.get(0, 0, cv);
      int mismatches = 0;
      for (int i = 0; i < px.length; i++) {
        boolean ours = values[i] > r.threshold();
        mismatches += ours == ((cv[i] & 0xff) == 255) ? 0 : 1;
      }
      assertThat(mismatches).as("seed %d, threshold %s vs %s", seed, r.threshold(), expected).isZero();
      assertThat(r.eta()).as("seed %d", seed).isBetween(0.0, 1.0);
    }
  }

  @Test
  void huMomentsMatchOpenCvOnSeveralShapes() {
    int w = 420;
    int h = 360;
    List<Shape> shapes = List.of(
        Scenes.shape(Scenes.ShapeKind.DISK, 200, 170, 110),
        Scenes.shape(Scenes.ShapeKind.ELLIPSE, 210, 180, 100),
        Scenes.shape(Scenes.ShapeKind.STAR, 220, 190, 120),
        Scenes.shape(Scenes.ShapeKind.VASE, 190, 180, 140),
        new Rectangle2D.Double(40, 70, 300, 90),
        randomPolygon(new SplittableRandom(SEED), 200, 180, 150));
    for (int s = 0; s < shapes.size(); s++) {
      Mask mask = Scenes.mask(w, h, shapes.get(s));
      byte[] data = mask.data();
      Mat m = new Mat(h, w, CvType.CV_8UC1);
      m.put(0, 0, data);
      // Source: OpenCV 4.9 Imgproc.moments(binaryImage = true) followed by Imgproc.HuMoments.
      Moments mo = Imgproc.moments(m, true);
      Mat hu = new Mat();
      Imgproc.HuMoments(mo, hu);
      double[] ours = HuMoments.of(mask);
      for (int i = 0; i < 7; i++) {
        double expected = hu.get(i, 0)[0];
        assertThat(ours[i])
            .as("shape %d h%d (seed %d)", s, i + 1, SEED)
            .isCloseTo(expected, org.assertj.core.data.Offset.offset(1e-6 * Math.abs(expected) + 1e-15));
      }
    }
  }

  private static Shape randomPolygon(SplittableRandom rnd, double cx, double cy, double r) {
    java.awt.geom.Path2D.Double p = new java.awt.geom.Path2D.Double();
    int n = 11;
    for (int i = 0; i < n; i++) {
      double a = 2 * Math.PI * i / n;
      double rr = r * (0.45 + 0.55 * rnd.nextDouble());
      double x = cx + rr * Math.cos(a);
      double y = cy + rr * Math.sin(a);
      if (i == 0) {
        p.moveTo(x, y);
      } else {
        p.lineTo(x, y);
      }
    }
    p.closePath();
    return p;
  }
}
