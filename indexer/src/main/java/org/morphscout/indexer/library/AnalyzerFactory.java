package org.morphscout.indexer.library;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Supplier;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.feature.AppearanceEmbedder;
import org.morphscout.indexer.feature.ColourStatistics;
import org.morphscout.indexer.feature.OnnxAppearanceEmbedder;
import org.morphscout.indexer.ingest.OpenCvJpegDecoder;
import org.morphscout.indexer.silhouette.ConfidenceChoiceSilhouettes;
import org.morphscout.indexer.silhouette.DefaultSilhouettes;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelSilhouettes;
import org.morphscout.indexer.silhouette.SalientModelStore;
import org.morphscout.indexer.silhouette.ShapeDescriptors;
import org.morphscout.indexer.silhouette.SilhouetteExtractor;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Builds the {@link ImageAnalyzer} an {@link AnalysisSetup} asks for: the appearance model stored in the catalog folder,
 * the learned silhouette model from the per-user model folder.
 */
public final class AnalyzerFactory {
  private static final Logger LOG = LoggerFactory.getLogger(AnalyzerFactory.class);
  private static final AtomicBoolean WARNED = new AtomicBoolean();

  private AnalyzerFactory() {}

  /** The analyser for {@code setup}; the caller closes its embedder ({@code analyzer.embedder().close()}). */
  public static ImageAnalyzer create(Library library, AnalysisSetup setup) throws IOException {
    return create(setup, library.catalog().modelDir(), learnedModel(library, setup));
  }

  /**
   * The analyser for {@code setup} outside a catalog (for example on a cluster's worker): the generated appearance
   * model is written to {@code appearanceModelDir}, and {@code learnedModel} is the salient-object model file, when
   * there is one. The caller closes its embedder.
   */
  public static ImageAnalyzer create(AnalysisSetup setup, Path appearanceModelDir, Optional<Path> learnedModel)
      throws IOException {
    SilhouetteExtractor silhouettes = switch (setup.silhouettes()) {
      case CLASSICAL -> new DefaultSilhouettes();
      case LEARNED -> new SalientModelSilhouettes(learnedModel
          .orElseThrow(() -> new MorphscoutException("the learned silhouette model is not installed in "
              + setup.models().dir() + ": run 'morphscout models add-salient' first")));
      case AUTO -> {
        if (learnedModel.isEmpty()) {
          warnOnce(setup.models());
          yield new DefaultSilhouettes();
        }
        yield new ConfidenceChoiceSilhouettes(new DefaultSilhouettes(), loadedOnFirstUse(learnedModel.get()),
            ConfidenceChoiceSilhouettes.Options.DEFAULTS);
      }
    };
    AppearanceEmbedder embedder = setup.model().isPresent()
        ? OnnxAppearanceEmbedder.custom(setup.model().get())
        : OnnxAppearanceEmbedder.builtIn(appearanceModelDir);
    return new ImageAnalyzer(OpenCvJpegDecoder.create(setup.decode()), silhouettes, new ShapeDescriptors(),
        new ColourStatistics(), embedder);
  }

  /**
   * The silhouettes {@code setup} gives on this machine, as stored with the catalog: "auto" falls back to
   * "classical" while the learned model is missing, so that installing it later analyses the library again.
   */
  public static String effectiveSilhouettes(Library library, AnalysisSetup setup) throws IOException {
    return effectiveSilhouettes(setup, learnedModel(library, setup));
  }

  /** As {@link #effectiveSilhouettes(Library, AnalysisSetup)}, given the learned model file found (if any). */
  public static String effectiveSilhouettes(AnalysisSetup setup, Optional<Path> learnedModel) {
    if (setup.silhouettes() == AnalysisSetup.SilhouetteMode.AUTO && learnedModel.isEmpty()) {
      return "classical";
    }
    return setup.silhouettes().name().toLowerCase(Locale.ROOT);
  }

  private static Optional<Path> learnedModel(Library library, AnalysisSetup setup) throws IOException {
    return new SalientModelStore().find(setup.models(), library.catalog().dir());
  }

  private static void warnOnce(ModelFolder folder) {
    if (WARNED.compareAndSet(false, true)) {
      LOG.warn("the learned silhouette model is not in {}: using classical silhouettes only (install it with "
          + "'morphscout models add-salient')", folder.dir());
    }
  }

  /** Loads the model the first time a silhouette needs it (most clean pictures never do). */
  private static Supplier<SilhouetteExtractor> loadedOnFirstUse(Path model) {
    return new Supplier<>() {
      private volatile SilhouetteExtractor loaded;

      @Override
      public SilhouetteExtractor get() {
        SilhouetteExtractor s = loaded;
        if (s == null) {
          synchronized (this) {
            s = loaded;
            if (s == null) {
              try {
                s = new SalientModelSilhouettes(model);
              } catch (IOException e) {
                throw new UncheckedIOException(e);
              }
              loaded = s;
            }
          }
        }
        return s;
      }
    };
  }
}
