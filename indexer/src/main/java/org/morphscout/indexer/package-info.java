/**
 * Morphscout's library: everything the command line and the desktop browser call, with no user interface of its
 * own and no console output. Subpackages each hold one job (ingestion, features, silhouettes, catalog, vector index,
 * warp estimation, pair scoring, chains, walks, previews).
 */
package org.morphscout.indexer;
