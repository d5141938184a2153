package org.morphscout.app.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.feature.ModelDescription;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.silhouette.ModelFolder;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Options that choose how images are analysed: shared by index and the commands that analyse files on the fly. */
final class AnalysisOptions {
  @Option(names = "--model", paramLabel = "<file.onnx|file.json>",
      description = "Your own ONNX image model (or a JSON model description) instead of the built-in descriptor. "
          + "Changing the model re-analyses the library; vectors of two models are never mixed.")
  Path model;

  @Option(names = "--model-input", paramLabel = "<w>x<h>", description = "Input size of --model (default 224x224).")
  String modelInput;

  @Option(names = "--model-output", paramLabel = "<name>", description = "Output tensor of --model (default: first).")
  String modelOutput;

  @Option(names = "--model-pool", negatable = true, defaultValue = "true", fallbackValue = "true",
      description = "Average-pool a 4-D output of --model over its spatial axes (default); --no-model-pool "
          + "flattens it.")
  boolean modelPool = true;

  @Option(names = "--silhouettes", paramLabel = "auto|classical|learned", defaultValue = "auto",
      converter = SilhouetteModeConverter.class,
      description = "Silhouette extractor: auto (per image, the more trustworthy of the classical and the learned "
          + "silhouette; the learned model runs only where the classical one is doubtful), classical (alpha "
          + "cut-outs, else a background model from the border) or learned (the salient-object model for every "
          + "image). Without the learned model installed, auto uses classical and says so once. "
          + "Default: ${DEFAULT-VALUE}.")
  AnalysisSetup.SilhouetteMode silhouettes;

  @Option(names = "--models", paramLabel = "<dir>",
      description = "Folder of downloaded models shared by all catalogs (default: $MORPHSCOUT_MODELS, else "
          + "~/.local/share/morphscout/models).")
  Path models;

  @Spec(Spec.Target.MIXEE) CommandSpec mixee;

  double maxMegapixels;

  @Option(names = "--max-megapixels", paramLabel = "<mp>", defaultValue = "250",
      description = "Refuse images larger than this before decoding (default: ${DEFAULT-VALUE}; at most 2147).")
  void maxMegapixels(double mp) {
    // Checked while parsing: a usage error before any catalog is opened.
    OptionCheck.of(mixee).positive("--max-megapixels", mp, AnalysisSetup.MAX_PIXEL_CAP / 1e6);
    maxMegapixels = mp;
  }

  AnalysisSetup setup() {
    AnalysisSetup s = AnalysisSetup.defaults()
        .withMaxPixels((long) (maxMegapixels * 1_000_000))
        .withSilhouettes(silhouettes)
        .withModels(ModelFolder.resolve(java.util.Optional.ofNullable(models)));
    if (model != null) {
      s = s.withModel(description());
    }
    return s;
  }

  private ModelDescription description() {
    try {
      if (model.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".json")) {
        return ModelDescription.fromJson(model);
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    ModelDescription d = ModelDescription.defaults(model);
    int w = d.inputWidth();
    int h = d.inputHeight();
    if (modelInput != null) {
      String[] wh = modelInput.toLowerCase(java.util.Locale.ROOT).split("x");
      try {
        w = Integer.parseInt(wh[0].trim());
        h = Integer.parseInt(wh[1].trim());
      } catch (RuntimeException e) {
        throw new MorphscoutException("--model-input takes <w>x<h>, for example 224x224; got " + modelInput);
      }
    }
    d = new ModelDescription(model, w, h, d.channelOrder(), d.mean(), d.std(), d.scale(), d.layout(),
        modelOutput == null ? d.outputName() : modelOutput, modelPool);
    return d;
  }

  /** Reads a silhouette mode by its lower-case name; "default" is the classical extractor's earlier name. */
  static final class SilhouetteModeConverter implements picocli.CommandLine.ITypeConverter<AnalysisSetup.SilhouetteMode> {
    @Override
    public AnalysisSetup.SilhouetteMode convert(String value) {
      String v = value.strip().toLowerCase(java.util.Locale.ROOT);
      return switch (v) {
        case "auto" -> AnalysisSetup.SilhouetteMode.AUTO;
        case "classical", "default" -> AnalysisSetup.SilhouetteMode.CLASSICAL;
        case "learned" -> AnalysisSetup.SilhouetteMode.LEARNED;
        default -> throw new picocli.CommandLine.TypeConversionException(
            "expected auto, classical or learned, got '" + value + "'");
      };
    }
  }
}
