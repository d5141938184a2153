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
 * @param silhouette silhouette found at analysis resolution; its mask shrunk to at most {@link #MASK_LONG_SIDE} px
 * @param shape shape descriptors of the silhouette
 * @param colour CIELAB colour statistics
 * @param contentHash hex SHA-256 of the file's bytes ("" when unknown)
 * @param fingerprint the {@link PixelFingerprint} ({@value PixelFingerprint#LENGTH} z-normalised luminance cells), or
 *     null when unknown (features stored before catalog schema version 4, until the next index run fills them in)
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
    String contentHash,
    float[] fingerprint) {

  /**
   * Long side, in pixels, of the silhouette mask an analysis carries: the analysis-size mask is shrunk to it once the
   * shape, colour and fingerprint are computed, so an image analysed on the fly scores exactly like one loaded from
   * the catalog (which stores masks at this size), and warp estimation scans 128-pixel masks, not 768-pixel ones.
   */
  public static final int MASK_LONG_SIDE = 128;

  /** An analysis without a pixel fingerprint (unknown): near-duplicate checks then use the other evidence only. */
  public ImageAnalysis(long id, String path, int width, int height, String format, float[] appearance, String modelId,
      Silhouette silhouette, ShapeDescriptor shape, ColourStats colour, String contentHash) {
    this(id, path, width, height, format, appearance, modelId, silhouette, shape, colour, contentHash, null);
  }
}
