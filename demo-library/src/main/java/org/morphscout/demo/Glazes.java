package org.morphscout.demo;

import java.util.List;
import java.util.SplittableRandom;

/**
 * The studio's glaze palette. Names are ordinary potters' terms for glaze families; the colours are invented
 * approximations picked by eye.
 */
public final class Glazes {
  private static final List<Glaze> PALETTE = List.of(
      new Glaze("celadon", 0xA9C4A4, 0x6F8E74, 0.85, GlazeTexture.PLAIN, 0),
      new Glaze("tenmoku", 0x3A2418, 0xA5602C, 0.9, GlazeTexture.PLAIN, 0),
      new Glaze("shino", 0xE6D2B8, 0xC4763F, 0.35, GlazeTexture.PLAIN, 0),
      new Glaze("ash", 0x9A9A78, 0x5E6444, 0.45, GlazeTexture.PLAIN, 0),
      new Glaze("cobalt", 0x27428C, 0x8FA6D6, 0.9, GlazeTexture.PLAIN, 0),
      new Glaze("oxblood", 0x8A1F22, 0xD7C2B6, 0.9, GlazeTexture.PLAIN, 0),
      new Glaze("honey", 0xC08A35, 0x6B3E16, 0.8, GlazeTexture.PLAIN, 0),
      new Glaze("slate", 0x5B6470, 0xC9CDD2, 0.4, GlazeTexture.PLAIN, 0),
      new Glaze("ivory", 0xEEE8DA, 0x7A5A3E, 0.6, GlazeTexture.PLAIN, 0),
      new Glaze("turquoise", 0x3FA3A6, 0x1C4B5A, 0.8, GlazeTexture.PLAIN, 0),
      new Glaze("charcoal", 0x2B2B2D, 0xB8B1A5, 0.25, GlazeTexture.PLAIN, 0),
      new Glaze("terracotta", 0xB5623C, 0xE9DCC6, 0.12, GlazeTexture.PLAIN, 0),
      new Glaze("sage", 0x8FA08A, 0x3E4E3A, 0.3, GlazeTexture.PLAIN, 0),
      new Glaze("rutile", 0x8C6B4E, 0xC7B38E, 0.7, GlazeTexture.PLAIN, 0));

  private Glazes() {}

  /** All palette glazes, with {@link GlazeTexture#PLAIN}. */
  public static List<Glaze> palette() {
    return PALETTE;
  }

  /** The palette glaze of that name. */
  public static Glaze named(String name) {
    for (Glaze g : PALETTE) {
      if (g.name().equals(name)) {
        return g;
      }
    }
    throw new IllegalArgumentException("no glaze named '" + name + "' in the palette");
  }

  /**
   * A random palette glaze with a random texture: plain 40 %, speckle 18 %, crackle 12 %, stripes 15 %,
   * drip band 15 % (proportions chosen so every texture is well represented in a 200-picture library).
   */
  public static Glaze pick(SplittableRandom rnd) {
    Glaze base = PALETTE.get(rnd.nextInt(PALETTE.size()));
    double u = rnd.nextDouble();
    GlazeTexture texture = u < 0.40 ? GlazeTexture.PLAIN
        : u < 0.58 ? GlazeTexture.SPECKLE
        : u < 0.70 ? GlazeTexture.CRACKLE
        : u < 0.85 ? GlazeTexture.STRIPES : GlazeTexture.DRIP_BAND;
    return base.withTexture(texture, rnd.nextLong());
  }
}
