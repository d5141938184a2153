package org.morphscout.app.gui.service;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Two silhouettes brought onto one square grid so that their centroids and areas agree.
 *
 * @param a the first silhouette on the shared grid
 * @param b the second silhouette on the same grid
 * @param iou intersection over union of the aligned masks, in [0, 1]
 */
public record AlignedMasks(Mask a, Mask b, double iou) {}
