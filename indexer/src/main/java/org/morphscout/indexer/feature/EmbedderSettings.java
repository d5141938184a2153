package org.morphscout.indexer.feature;

/**
 * Runtime settings of an {@link OnnxAppearanceEmbedder}. Immutable and validated.
 *
 * @param batchSize images per model call, 1..256; default 16 (larger batches gain little on a CPU and hold more
 *     memory: 16 GIST inputs are 4 MB)
 * @param intraOpThreads ONNX Runtime threads inside one call, 1..64; default 1, because the indexer parallelises
 *     across images and extra threads per call would then only compete
 */
public record EmbedderSettings(int batchSize, int intraOpThreads) {
  public static final EmbedderSettings DEFAULT = new EmbedderSettings(16, 1);

  public EmbedderSettings {
    if (batchSize < 1 || batchSize > 256) {
      throw new IllegalArgumentException("batchSize must be 1..256: " + batchSize);
    }
    if (intraOpThreads < 1 || intraOpThreads > 64) {
      throw new IllegalArgumentException("intraOpThreads must be 1..64: " + intraOpThreads);
    }
  }
}
