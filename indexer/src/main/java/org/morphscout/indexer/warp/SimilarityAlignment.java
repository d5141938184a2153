package org.morphscout.indexer.warp;

import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.silhouette.Mask;

/**
 * Aligns mask B onto mask A by a similarity transform computed from image moments: centroids are matched, B is
 * scaled by sqrt(area A / area B), and rotated so its principal axis (from the central second moments) lies on A's.
 * An axis has two directions, so the rotation and the rotation plus pi are both tried; with mirroring allowed, the
 * left-right flipped B is tried as well. The candidate whose masks overlap best (soft IoU on the canvas) wins; near
 * ties (within {@link #TIE_MARGIN}) go to the smaller rotation and to no flip.
 *
 * <p>Departures from a pure moment method: the unrotated candidate is always tried, because objects in photographs
 * are mostly upright and the principal axis of a nearly round or square outline is noise (a bowl is wide, a bottle
 * tall: their axes differ by 90 degrees while the best morph turns neither); and a rotation of more than
 * {@link #LARGE_ROTATION} radians must beat the best smaller one by {@link #LARGE_ROTATION_MARGIN} IoU, since a morph
 * that spins the object is rarely wanted. When either shape is nearly isotropic (anisotropy below
 * {@link #ISOTROPY_LIMIT}) the upside-down candidate is tried too. A {@code maxRotation} below pi leaves out every
 * candidate that turns B further than that: for morphs of upright objects the pair scorer uses
 * {@link #MORPH_MAX_ROTATION}, so a tall bottle is never laid on its side to match a wide bowl (its overlap would
 * look good while the morph would spin the object).
 *
 * <p>The canvas is square and covers A's bounding box and the disc that B covers after the similarity whatever its
 * rotation, plus a margin on each side. Immutable and thread-safe.
 */
public final class SimilarityAlignment {
  /** Below this anisotropy ((l1 - l2) / (l1 + l2) of the second moments) the principal axis is not trusted. */
  static final double ISOTROPY_LIMIT = 0.05;

  /** A less preferred candidate must beat a more preferred one by this much IoU to be chosen. */
  static final double TIE_MARGIN = 0.01;

  /** Rotations larger than this (30 degrees) count as turning the object. */
  static final double LARGE_ROTATION = Math.PI / 6;

  /** The IoU a large rotation must gain over the best smaller candidate to be chosen. */
  static final double LARGE_ROTATION_MARGIN = 0.05;

  /**
   * The turn allowed when aligning silhouettes for a morph (45 degrees): covers a tilted shot, excludes laying an
   * object on its side or upside down.
   */
  public static final double MORPH_MAX_ROTATION = Math.PI / 4;

  /** Preference cost of a flip, in radians of rotation: a flip is preferred over turning more than 90 degrees. */
  private static final double MIRROR_COST = 0.5 * Math.PI;

  private final int gridSize;
  private final boolean allowMirror;
  private final double margin;
  private final double maxRotation;

  /** Any rotation allowed: {@code SimilarityAlignment(gridSize, allowMirror, margin, Math.PI)}. */
  public SimilarityAlignment(int gridSize, boolean allowMirror, double margin) {
    this(gridSize, allowMirror, margin, Math.PI);
  }

  /**
   * @param gridSize canvas side in pixels (e.g. 64)
   * @param allowMirror whether a left-right flip of B may be used (default true: a flipped photo morphs as well)
   * @param margin free border on each side as a fraction of the covered extent, in [0, 1] (default 0.15)
   * @param maxRotation largest turn of B in radians, in [0, pi]; pi allows any (the unrotated candidate is always
   *     tried)
   */
  public SimilarityAlignment(int gridSize, boolean allowMirror, double margin, double maxRotation) {
    if (gridSize < 8) {
      throw new IllegalArgumentException("alignment grid must be at least 8 pixels, got " + gridSize);
    }
    if (!(margin >= 0 && margin <= 1)) {
      throw new IllegalArgumentException("alignment margin must be in [0, 1], got " + margin);
    }
    this.gridSize = gridSize;
    this.allowMirror = allowMirror;
    if (!(maxRotation >= 0 && maxRotation <= Math.PI)) {
      throw new IllegalArgumentException("largest alignment rotation must be in [0, pi] radians, got " + maxRotation);
    }
    this.margin = margin;
    this.maxRotation = maxRotation;
  }

  /**
   * @throws IllegalArgumentException when either mask is empty
   */
  public Alignment align(Mask a, Mask b) {
    return align(a, MaskMoments.of(a), b, MaskMoments.of(b));
  }

  /** {@link #align(Mask, Mask)} with the masks' moments already known. */
  Alignment align(Mask a, MaskMoments ma, Mask b, MaskMoments mb) {
    double scale = Math.sqrt(ma.area() / (double) mb.area());
    Canvas canvas = canvasFor(ma, mb, scale);
    float[] gridA = Grids.rasterise(a, ma, canvas);

    List<Similarity> candidates = new ArrayList<>();
    List<Similarity> turned = new ArrayList<>(); // beyond the rotation limit: only reported
    boolean isotropic = ma.anisotropy() < ISOTROPY_LIMIT || mb.anisotropy() < ISOTROPY_LIMIT;
    for (boolean mirror : allowMirror ? new boolean[] {false, true} : new boolean[] {false}) {
      // A flip x -> -x turns B's axis angle theta into -theta (and its centroid x into -x).
      double thetaB = mirror ? -mb.orientation() : mb.orientation();
      double base = ma.orientation() - thetaB;
      double[] rotations = isotropic ? new double[] {base, base + Math.PI, 0, Math.PI}
          : new double[] {base, base + Math.PI, 0};
      for (double rot : rotations) {
        // through() applies the flip itself, so pass B's unflipped centroid.
        Similarity sim = Similarity.through(scale, rot, mirror, mb.cx(), mb.cy(), ma.cx(), ma.cy());
        (Math.abs(normalised(rot)) > maxRotation + 1e-9 ? turned : candidates).add(sim);
      }
    }
    // Prefer upright and unflipped: photographs are mostly taken upright, and symmetric outlines (an egg, a bottle)
    // give near-equal overlaps for several candidates that differ only by pixel noise. Each candidate's turn is
    // computed once (the sort would otherwise normalise angles at every comparison).
    List<Turn> ordered = new ArrayList<>();
    for (Similarity sim : candidates) {
      ordered.add(new Turn(sim, Math.abs(normalised(sim.rotation()))));
    }
    ordered.sort(java.util.Comparator.comparingDouble((Turn t) -> t.turn() + (t.sim().mirror() ? MIRROR_COST : 0)));
    Similarity best = null;
    double bestTurn = 0;
    float[] bestB = null;
    double bestIou = -1;
    for (Turn t : ordered) {
      Similarity sim = t.sim();
      float[] gridB = Grids.rasterise(b, mb, canvas, sim);
      double iou = Grids.quarterIou(gridA, gridB);
      double needed = best != null && t.turn() > LARGE_ROTATION && bestTurn <= LARGE_ROTATION
          ? LARGE_ROTATION_MARGIN : TIE_MARGIN;
      if (iou > bestIou + needed) {
        best = sim;
        bestTurn = t.turn();
        bestB = gridB;
        bestIou = iou;
      }
    }
    double turnedIou = Double.NaN;
    double turnedRotation = Double.NaN;
    for (Similarity sim : turned) {
      double iou = Grids.quarterIou(gridA, Grids.rasterise(b, mb, canvas, sim));
      if (Double.isNaN(turnedIou) || iou > turnedIou) {
        turnedIou = iou;
        turnedRotation = sim.rotation();
      }
    }
    return new Alignment(best, canvas, gridA, bestB, bestIou, turnedIou, turnedRotation);
  }

  /** A candidate transform and how far it turns B, in radians in [0, pi]. */
  private record Turn(Similarity sim, double turn) {}

  /** An angle in (-pi, pi]. */
  static double normalised(double angle) {
    return Similarity.normalise(angle);
  }

  /** A canvas over A's mask, with B placed on A's centroid by any rotation; no transform. */
  Canvas canvasFor(MaskMoments ma, MaskMoments mb, double scale) {
    double r = mb.radius() * scale;
    double minX = Math.min(ma.minX(), ma.cx() - r);
    double maxX = Math.max(ma.maxX(), ma.cx() + r);
    double minY = Math.min(ma.minY(), ma.cy() - r);
    double maxY = Math.max(ma.maxY(), ma.cy() + r);
    double extent = Math.max(maxX - minX, maxY - minY) * (1 + 2 * margin);
    double cx = 0.5 * (minX + maxX);
    double cy = 0.5 * (minY + maxY);
    return new Canvas(gridSize, gridSize / extent, cx - extent / 2, cy - extent / 2);
  }
}
