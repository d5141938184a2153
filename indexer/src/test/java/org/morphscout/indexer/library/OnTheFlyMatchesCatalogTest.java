package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * A pair scores the same whether its images were analysed on the fly (screening files outside the catalog) or
 * loaded from the catalog: both carry masks of the same size, and the stored features round-trip.
 */
class OnTheFlyMatchesCatalogTest {
  private static final long SEED = 5150;
  @TempDir Path tmp;

  @Test
  void scoresAgreeBetweenFreshAndStoredAnalyses() throws IOException {
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 3, Archetype.JAR, Archetype.VASE, 480, 360);
    Path root = tmp.resolve("pictures");
    Path a = RealCatalog.png(root.resolve("a.png"), family.get(0).image());
    Path b = RealCatalog.png(root.resolve("b.png"), family.get(2).image());
    PairScorer scorer = new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
    try (RealCatalog catalog = RealCatalog.index(tmp.resolve("catalog"), root, 4)) {
      ImageAnalysis storedA = catalog.analysis(a);
      ImageAnalysis storedB = catalog.analysis(b);
      ImageAnalysis freshA = catalog.context.analyzer().analyze(a);
      ImageAnalysis freshB = catalog.context.analyzer().analyze(b);
      assertThat(freshA.silhouette().mask()).isEqualTo(storedA.silhouette().mask());
      assertThat(Math.max(freshA.silhouette().mask().width(), freshA.silhouette().mask().height()))
          .isEqualTo(ImageAnalysis.MASK_LONG_SIDE);
      PairScore stored = scorer.score(storedA, storedB);
      PairScore fresh = scorer.score(freshA, freshB);
      assertThat(fresh.score()).as("seed %d", SEED).isCloseTo(stored.score(), within(1e-6));
      assertThat(fresh.reasons()).isEqualTo(stored.reasons());
    }
  }
}
