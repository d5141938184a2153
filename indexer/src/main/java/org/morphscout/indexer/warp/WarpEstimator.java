package org.morphscout.indexer.warp;

import org.morphscout.indexer.silhouette.Mask;

/**
 * Estimates the warp between two silhouettes: similarity alignment, then diffeomorphic demons on the aligned masks,
 * then the overlap, effort and fold measures of {@link WarpResult}. Immutable and thread-safe; one estimate at the
 * default 64 x 64 grid takes a few milliseconds on one core (see the pair score latency in docs/BENCHMARKS.md).
 */
public final class WarpEstimator {
  private final SimilarityAlignment alignment;
  private final DemonsRegistration demons;
  private final int gridSize;

  /**
   * Defaults: {@link DemonsConfig#DEFAULT}, mirroring allowed, 15% margin, turns up to
   * {@link SimilarityAlignment#MORPH_MAX_ROTATION}.
   */
  public WarpEstimator() {
    this(DemonsConfig.DEFAULT, true);
  }

  public WarpEstimator(DemonsConfig config, boolean allowMirror) {
    this.gridSize = config.gridSize();
    this.alignment = new SimilarityAlignment(gridSize, allowMirror, 0.15, SimilarityAlignment.MORPH_MAX_ROTATION);
    this.demons = new DemonsRegistration(config);
  }

  /**
   * @param a the silhouette to morph from (its mask frames the canvas)
   * @param b the silhouette to morph to
   * @throws IllegalArgumentException when either mask is empty (callers report that case themselves)
   */
  public WarpResult estimate(Mask a, Mask b) {
    if (a.area() == 0 || b.area() == 0) {
      throw new IllegalArgumentException("cannot estimate a warp with an empty mask");
    }
    return estimate(shape(a), shape(b));
  }

  /**
   * {@link #estimate(Mask, Mask)} of prepared silhouettes: the same result, without preparing a silhouette again for
   * every pair it is in.
   *
   * @throws IllegalArgumentException when a shape was prepared by an estimator of another grid size
   */
  public WarpResult estimate(WarpShape a, WarpShape b) {
    if (a.gridSize() != gridSize || b.gridSize() != gridSize) {
      throw new IllegalArgumentException("warp shapes were prepared for a " + a.gridSize() + " or " + b.gridSize()
          + "-pixel grid, this estimator uses " + gridSize);
    }
    double iouBefore = Grids.quarterIou(a.imageGrid(), b.imageGrid());
    Alignment aligned = alignment.align(a.mask(), a.moments(), b.mask(), b.moments());
    DisplacementField field = demons.register(aligned.a(), aligned.b());
    return measure(iouBefore, aligned, field);
  }

  /**
   * A silhouette prepared for {@link #estimate(WarpShape, WarpShape)}.
   *
   * @throws IllegalArgumentException when the mask is empty
   */
  public WarpShape shape(Mask mask) {
    if (mask.area() == 0) {
      throw new IllegalArgumentException("cannot estimate a warp with an empty mask");
    }
    return new WarpShape(mask, gridSize);
  }

  /**
   * The similarity alignment {@link #estimate} starts from, alone: the same transform (rotation and flip included,
   * within the same turn limit) and the same aligned IoU ({@link Alignment#iou()} = {@link WarpResult#iouAligned()})
   * the pair measures and reasons report. For showing the aligned silhouettes without the cost of a registration.
   *
   * @throws IllegalArgumentException when either mask is empty
   */
  public Alignment align(Mask a, Mask b) {
    if (a.area() == 0 || b.area() == 0) {
      throw new IllegalArgumentException("cannot align an empty mask");
    }
    return alignment.align(a, b);
  }

  /** The measures of a given field between aligned masks (used by tests and alternative registrations). */
  static WarpResult measure(double iouBefore, Alignment aligned, DisplacementField field) {
    int n = field.width();
    float[] a = aligned.a();
    float[] b = aligned.b();
    float[] warped = new float[n * n];
    float[] union = new float[n * n];
    float[] ux = field.dx();
    float[] uy = field.dy();
    double sum = 0;
    double max = 0;
    int count = 0;
    for (int y = 0, i = 0; y < n; y++) {
      for (int x = 0; x < n; x++, i++) {
        warped[i] = Grids.bilinear(b, n, n, x + ux[i], y + uy[i]);
        union[i] = Math.max(a[i], b[i]);
        if (union[i] >= 0.5f) {
          double len = Math.hypot(ux[i], uy[i]);
          sum += len;
          max = Math.max(max, len);
          count++;
        }
      }
    }
    double size = Math.sqrt(Math.max(1.0, Grids.sum(a)));
    double mean = count == 0 ? 0 : sum / count / size;
    return new WarpResult(iouBefore, aligned.iou(), Grids.iou(a, warped), mean, max / size,
        field.foldFraction(union), aligned.similarity(), aligned.canvas(), field, aligned.turnedIou(),
        aligned.turnedRotation());
  }
}
