package org.morphscout.demo;

import java.util.Locale;
import java.util.Objects;

/**
 * Ground truth for one file of the demo library: one line of {@code manifest.csv}.
 *
 * @param file path relative to the library root, '/'-separated, e.g. {@code vases/vase-celadon-017.jpg}
 * @param productLine folder of the product line ({@code vases}, {@code jugs}, ...), {@code shelves} for walkthrough
 *     views
 * @param archetypeA first archetype noun, empty for shelf views
 * @param archetypeB second archetype noun (equal to A when not blended), empty for shelf views
 * @param blendT blend parameter in [0, 1] from A to B (0 when not blended)
 * @param glaze glaze name, empty for shelf views (several glazes)
 * @param texture glaze texture label, empty for shelf views
 * @param backdrop backdrop label
 * @param width picture width, pixels
 * @param height picture height, pixels
 * @param format {@code jpeg} or {@code png}
 * @param alpha whether the picture has a real alpha cut-out
 * @param problem problem label ({@code cut-off}, {@code two-objects}, {@code very-dark}, {@code panoramic},
 *     {@code tiny}, {@code corrupt}) or empty
 * @param duplicateOf file this one is a near-duplicate of, or empty
 * @param shelfOrder position in the walkthrough's true order (0-based), or -1
 * @param seed the seed this picture was drawn from
 */
public record ManifestRow(String file, String productLine, String archetypeA, String archetypeB, double blendT,
    String glaze, String texture, String backdrop, int width, int height, String format, boolean alpha,
    String problem, String duplicateOf, int shelfOrder, long seed) {
  /** The CSV header line (RFC 4180 style, comma-separated, no quoting needed for our values). */
  public static final String HEADER = "file,product_line,archetype_a,archetype_b,blend_t,glaze,texture,backdrop,"
      + "width,height,format,alpha,problem,duplicate_of,shelf_order,seed";

  public ManifestRow {
    Objects.requireNonNull(file, "file");
    if (!(blendT >= 0 && blendT <= 1)) {
      throw new IllegalArgumentException("blendT must be in [0, 1]: " + blendT);
    }
    for (String s : new String[] {file, productLine, archetypeA, archetypeB, glaze, texture, backdrop, format,
        problem, duplicateOf}) {
      if (s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0) {
        throw new IllegalArgumentException("manifest values may not contain commas, quotes or newlines: " + s);
      }
    }
  }

  /** This row as one CSV line (no line terminator). */
  public String toCsv() {
    return String.join(",", file, productLine, archetypeA, archetypeB, String.format(Locale.ROOT, "%.3f", blendT),
        glaze, texture, backdrop, Integer.toString(width), Integer.toString(height), format,
        Boolean.toString(alpha), problem, duplicateOf, Integer.toString(shelfOrder), Long.toString(seed));
  }

  /** Parses a line written by {@link #toCsv()}. */
  public static ManifestRow parse(String line) {
    String[] f = line.split(",", -1);
    if (f.length != 16) {
      throw new IllegalArgumentException("manifest line needs 16 fields, has " + f.length + ": " + line);
    }
    return new ManifestRow(f[0], f[1], f[2], f[3], Double.parseDouble(f[4]), f[5], f[6], f[7],
        Integer.parseInt(f[8]), Integer.parseInt(f[9]), f[10], Boolean.parseBoolean(f[11]), f[12], f[13],
        Integer.parseInt(f[14]), Long.parseLong(f[15]));
  }
}
