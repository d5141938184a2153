package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The distance-transform and separable morphology against plain brute-force definitions (common practice:
 * erosion/dilation as min/max over the structuring element, pixels outside the image ignored).
 */
class MorphologyTest {
  private static final long SEED = 777L;

  /** Seeded blobby masks: random noise, box-smoothed, thresholded, plus sparse specks. */
  static byte[] randomMask(SplittableRandom rnd, int w, int h) {
    float[] noise = new float[w * h];
    for (int i = 0; i < noise.length; i++) {
      noise[i] = (float) rnd.nextDouble();
    }
    GaussianBlur.blur(noise, w, h, 1.0 + rnd.nextDouble(2.0));
    byte[] m = new byte[w * h];
    for (int i = 0; i < m.length; i++) {
      m[i] = (byte) (noise[i] > 0.5 || rnd.nextDouble() < 0.01 ? 1 : 0);
    }
    return m;
  }

  static byte[] reference(byte[] m, int w, int h, Morphology.Element e, int r, boolean dilate) {
    byte[] out = new byte[m.length];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        boolean any = false;
        boolean all = true;
        for (int dy = -r; dy <= r; dy++) {
          for (int dx = -r; dx <= r; dx++) {
            if (e == Morphology.Element.DISK && dx * dx + dy * dy > r * r) {
              continue;
            }
            int xx = x + dx;
            int yy = y + dy;
            if (xx < 0 || yy < 0 || xx >= w || yy >= h) {
              continue;
            }
            boolean v = m[yy * w + xx] != 0;
            any |= v;
            all &= v;
          }
        }
        out[y * w + x] = (byte) ((dilate ? any : all) ? 1 : 0);
      }
    }
    return out;
  }

  @Test
  void matchesBruteForceOnSeededRandomMasks() {
    for (int trial = 0; trial < 24; trial++) {
      long seed = SEED + trial;
      SplittableRandom rnd = new SplittableRandom(seed);
      int w = 20 + rnd.nextInt(60);
      int h = 20 + rnd.nextInt(60);
      byte[] m = randomMask(rnd, w, h);
      for (Morphology.Element e : Morphology.Element.values()) {
        for (int r = 0; r <= 5; r++) {
          byte[] dil = Morphology.dilate(m, w, h, e, r);
          byte[] ero = Morphology.erode(m, w, h, e, r);
          assertThat(dil).as("dilate %s r=%d seed %d", e, r, seed).isEqualTo(reference(m, w, h, e, r, true));
          assertThat(ero).as("erode %s r=%d seed %d", e, r, seed).isEqualTo(reference(m, w, h, e, r, false));
          byte[] open = reference(reference(m, w, h, e, r, false), w, h, e, r, true);
          byte[] close = reference(reference(m, w, h, e, r, true), w, h, e, r, false);
          assertThat(Morphology.open(m, w, h, e, r)).as("open %s r=%d seed %d", e, r, seed).isEqualTo(open);
          assertThat(Morphology.close(m, w, h, e, r)).as("close %s r=%d seed %d", e, r, seed).isEqualTo(close);
        }
      }
    }
  }

  @Test
  void openingRemovesSpecksNarrowerThanTheDisk() {
    int w = 40;
    int h = 40;
    byte[] m = new byte[w * h];
    m[5 * w + 5] = 1; // a one-pixel speck
    for (int y = 15; y < 35; y++) {
      for (int x = 15; x < 35; x++) {
        m[y * w + x] = 1;
      }
    }
    byte[] open = Morphology.open(m, w, h, Morphology.Element.DISK, 2);
    assertThat(open[5 * w + 5]).isZero();
    assertThat(open[25 * w + 25]).isEqualTo((byte) 1);
  }
}
