package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/**
 * A silhouette prepared for {@link WarpEstimator}: its mask with what an estimate computes from that mask alone (the
 * moments the alignment starts from, the mask on the image-relative grid of the before-overlap). A picture takes part
 * in 20 to 30 stored pairs, so preparing it once per run instead of once per pair saves that work; the estimates are
 * the same to the last bit. Made by {@link WarpEstimator#shape}; immutable and thread-safe.
 */
public final class WarpShape {
  private final Mask mask;
  private final MaskMoments moments;
  private final float[] imageGrid;
  private final int gridSize;

  WarpShape(Mask mask, int gridSize) {
    this.mask = mask;
    this.moments = MaskMoments.of(mask);
    this.imageGrid = Grids.imageRelative(mask, gridSize);
    this.gridSize = gridSize;
  }

  public Mask mask() {
    return mask;
  }

  MaskMoments moments() {
    return moments;
  }

  /** The mask on the estimator's grid in image-relative coordinates (shared: do not modify). */
  float[] imageGrid() {
    return imageGrid;
  }

  int gridSize() {
    return gridSize;
  }
}
