package org.morphscout.indexer.library;

import java.util.Optional;
import org.morphscout.indexer.catalog.FeatureStore;

/** Names of catalog-wide settings and typed access to them. */
public final class LibrarySettings {
  /** The appearance model whose vectors the catalog holds. */
  public static final String ACTIVE_MODEL = "active_model";
  /** The silhouette extractor whose masks the catalog holds ("default" or "learned"). */
  public static final String ACTIVE_SILHOUETTES = "active_silhouettes";
  /** How the vector index stores vectors ("NONE" for float32, "INT8"). */
  public static final String VECTOR_QUANTIZATION = "vector_quantization";
  /**
   * Written when every ready image's pairs are stored and measured: {@code <measuring version>:<candidates>:<model>}.
   * The catalog's own triggers delete it whenever stored pairs are voided (layout step 06).
   */
  public static final String STORED_PAIRS_COMPLETE = "stored_pairs_complete";

  private LibrarySettings() {}

  public static Optional<String> activeModel(FeatureStore features) {
    return features.setting(ACTIVE_MODEL);
  }
}
