package org.morphscout.indexer.warp;

import java.util.List;

/**
 * Settings of {@link DemonsRegistration}. Immutable; validated on construction.
 *
 * @param gridSize canvas side in pixels at the finest level (default 64). 64 resolves the outline of a whole object
 *     well enough to judge a morph and costs a few ms; 128 shows finer parts (handles, fingers) at about 4-5x the
 *     time. Must be divisible by 2^(levels - 1) and leave at least 8 pixels at the coarsest level.
 * @param levels pyramid levels, coarse to fine, 1..4 (default 3: 16, 32, 64 pixels). More levels catch larger
 *     displacements.
 * @param iterations demons iterations per level, coarsest first (default 40, 20, 5); the coarse levels are cheap,
 *     so most of the work is spent there, and the finest level only refines (one of its iterations costs as much as
 *     16 at the coarsest). Measured on the 4,729 warped pairs of the demo library against the earlier 40, 25, 12:
 *     40, 20, 6 cost about a third less, pair scores moved by 0.04 points on average and at most 1.4 (of 100), the
 *     warped IoU by at most 0.032 and the mean displacement by at most 0.022 (object sizes). 5 instead of 6 at the
 *     finest level, with the coarser scaling and squaring of {@link DemonsRegistration}, moved them by 0.01 on
 *     average and at most 0.46 (docs/BENCHMARKS.md). The coarsest level stops after about 11 iterations on average
 *     (its update stalls), the middle one after 12 or 13, the finest runs all of its own.
 * @param sigmaFluid standard deviation in pixels of the Gaussian applied to each update field (fluid-like
 *     regularisation, default 1.0; 0 disables). Larger values give smoother but slower-converging updates.
 * @param sigmaDiffusion standard deviation in pixels of the Gaussian applied to the accumulated field after each
 *     iteration (diffusion-like regularisation, default 1.0; 0 disables). Larger values give a stiffer warp.
 * @param maxStep largest update per iteration, in pixels of the current level (default 2.0, range (0, 8]); it sets
 *     Vercauteren's sigma_x as 2 * maxStep.
 */
public record DemonsConfig(
    int gridSize, int levels, List<Integer> iterations, double sigmaFluid, double sigmaDiffusion, double maxStep) {

  public static final DemonsConfig DEFAULT = new DemonsConfig(64, 3, List.of(40, 20, 5), 1.0, 1.0, 2.0);

  public DemonsConfig {
    if (levels < 1 || levels > 4) {
      throw new IllegalArgumentException("demons levels must be 1..4, got " + levels);
    }
    if (gridSize < 8 || gridSize > 512 || gridSize % (1 << (levels - 1)) != 0
        || (gridSize >> (levels - 1)) < 8) {
      throw new IllegalArgumentException("demons grid size must be in 8..512, divisible by 2^(levels-1) = "
          + (1 << (levels - 1)) + " and leave at least 8 pixels at the coarsest level; got " + gridSize);
    }
    iterations = List.copyOf(iterations);
    if (iterations.size() != levels) {
      throw new IllegalArgumentException(
          "demons needs one iteration count per level (" + levels + "), got " + iterations.size());
    }
    for (int it : iterations) {
      if (it < 0 || it > 1000) {
        throw new IllegalArgumentException("demons iterations per level must be 0..1000, got " + it);
      }
    }
    if (!(sigmaFluid >= 0 && sigmaFluid <= 10) || !(sigmaDiffusion >= 0 && sigmaDiffusion <= 10)) {
      throw new IllegalArgumentException("demons smoothing sigmas must be in [0, 10] pixels");
    }
    if (!(maxStep > 0 && maxStep <= 8)) {
      throw new IllegalArgumentException("demons max step must be in (0, 8] pixels, got " + maxStep);
    }
  }

  /** The same settings with another grid size and the default pyramid for it. */
  public DemonsConfig withGridSize(int size) {
    return new DemonsConfig(size, levels, iterations, sigmaFluid, sigmaDiffusion, maxStep);
  }
}
