package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * sRGB to CIELAB (D65). Expected values: B. Lindbloom's colour calculator for sRGB primaries with a D65 reference
 * white (from memory), and the definition (white is L* = 100, a* = b* = 0).
 */
class LabPixelsTest {
  private static float[] lab(int rgb) {
    float[] l = new float[1];
    float[] a = new float[1];
    float[] b = new float[1];
    LabPixels.toLab(new int[] {0xff000000 | rgb}, l, a, b);
    return new float[] {l[0], a[0], b[0]};
  }

  @Test
  void primariesAndWhiteMatchPublishedValues() {
    assertThat(lab(0xffffff)).containsExactly(new float[] {100f, 0f, 0f}, within(0.01f));
    assertThat(lab(0x000000)).containsExactly(new float[] {0f, 0f, 0f}, within(0.01f));
    assertThat(lab(0xff0000)).containsExactly(new float[] {53.2408f, 80.0925f, 67.2032f}, within(0.02f));
    assertThat(lab(0x00ff00)).containsExactly(new float[] {87.7347f, -86.1827f, 83.1793f}, within(0.02f));
    assertThat(lab(0x0000ff)).containsExactly(new float[] {32.2970f, 79.1875f, -107.8602f}, within(0.02f));
  }
}
