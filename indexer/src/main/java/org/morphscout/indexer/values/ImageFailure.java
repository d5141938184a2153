package org.morphscout.indexer.values;

/**
 * An image that could not be read or analysed, with the reason shown to the user.
 *
 * @param failedAt ISO-8601 instant (UTC) of the failure
 */
public record ImageFailure(long imageId, String path, String reason, String failedAt) {}
