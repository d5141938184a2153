package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/**
 * The outcome of {@link SimilarityAlignment}: the chosen transform and both masks on a common canvas.
 *
 * @param similarity maps B's mask coordinates onto A's
 * @param canvas where the grids sit over A's mask
 * @param a A's coverage on the canvas, row-major, values in [0, 1] (shared array: do not modify)
 * @param b B's coverage after the similarity, same layout (shared array: do not modify)
 * @param iou soft intersection over union of {@code a} and {@code b}, in [0, 1]
 * @param turnedIou the best overlap among the candidates that turn B further than the rotation limit allows, or NaN
 *     when there were none: tells the user when two outlines would match if an object were laid on its side
 * @param turnedRotation that candidate's rotation in radians, NaN with {@code turnedIou}
 */
public record Alignment(Similarity similarity, Canvas canvas, float[] a, float[] b, double iou, double turnedIou,
    double turnedRotation) {

  /**
   * Both masks drawn through this alignment on a finer canvas over the same region ({@code size} pixels a side), for
   * display: element 0 is A, element 1 is B after the similarity; a pixel is set when at least half of it is covered.
   *
   * @param a the mask this alignment was computed from as A
   * @param b the mask it was computed from as B
   */
  public Mask[] draw(Mask a, Mask b, int size) {
    if (size < 8 || size > 2048) {
      throw new IllegalArgumentException("drawing size must be 8..2048 pixels, got " + size);
    }
    Canvas fine = new Canvas(size, canvas.scale() * size / canvas.size(), canvas.originX(), canvas.originY());
    return new Mask[] {threshold(Grids.rasterise(a, fine), size), threshold(Grids.rasterise(b, fine, similarity),
        size)};
  }

  private static Mask threshold(float[] grid, int size) {
    byte[] out = new byte[grid.length];
    for (int i = 0; i < grid.length; i++) {
      out[i] = (byte) (grid[i] >= 0.5f ? 1 : 0);
    }
    return new Mask(size, size, out);
  }
}
