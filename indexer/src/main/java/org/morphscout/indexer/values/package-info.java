/**
 * The plain values the catalog records and the library hands to its callers: an image ({@link
 * org.morphscout.indexer.values.ImageRow}) and where it stands ({@link org.morphscout.indexer.values.ImageStatus}), the
 * folders given to {@code index}, failed images, silhouette counts, how the vector index is split into segments, and
 * the user's decisions on pairs.
 *
 * <p>API: immutable records and enums with no I/O. They sit below both the catalog, which stores them, and the
 * {@code library} facade, which returns them, so that the application sees them without touching a store.
 */
package org.morphscout.indexer.values;
