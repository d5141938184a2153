package org.morphscout.indexer.warp;

/**
 * The outcome of {@link SimilarityAlignment}: the chosen transform and both masks on a common canvas.
 *
 * @param similarity maps B's mask coordinates onto A's
 * @param canvas where the grids sit over A's mask
 * @param a A's coverage on the canvas, row-major, values in [0, 1] (shared array: do not modify)
 * @param b B's coverage after the similarity, same layout (shared array: do not modify)
 * @param iou soft intersection over union of {@code a} and {@code b}, in [0, 1]
 */
public record Alignment(Similarity similarity, Canvas canvas, float[] a, float[] b, double iou) {}
