package org.morphscout.indexer.library;

import java.io.IOException;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.feature.AppearanceEmbedder;
import org.morphscout.indexer.feature.ColourStatistics;
import org.morphscout.indexer.feature.OnnxAppearanceEmbedder;
import org.morphscout.indexer.ingest.ImageIoDecoder;
import org.morphscout.indexer.silhouette.DefaultSilhouettes;
import org.morphscout.indexer.silhouette.SalientModelSilhouettes;
import org.morphscout.indexer.silhouette.SalientModelStore;
import org.morphscout.indexer.silhouette.ShapeDescriptors;
import org.morphscout.indexer.silhouette.SilhouetteExtractor;

/** Builds the {@link ImageAnalyzer} an {@link AnalysisSetup} asks for, with models stored in the catalog folder. */
public final class AnalyzerFactory {
  private AnalyzerFactory() {}

  /** The analyser for {@code setup}; the caller closes its embedder ({@code analyzer.embedder().close()}). */
  public static ImageAnalyzer create(Library library, AnalysisSetup setup) throws IOException {
    SilhouetteExtractor silhouettes = switch (setup.silhouettes()) {
      case DEFAULT -> new DefaultSilhouettes();
      case LEARNED -> new SalientModelSilhouettes(new SalientModelStore().installedModel(library.catalog().dir())
          .orElseThrow(() -> new MorphscoutException("the learned silhouette model is not installed in "
              + library.catalog().dir() + ": run 'morphscout models add-salient' first")));
    };
    AppearanceEmbedder embedder = setup.model().isPresent()
        ? OnnxAppearanceEmbedder.custom(setup.model().get())
        : OnnxAppearanceEmbedder.builtIn(library.catalog().modelDir());
    return new ImageAnalyzer(new ImageIoDecoder(setup.decode()), silhouettes, new ShapeDescriptors(),
        new ColourStatistics(), embedder);
  }
}
