package org.morphscout.indexer.values;

/**
 * One image as the catalog knows it.
 *
 * @param id stable identity: kept when the file moves inside the roots (matched by content hash)
 * @param path absolute path
 * @param size bytes
 * @param mtimeMs modification time, ms since the epoch
 * @param contentHash hex SHA-256, or null before the file was read
 * @param width pixels after orientation, 0 when unknown
 * @param height pixels after orientation, 0 when unknown
 * @param orientation EXIF orientation applied (1..8), 0 when unknown
 * @param format lower-case format, or null when unknown
 */
public record ImageRow(
    long id,
    long rootId,
    String path,
    long size,
    long mtimeMs,
    String contentHash,
    int width,
    int height,
    int orientation,
    String format,
    ImageStatus status) {}
