package org.morphscout.indexer.analysis;

import java.nio.file.Path;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.ingest.DecodedImage;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;

/**
 * An image with everything but its appearance vector, waiting for a batch of the appearance model.
 *
 * @param fingerprint the {@link PixelFingerprint} of the analysis image
 */
public record PreparedImage(
    Path file, String contentHash, DecodedImage decoded, Silhouette silhouette, ShapeDescriptor shape,
    ColourStats colour, float[] fingerprint) {}
