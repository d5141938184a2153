package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;

/**
 * One decoded image, ready for analysis.
 *
 * @param analysis the picture at analysis resolution (long side at most the decoder's analysis size), sRGB,
 *     {@code TYPE_INT_ARGB}, EXIF orientation applied, alpha kept
 * @param width full-resolution width after orientation, in pixels
 * @param height full-resolution height after orientation, in pixels
 * @param format lower-case format name ("jpeg", "png", "tiff", "bmp", "gif", "webp")
 * @param orientation the EXIF orientation tag that was applied (1..8; 1 when absent)
 * @param hasAlpha whether the source carries an alpha channel
 */
public record DecodedImage(
    BufferedImage analysis, int width, int height, String format, int orientation, boolean hasAlpha) {

  public DecodedImage {
    if (analysis.getType() != BufferedImage.TYPE_INT_ARGB) {
      throw new IllegalArgumentException("analysis image must be TYPE_INT_ARGB");
    }
    if (orientation < 1 || orientation > 8) {
      throw new IllegalArgumentException("EXIF orientation must be 1..8, got " + orientation);
    }
  }
}
