/**
 * Warp estimation between two silhouettes: how far one object's outline must be moved to become the other's.
 *
 * <p>Two stages. {@link org.morphscout.indexer.warp.SimilarityAlignment} first removes position, size, in-plane
 * rotation and (optionally) a left-right flip, using image moments: centroids, the square root of the area ratio and
 * the principal axes of the second moments (both axis directions are tried, and the candidate with the best
 * intersection over union wins). {@link org.morphscout.indexer.warp.DemonsRegistration} then estimates a dense
 * displacement field between the aligned masks on a small common canvas, coarse to fine, with the diffeomorphic demons
 * of Vercauteren, Pennec, Perchant and Ayache (2009, "Diffeomorphic demons: efficient non-parametric image
 * registration", NeuroImage 45(1)), whose forces are Thirion's demons forces (1998, "Image matching as a diffusion
 * process: an analogy with Maxwell's demons", Medical Image Analysis 2(3)). The masks are registered through their
 * truncated signed distance transforms (Felzenszwalb and Huttenlocher 2012, "Distance transforms of sampled
 * functions", Theory of Computing 8), which gives the demons a force away from the outline too.
 *
 * <p>{@link org.morphscout.indexer.warp.WarpEstimator} ties both together and reports the overlap before and after
 * each stage, the warp's effort (displacement relative to the object's size) and its fold risk (where the Jacobian
 * determinant of the mapping is not positive). A caller that warps one picture with many others prepares its
 * silhouette once ({@link org.morphscout.indexer.warp.WarpShape}: its moments and image-relative grid) and gets the
 * same estimates. This package is API: the pair scorer and the preview morph use it. All classes are immutable and
 * thread-safe.
 */
package org.morphscout.indexer.warp;
