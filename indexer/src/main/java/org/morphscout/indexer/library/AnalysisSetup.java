package org.morphscout.indexer.library;

import java.nio.file.Path;
import java.util.Optional;
import org.morphscout.indexer.feature.ModelDescription;
import org.morphscout.indexer.ingest.DecodeOptions;

/**
 * Which tools analyse images.
 *
 * @param decode decoding limits (pixel cap, analysis size, thumbnail size)
 * @param silhouettes which silhouette extractor: the default border model (with alpha cut-outs used as they are), or
 *     the optional learned salient-object model stored with the catalog
 * @param model a user's own ONNX appearance model; empty for the built-in GIST + colour-layout descriptor
 */
public record AnalysisSetup(DecodeOptions decode, SilhouetteMode silhouettes, Optional<ModelDescription> model) {

  /** Which silhouette extractor to use. */
  public enum SilhouetteMode {
    /** Alpha cut-outs where present, else a background model from the border band. */
    DEFAULT,
    /** The learned salient-object model (morphscout models add-salient). */
    LEARNED
  }

  public AnalysisSetup {
    if (decode == null || silhouettes == null || model == null) {
      throw new IllegalArgumentException("analysis setup needs decode options, a silhouette mode and a model choice");
    }
  }

  public static AnalysisSetup defaults() {
    return new AnalysisSetup(DecodeOptions.defaults(), SilhouetteMode.DEFAULT, Optional.empty());
  }

  public AnalysisSetup withModel(ModelDescription description) {
    return new AnalysisSetup(decode, silhouettes, Optional.of(description));
  }

  public AnalysisSetup withSilhouettes(SilhouetteMode mode) {
    return new AnalysisSetup(decode, mode, model);
  }

  public AnalysisSetup withDecode(DecodeOptions options) {
    return new AnalysisSetup(options, silhouettes, model);
  }

  /** The model file, when a user model is chosen. */
  public Optional<Path> modelFile() {
    return model.map(ModelDescription::modelFile);
  }
}
