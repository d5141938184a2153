package org.morphscout.indexer.analysis;

import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;

/**
 * Everything the pair scorer, chains and previews need about one image. Built by the indexer and stored in the
 * catalog, or computed on the fly for a file outside the catalog.
 *
 * @param id catalog image id, or -1 for an image analysed on the fly
 * @param path absolute path of the file
 * @param width full-resolution width after orientation
 * @param height full-resolution height after orientation
 * @param format lower-case format name
 * @param appearance L2-normalised appearance vector of {@code modelId}
 * @param modelId the appearance model's identifier
 * @param silhouette silhouette at analysis resolution
 * @param shape shape descriptors of the silhouette
 * @param colour CIELAB colour statistics
 * @param contentHash hex SHA-256 of the file's bytes ("" when unknown)
 */
public record ImageAnalysis(
    long id,
    String path,
    int width,
    int height,
    String format,
    float[] appearance,
    String modelId,
    Silhouette silhouette,
    ShapeDescriptor shape,
    ColourStats colour,
    String contentHash) {}
