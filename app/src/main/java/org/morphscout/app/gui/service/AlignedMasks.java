package org.morphscout.app.gui.service;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Two silhouettes brought onto one square grid by the library's pair alignment (centroids, areas, turn and flip).
 *
 * @param a the first silhouette on the shared grid
 * @param b the second silhouette on the same grid
 * @param iou the aligned IoU of the pair, in [0, 1]: the library's figure (soft masks on its alignment grid), the
 *     {@code alignedIou} the command line reports, not recounted from the drawn grids
 */
public record AlignedMasks(Mask a, Mask b, double iou) {}
