package org.morphscout.indexer.library;

import java.nio.file.Path;
import java.util.Optional;
import org.morphscout.indexer.feature.ModelDescription;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.silhouette.ModelFolder;

/**
 * Which tools analyse images.
 *
 * @param decode decoding limits (pixel cap, analysis size, thumbnail size)
 * @param silhouettes which silhouette extractor: the classical border model (with alpha cut-outs used as they are),
 *     the learned salient-object model, or a per-image choice between them
 * @param models the per-user folder the learned model is found in
 * @param model a user's own ONNX appearance model; empty for the built-in GIST + colour-layout descriptor
 */
public record AnalysisSetup(
    DecodeOptions decode, SilhouetteMode silhouettes, Optional<ModelDescription> model, ModelFolder models) {

  /** Which silhouette extractor to use. */
  public enum SilhouetteMode {
    /**
     * Per image, the more trustworthy of the classical and the learned silhouette (the learned model runs only where
     * the classical one is doubtful); the classical one alone when the learned model is not installed.
     */
    AUTO,
    /** Alpha cut-outs where present, else a background model from the border band. */
    CLASSICAL,
    /** The learned salient-object model for every image (morphscout models add-salient). */
    LEARNED
  }

  public AnalysisSetup {
    if (decode == null || silhouettes == null || model == null || models == null) {
      throw new IllegalArgumentException("analysis setup needs decode options, a silhouette mode and a model choice");
    }
  }

  /**
   * Classical silhouettes, the built-in appearance model, the default decoding limits and the user's model folder.
   * (The command line's default silhouettes are {@link SilhouetteMode#AUTO}; library callers choose explicitly.)
   */
  public static AnalysisSetup defaults() {
    return new AnalysisSetup(DecodeOptions.defaults(), SilhouetteMode.CLASSICAL, Optional.empty(),
        ModelFolder.resolve(Optional.empty()));
  }

  /**
   * What {@code morphscout index} uses without options, and the browser always: {@link #defaults()} with
   * {@link SilhouetteMode#AUTO} silhouettes (the learned model checks the classical silhouettes that are doubtful,
   * when it is installed). A low-contrast object (ivory on a cream backdrop) can get a classical silhouette of its
   * shadowed side in two pieces; the learned model finds the whole object.
   */
  public static AnalysisSetup indexDefaults() {
    return defaults().withSilhouettes(SilhouetteMode.AUTO);
  }

  public AnalysisSetup withModels(ModelFolder folder) {
    return new AnalysisSetup(decode, silhouettes, model, folder);
  }

  public AnalysisSetup withModel(ModelDescription description) {
    return new AnalysisSetup(decode, silhouettes, Optional.of(description), models);
  }

  public AnalysisSetup withSilhouettes(SilhouetteMode mode) {
    return new AnalysisSetup(decode, mode, model, models);
  }

  /** The largest picture, in pixels, any setup accepts (the decoder's cap). */
  public static final long MAX_PIXEL_CAP = DecodeOptions.MAX_PIXEL_CAP;

  /** Refuses pictures of more than {@code maxPixels} before decoding them ({@code --max-megapixels}). */
  public AnalysisSetup withMaxPixels(long maxPixels) {
    return withDecode(decode.withMaxPixels(maxPixels));
  }

  public AnalysisSetup withDecode(DecodeOptions options) {
    return new AnalysisSetup(options, silhouettes, model, models);
  }

  /** The model file, when a user model is chosen. */
  public Optional<Path> modelFile() {
    return model.map(ModelDescription::modelFile);
  }
}
