package org.morphscout.app.gui.inspector;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class LabColoursTest {
  // CIELAB (D65) coordinates of the sRGB primaries, rounded to 2 decimals from the 4-decimal values in the indexer's
  // CieLabTest (computed from Bruce Lindbloom's sRGB matrix and D65 white, IEC 61966-2-1 and CIE 15:2004); white and
  // black are L* 100 and 0 by the definition of CIELAB.
  @Test
  void srgbPrimariesRoundTrip() {
    assertThat(LabColours.toSrgb(53.24, 80.09, 67.20)).containsExactly(255, 0, 0);
    assertThat(LabColours.toSrgb(87.73, -86.18, 83.18)).containsExactly(0, 255, 0);
    assertThat(LabColours.toSrgb(32.30, 79.19, -107.86)).containsExactly(0, 0, 255);
    assertThat(LabColours.toSrgb(100, 0, 0)).containsExactly(255, 255, 255);
    assertThat(LabColours.toSrgb(0, 0, 0)).containsExactly(0, 0, 0);
  }

  @Test
  void midGreyAndMissingValues() {
    // L* 53.39 is the lightness of linear luminance 0.2140 ((53.39 + 16) / 116 cubed, CIE 15:2004), which is sRGB 0.5
    // (IEC 61966-2-1, see CieLabTest), 127.5 of 255, shown as #808080 (sRGB 128 itself is L* 53.59; computed by us)
    assertThat(LabColours.hex(new double[] {53.39, 0, 0})).isEqualTo("#808080");
    assertThat(LabColours.hex(new double[] {Double.NaN, 0, 0})).isEqualTo("#808080");
    assertThat(LabColours.hex(new double[] {53.24, 80.09, 67.20})).isEqualTo("#ff0000");
  }
}
