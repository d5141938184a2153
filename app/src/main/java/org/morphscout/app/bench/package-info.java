/**
 * Benchmarks of the library's main jobs, run by {@code morphscout bench} (never by the test suite): indexing
 * throughput against a decode-only floor, per-image feature costs, HNSW search latency and recall against an exact
 * scan, pair scoring and discovery, chain queries, walk ordering, heap use, and the per-image data volumes of a
 * catalog.
 *
 * <p>Part of the application, not of the library jar: every benchmark is one small class that drives the library's
 * public API and returns a result record, printing nothing; the command line formats the report. Randomness comes from seeds given by the caller. Latencies are wall-clock
 * ({@link System#nanoTime()}) over many repetitions after a warm-up, summarised as percentiles
 * ({@link Latencies}); heap figures are used-heap after explicit garbage collections ({@link HeapMeter}), so they
 * are estimates of live data, not exact object sizes.
 *
 * <p>Recall@k follows the usual definition of approximate nearest-neighbour benchmarks (e.g. Aumüller, Bernhardsson
 * and Faithfull, "ANN-Benchmarks", Information Systems 2020): the fraction of the exact k nearest neighbours that the
 * approximate search returns, averaged over the queries.
 */
package org.morphscout.app.bench;
