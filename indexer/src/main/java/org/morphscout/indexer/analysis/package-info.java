/**
 * Analysis of one image: decoding, silhouette, shape descriptors, colour statistics and the appearance vector, put
 * together into an {@link org.morphscout.indexer.analysis.ImageAnalysis}. Split in two steps so the indexer can run
 * the per-image work on all cores and the appearance model in batches.
 */
package org.morphscout.indexer.analysis;
