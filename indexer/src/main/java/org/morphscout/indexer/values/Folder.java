package org.morphscout.indexer.values;

/**
 * A folder given to {@code index} and watched by the catalog (the catalog's tables call it a root).
 *
 * @param id the catalog's id of the folder
 * @param path absolute, normalised path
 */
public record Folder(long id, String path) {}
