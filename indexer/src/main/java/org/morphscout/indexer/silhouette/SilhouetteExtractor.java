package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;

/** Finds the main object's silhouette in an image. Implementations are thread-safe. */
public interface SilhouetteExtractor {
  /**
   * @param image the analysis image (sRGB, TYPE_INT_ARGB, orientation applied, alpha kept)
   * @return the silhouette at the image's own size; an empty mask (confidence 0) when no object stands out
   */
  Silhouette extract(BufferedImage image);

  /** A short name stored in the catalog ("border-model", "learned"). */
  String name();
}
