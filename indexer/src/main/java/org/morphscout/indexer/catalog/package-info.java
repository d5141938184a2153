/**
 * The catalog: a folder holding the SQLite database (WAL mode), the Lucene vector index and cached thumbnails.
 *
 * <p>{@link org.morphscout.indexer.catalog.Catalog} owns the connection and transactions; the stores
 * ({@link org.morphscout.indexer.catalog.ImageStore}, {@link org.morphscout.indexer.catalog.FeatureStore},
 * {@link org.morphscout.indexer.catalog.DecisionStore}, {@link org.morphscout.indexer.catalog.NeighbourStore}) each
 * read and write one part of it. Every write that changes more than one row runs inside
 * {@link org.morphscout.indexer.catalog.Catalog#inTransaction}, so a crash never leaves half a change. One process
 * at a time may write (see {@link org.morphscout.indexer.catalog.WriterLock}); any number may read.
 */
package org.morphscout.indexer.catalog;
