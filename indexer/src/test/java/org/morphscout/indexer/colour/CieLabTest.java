package org.morphscout.indexer.colour;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class CieLabTest {
  private static void assertLab(double[] lab, double l, double a, double b) {
    assertThat(lab[0]).isCloseTo(l, within(0.01));
    assertThat(lab[1]).isCloseTo(a, within(0.01));
    assertThat(lab[2]).isCloseTo(b, within(0.01));
  }

  @Test
  void primariesMatchLindbloomsMatrixAndWhitePoint() {
    // Expected values computed by us (Python, 4 decimals) from the sRGB-to-XYZ matrix and D65 white
    // (0.95047, 1, 1.08883) of Bruce Lindbloom's "RGB/XYZ Matrices" page (brucelindbloom.com), the IEC 61966-2-1
    // transfer curve and the CIE 15:2004 L*a*b* formulas with the exact constants 216/24389 and 24389/27.
    assertLab(CieLab.toLab(255, 0, 0), 53.2408, 80.0925, 67.2032);
    assertLab(CieLab.toLab(0, 255, 0), 87.7347, -86.1827, 83.1793);
    assertLab(CieLab.toLab(0, 0, 255), 32.2970, 79.1875, -107.8602);
    // White maps to the reference white: L* = 100, a* = b* = 0 (CIELAB definition).
    assertLab(CieLab.toLab(255, 255, 255), 100, 0, 0);
    assertLab(CieLab.toLab(0, 0, 0), 0, 0, 0);
  }

  @Test
  void transferCurveMatchesIec61966() {
    // IEC 61966-2-1: linear segment below 0.04045 (slope 1/12.92); above it ((v + 0.055) / 1.055)^2.4, which for
    // v = 0.5 is 0.21404 (computed by us from that formula).
    assertThat(CieLab.srgbToLinear(0.04)).isCloseTo(0.04 / 12.92, within(1e-12));
    assertThat(CieLab.srgbToLinear(0.5)).isCloseTo(0.2140, within(1e-4));
    for (int i = 0; i <= 255; i++) {
      assertThat(CieLab.linearToSrgb(CieLab.srgbToLinear(i / 255.0))).isCloseTo(i / 255.0, within(1e-9));
    }
  }

  @Test
  void fastPathEqualsPlainPerPixelVersion() {
    long seed = 61966;
    SplittableRandom rnd = new SplittableRandom(seed);
    int[] pixels = new int[20_000];
    for (int i = 0; i < pixels.length; i++) {
      pixels[i] = rnd.nextInt();
    }
    float[] fast = new float[3 * pixels.length];
    CieLab.toLab(pixels, fast);
    for (int i = 0; i < pixels.length; i++) {
      double[] plain = CieLab.toLab(pixels[i]);
      for (int c = 0; c < 3; c++) {
        assertThat((double) fast[3 * i + c]).as("seed %d pixel %d", seed, i).isCloseTo(plain[c], within(1e-4));
      }
    }
  }

  @Test
  void labBackToSrgbRoundTrips() {
    long seed = 65;
    SplittableRandom rnd = new SplittableRandom(seed);
    for (int i = 0; i < 5000; i++) {
      int rgb = rnd.nextInt() & 0xFFFFFF;
      double[] lab = CieLab.toLab(rgb);
      assertThat(CieLab.toSrgb(lab[0], lab[1], lab[2]) & 0xFFFFFF).as("seed %d", seed).isEqualTo(rgb);
    }
  }
}
