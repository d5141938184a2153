package org.morphscout.indexer.warp;

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
    double turnedRotation) {}
