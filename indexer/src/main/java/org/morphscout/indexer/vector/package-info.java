/**
 * Nearest-neighbour search over each image's two vectors (appearance and shape), by cosine similarity. API: callers
 * use {@link org.morphscout.indexer.vector.VectorIndex}; {@link org.morphscout.indexer.vector.LuceneVectorIndex} is
 * the catalog's index, {@link org.morphscout.indexer.vector.BruteForceVectorIndex} the exact in-memory reference.
 *
 * <h2>Method</h2>
 *
 * <p>Approximate search uses Hierarchical Navigable Small World graphs (HNSW): Yu. A. Malkov and D. A. Yashunin,
 * "Efficient and robust approximate nearest neighbor search using Hierarchical Navigable Small World graphs", IEEE
 * Transactions on Pattern Analysis and Machine Intelligence 42(4), 824-836 (2020; online 2018; arXiv:1603.09320).
 * We use Apache Lucene's implementation ({@code org.apache.lucene.util.hnsw}, vector format
 * {@code Lucene99HnswVectorsFormat}): one graph per field and segment, searched segment by segment. Vectors are scaled
 * to unit length on the way in and compared by dot product, which then equals the cosine.
 *
 * <p>Departure from the paper's single search: we ask the graph for more candidates than wanted ({@link
 * org.morphscout.indexer.vector.LuceneIndexOptions#candidates(int)}, the paper's <i>ef</i>), then rescore them exactly
 * from the stored float vectors and keep the best {@code k}. Reported similarities are therefore exact cosines, equal
 * to the brute-force ones for every image returned.
 *
 * <p>Optional scalar quantisation ({@code Lucene99HnswScalarQuantizedVectorsFormat}) stores a one-byte-per-component
 * copy (7-bit linear quantisation between per-segment quantiles, following Lucene's int8 format) that the graph search
 * reads instead of the floats: a quarter of the memory for the hot data, slightly lower recall before rescoring.
 *
 * <h2>Choosing options (see {@link org.morphscout.indexer.vector.LuceneIndexOptions})</h2>
 *
 * <ul>
 *   <li>Recall too low: first raise the fan-out (no rebuild needed), then {@code beamWidth}, then {@code maxConn}
 *       (both need re-indexing, which happens as images are re-added or when segments are merged).
 *   <li>Memory tight or more than ~100k images: {@code INT8}.
 *   <li>Up to a few thousand images, exact search is as fast: {@link
 *       org.morphscout.indexer.vector.BruteForceVectorIndex} would do, but the Lucene index persists and is shared.
 * </ul>
 *
 * <h2>Speed</h2>
 *
 * <p>Lucene computes dot products with SIMD instructions when the JVM runs with {@code --add-modules
 * jdk.incubator.vector} (JDK 21+; the launcher and the test runner pass it). Without it Lucene logs a warning and
 * falls back to scalar code, several times slower for graph building.
 *
 * <h2>Concurrency and processes</h2>
 *
 * <p>The index folder sits inside the catalog folder and has one writer at a time (Lucene's {@code write.lock});
 * read-only opens take no lock and see the last commit. Searches see committed state only.
 */
package org.morphscout.indexer.vector;
