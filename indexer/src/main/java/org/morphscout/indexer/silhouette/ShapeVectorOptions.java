package org.morphscout.indexer.silhouette;

/**
 * How the normalised soft silhouette vector is made.
 *
 * @param grid side of the square sampling grid in cells; the vector has grid^2 entries. Default 32 (1024 floats):
 *     enough to tell a vase from a bottle, small enough to search quickly. Range 8..256.
 * @param rotateToPrincipalAxis turn the shape so its principal (long) axis runs down the grid's columns, the
 *     180-degree ambiguity settled by making the third moment along that axis non-negative. Default false: most
 *     libraries hold upright objects, and rotation invariance would match a lying bottle with a standing one.
 * @param canonicalMirror flip the grid left-right when its horizontal third moment is positive, so a shape and
 *     its mirror image give the same vector. Default false.
 * @param blurSigma Gaussian blur applied to the grid, in cells, 0 for none. Default 1.0: it turns small misalignments
 *     into small distances instead of none-or-all overlaps. Range 0..8.
 */
public record ShapeVectorOptions(int grid, boolean rotateToPrincipalAxis, boolean canonicalMirror, double blurSigma) {
  /** The documented defaults: 32x32, upright, no mirror canonicalisation, blur sigma 1 cell. */
  public static final ShapeVectorOptions DEFAULTS = new ShapeVectorOptions(32, false, false, 1.0);

  public ShapeVectorOptions {
    if (grid < 8 || grid > 256) {
      throw new IllegalArgumentException("grid must be in 8..256, got " + grid);
    }
    if (!(blurSigma >= 0 && blurSigma <= 8)) {
      throw new IllegalArgumentException("blurSigma must be in [0, 8] cells, got " + blurSigma);
    }
  }

  public static ShapeVectorOptions defaults() {
    return DEFAULTS;
  }
}
