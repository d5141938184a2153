package org.morphscout.indexer.silhouette;

/**
 * Shape facts of one silhouette.
 *
 * @param shapeVector normalised soft silhouette (centroid centred, scaled by sqrt(area), optionally rotated to the
 *     principal axis), flattened row-major and L2-normalised; searched as the second vector field
 * @param hu the seven Hu moment invariants (Hu 1962), h1..h7
 * @param bboxX bounding box left, as a fraction of image width, in [0, 1]
 * @param bboxY bounding box top, as a fraction of image height
 * @param bboxW bounding box width, as a fraction of image width
 * @param bboxH bounding box height, as a fraction of image height
 * @param aspect bounding box width over height in pixels
 * @param areaFraction object area over image area
 * @param centroidX centroid x as a fraction of image width
 * @param centroidY centroid y as a fraction of image height
 * @param orientation principal-axis angle in radians, in (-pi/2, pi/2]
 */
public record ShapeDescriptor(
    float[] shapeVector,
    double[] hu,
    double bboxX,
    double bboxY,
    double bboxW,
    double bboxH,
    double aspect,
    double areaFraction,
    double centroidX,
    double centroidY,
    double orientation) {

  public ShapeDescriptor {
    if (hu.length != 7) {
      throw new IllegalArgumentException("seven Hu moments expected, got " + hu.length);
    }
  }
}
