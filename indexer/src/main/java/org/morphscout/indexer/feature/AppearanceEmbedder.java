package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;
import java.util.List;

/**
 * Turns images into appearance vectors (L2-normalised, so cosine similarity is a dot product). Implementations are
 * thread-safe and must be closed.
 */
public interface AppearanceEmbedder extends AutoCloseable {
  /**
   * A stable identifier of the model and its preprocessing (for example "gist-lab-v1" or "custom:sha256-prefix"). The
   * catalog stores it; vectors of two identifiers are never compared.
   */
  String modelId();

  /** Length of every vector. */
  int dimension();

  /** Embeds a batch of analysis images (sRGB, TYPE_INT_ARGB); returns one vector per image, in order. */
  List<float[]> embed(List<BufferedImage> images);

  @Override
  void close();
}
