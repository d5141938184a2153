package org.morphscout.indexer.values;

/**
 * What one stored silhouette says about its picture, for the browser's findings.
 *
 * @param imageId the catalog id of the image
 * @param components how many separate objects the silhouette holds
 * @param touchesFrame whether the object is cut off by the picture's edge
 * @param uncertain whether an object was found with a confidence below the library's threshold (as {@code status}
 *     and the pair reasons count it)
 */
public record SilhouetteTraits(long imageId, int components, boolean touchesFrame, boolean uncertain) {}
