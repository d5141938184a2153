package org.morphscout.indexer.warp;

/**
 * How well B's silhouette can be made into A's, measured on {@link WarpEstimator}'s canvas.
 *
 * @param iouBefore overlap of the masks as they are, both resampled onto a common grid in image-relative
 *     coordinates, in [0, 1]
 * @param iouAligned overlap after the similarity alignment, in [0, 1]
 * @param iouWarped overlap after the similarity and the warp, in [0, 1]
 * @param meanDisplacement mean displacement length over the union of both aligned objects, as a fraction of A's
 *     size (square root of A's area on the canvas); 0 means no warp needed, 0.2 is a visible bend
 * @param maxDisplacement largest displacement length over that union, same unit
 * @param foldFraction fraction of the union's pixels where the Jacobian determinant of {@code x -> x + u(x)} is
 *     &lt;= 0 (the warp folds), in [0, 1]
 * @param similarity the transform from B's mask to A's mask coordinates
 * @param canvas where the field's grid sits over A's mask
 * @param field displacements on the canvas: A's point x corresponds to aligned B's point x + u(x), in canvas pixels
 * @param turnedIou overlap B would reach if turned further than the alignment allows (laid on its side or upside
 *     down), NaN when no such pose was tried; see {@link Alignment#turnedIou()}
 * @param turnedRotation the rotation of that pose in radians, NaN with {@code turnedIou}
 */
public record WarpResult(
    double iouBefore,
    double iouAligned,
    double iouWarped,
    double meanDisplacement,
    double maxDisplacement,
    double foldFraction,
    Similarity similarity,
    Canvas canvas,
    DisplacementField field,
    double turnedIou,
    double turnedRotation) {}
