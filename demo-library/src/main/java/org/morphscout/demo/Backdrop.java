package org.morphscout.demo;

import java.util.Objects;

/**
 * A backdrop.
 *
 * @param kind what is painted
 * @param colourA main colour (wall / top / cloth), 0xRRGGBB sRGB
 * @param colourB second colour (floor / bottom / wood), 0xRRGGBB sRGB
 * @param horizon where the wall meets the floor or table, as a fraction of the image height in [0.2, 1]
 * @param seed seed of the texture, the gradient angle and the sensor grain
 */
public record Backdrop(BackdropKind kind, int colourA, int colourB, double horizon, long seed) {
  public Backdrop {
    Objects.requireNonNull(kind, "kind");
    if (!(horizon >= 0.2 && horizon <= 1)) {
      throw new IllegalArgumentException("backdrop horizon must be in [0.2, 1]: " + horizon);
    }
    colourA &= 0xFFFFFF;
    colourB &= 0xFFFFFF;
  }

  /** A light neutral studio sweep: the default product backdrop. */
  public static Backdrop studioSweep(long seed) {
    return new Backdrop(BackdropKind.STUDIO_SWEEP, 0xECEAE6, 0xDCD8D2, 0.62, seed);
  }
}
