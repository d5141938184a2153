/**
 * The library as a whole: an open catalog with its stores, vector index and appearance model, and the services the
 * command line and the desktop browser call (indexing, similar images, pairs, chains, walks, screening). This is the
 * API of the indexer module.
 */
package org.morphscout.indexer.library;
