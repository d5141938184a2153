/**
 * Silhouettes: finding the main object's mask in an image, and describing its shape. Library API.
 *
 * <p>Extractors ({@link org.morphscout.indexer.silhouette.SilhouetteExtractor}):
 * <ul>
 *   <li>{@link org.morphscout.indexer.silhouette.DefaultSilhouettes}: the one to use; alpha when the image is a real
 *       cut-out, else the border background model;</li>
 *   <li>{@link org.morphscout.indexer.silhouette.BorderModelSilhouettes}: background learned from a band along the
 *       image border in CIELAB (robust smooth surface plus up to three colour modes), Otsu's threshold on the
 *       distance map, morphological cleanup; fast, no model needed; fails when the object shares the background's
 *       colour or fills the frame;</li>
 *   <li>{@link org.morphscout.indexer.silhouette.AlphaSilhouettes}: the alpha channel of cut-outs;</li>
 *   <li>{@link org.morphscout.indexer.silhouette.SalientModelSilhouettes}: optional, a salient-object network
 *       (U-2-Net, small variant) run on the CPU through DJL and ONNX Runtime, for cluttered photographs; its weights
 *       are installed once by {@link org.morphscout.indexer.silhouette.SalientModelStore}, never downloaded at run
 *       time.</li>
 * </ul>
 *
 * <p>Building blocks, each tested against a plain reference or OpenCV: {@link org.morphscout.indexer.silhouette.Otsu}
 * (N. Otsu, IEEE Trans. SMC 9(1), 1979), {@link org.morphscout.indexer.silhouette.Morphology} (exact Euclidean
 * distance transform, Felzenszwalb and Huttenlocher, Theory of Computing 8, 2012),
 * {@link org.morphscout.indexer.silhouette.Components} (two-pass union-find labelling, Rosenfeld and Pfaltz, JACM
 * 1966), {@link org.morphscout.indexer.silhouette.HuMoments} (M.-K. Hu, IRE Trans. IT-8, 1962) and
 * {@link org.morphscout.indexer.silhouette.ShapeDescriptors} (bounding box, centroid, orientation, Hu moments and
 * the normalised soft silhouette vector searched for shape neighbours). U-2-Net: X. Qin et al., "U^2-Net: Going
 * deeper with nested U-structure for salient object detection", Pattern Recognition 106, 2020.
 */
package org.morphscout.indexer.silhouette;
