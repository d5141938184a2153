package org.morphscout.app.gui.inspector;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class LabColoursTest {
  // CIELAB (D65) coordinates of the sRGB primaries and white, as tabulated by Bruce Lindbloom's colour calculator
  // and most colour references (from memory, to 2 decimals).
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
    // L* 53.39 is sRGB 128 grey (common practice: the sRGB mid-grey)
    assertThat(LabColours.hex(new double[] {53.39, 0, 0})).isEqualTo("#808080");
    assertThat(LabColours.hex(new double[] {Double.NaN, 0, 0})).isEqualTo("#808080");
    assertThat(LabColours.hex(new double[] {53.24, 80.09, 67.20})).isEqualTo("#ff0000");
  }
}
