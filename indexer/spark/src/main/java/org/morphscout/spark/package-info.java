/**
 * The cluster job: analyses image files on Apache Spark with the indexer's own {@code ImageAnalyzer} (one analyser per
 * worker JVM, loaded once) and writes the analyses as Parquet ({@link org.morphscout.spark.AnalysisColumn} names the
 * columns); {@link org.morphscout.spark.ParquetAnalyses} reads that output back for {@code morphscout import}.
 */
package org.morphscout.spark;
