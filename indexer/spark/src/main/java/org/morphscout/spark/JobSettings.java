package org.morphscout.spark;

import java.io.Serializable;
import org.morphscout.indexer.library.AnalysisSetup.SilhouetteMode;

/**
 * What every worker needs to analyse like {@code morphscout index}: the silhouette mode, the word the catalog stores
 * for it, and where the learned model is on the workers.
 *
 * @param mode the silhouette mode asked for
 * @param silhouettes the effective silhouettes, as the catalog names them ({@code classical} when "auto" has no model)
 * @param learnedModelFile the learned model's file name as shipped with the job (found with {@code SparkFiles}), or
 *     null when no learned model is used
 */
record JobSettings(SilhouetteMode mode, String silhouettes, String learnedModelFile) implements Serializable {

  JobSettings {
    if (mode == null || silhouettes == null || silhouettes.isBlank()) {
      throw new IllegalArgumentException("job settings need a silhouette mode");
    }
    if (!silhouettes.equals("classical") && learnedModelFile == null) {
      throw new IllegalArgumentException(silhouettes + " silhouettes need the learned model");
    }
  }
}
