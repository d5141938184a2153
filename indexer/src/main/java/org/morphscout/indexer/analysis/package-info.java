/**
 * Analysis of one image: decoding, silhouette, shape descriptors, colour statistics and the appearance vector, put
 * together into an {@link org.morphscout.indexer.analysis.ImageAnalysis}. Split in two steps so the indexer can run
 * the per-image work on all cores and the appearance model in batches. {@link
 * org.morphscout.indexer.analysis.PixelFingerprint} adds a small z-normalised luminance grid around the object for
 * telling edited copies from similar shots (compared by normalised cross-correlation, common practice; cf. the DCT
 * perceptual hash of Zauner 2010, "Implementation and benchmarking of perceptual image hash functions").
 */
package org.morphscout.indexer.analysis;
