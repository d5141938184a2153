package org.morphscout.app.gui.service;

import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.warp.Alignment;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Aligns two silhouettes for the pairs view's overlay with the library's own alignment, the one the pair measures
 * and reasons use ({@link WarpEstimator#align}: centroids and areas matched, B turned onto A's axis within the morph's
 * turn limit, flipped when that fits better), drawn on a finer grid for the screen. The IoU shown is that alignment's
 * aligned IoU, the {@code alignedIou} the command line prints for the pair. Stateless.
 */
public final class MaskAligner {
  private static final WarpEstimator ALIGNMENT = new WarpEstimator();

  private MaskAligner() {}

  /** Aligns both masks onto a {@code size} x {@code size} grid (size 16..1024); empty masks give empty grids, IoU 0. */
  public static AlignedMasks align(Mask a, Mask b, int size) {
    if (size < 16 || size > 1024) {
      throw new IllegalArgumentException("grid size must be 16..1024, got " + size);
    }
    if (a.area() == 0 || b.area() == 0) {
      return new AlignedMasks(Mask.empty(size, size), Mask.empty(size, size), 0);
    }
    Alignment aligned = ALIGNMENT.align(a, b);
    Mask[] drawn = aligned.draw(a, b, size);
    return new AlignedMasks(drawn[0], drawn[1], aligned.iou());
  }
}
