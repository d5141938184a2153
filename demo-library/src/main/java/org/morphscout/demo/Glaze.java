package org.morphscout.demo;

import java.util.Objects;

/**
 * A glaze: name, colours, gloss and surface pattern.
 *
 * @param name lower-case name used in file names and the manifest, e.g. {@code "celadon"}
 * @param baseRgb main colour, 0xRRGGBB sRGB
 * @param accentRgb colour of the pattern (speckle, crackle lines, stripes, dipped glaze), 0xRRGGBB sRGB
 * @param gloss 0 = dry matte, 1 = glassy; drives highlight size and strength
 * @param texture surface pattern
 * @param patternSeed seed of the pattern (where the spots, cracks and runs fall)
 */
public record Glaze(String name, int baseRgb, int accentRgb, double gloss, GlazeTexture texture, long patternSeed) {
  public Glaze {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(texture, "texture");
    if (name.isBlank()) {
      throw new IllegalArgumentException("glaze name must not be blank");
    }
    if (!(gloss >= 0 && gloss <= 1)) {
      throw new IllegalArgumentException("gloss must be in [0, 1]: " + gloss);
    }
    baseRgb &= 0xFFFFFF;
    accentRgb &= 0xFFFFFF;
  }

  public Glaze withTexture(GlazeTexture newTexture, long newSeed) {
    return new Glaze(name, baseRgb, accentRgb, gloss, newTexture, newSeed);
  }

  /** The same glaze with its base colour nudged by {@code (dr, dg, db)} 8-bit steps, e.g. a second firing. */
  public Glaze shifted(int dr, int dg, int db) {
    int r = Colours.clamp8(((baseRgb >> 16) & 0xFF) + dr);
    int g = Colours.clamp8(((baseRgb >> 8) & 0xFF) + dg);
    int b = Colours.clamp8((baseRgb & 0xFF) + db);
    return new Glaze(name, (r << 16) | (g << 8) | b, accentRgb, gloss, texture, patternSeed);
  }
}
