package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Adding a sub-score touches one place: each {@link PairComponent} reaches the settings (its weight, reason threshold
 * and formula numbers, keyed by it, with its earlier flat weight name still read), the README (its row and its
 * settings' rows), the scorer's sub-scores and measures (the JSON keys), the browser's column title (its one-word
 * title) and the reasons (written exactly when its measure crosses its threshold). The scores themselves are checked
 * against the earlier implementation by {@link PairScoreReferenceTest}.
 */
class PairComponentDefinitionTest {
  private static final long SEED = 20261204L;
  private static final PairScorer SCORER =
      new PairScorer(ScoreConfig.DEFAULTS, ColourDifference.cie76(), new WarpEstimator());

  @Test
  void everyComponentHasItsSettingsKeyedByIt() {
    for (PairComponent c : PairComponent.values()) {
      assertThat(c.settings()).as(c.key()).startsWith(c.weightSetting(), c.reasonSetting());
      assertThat(c.weightSetting().key()).isEqualTo(c.key() + ".weight");
      assertThat(c.reasonSetting().key()).isEqualTo(c.key() + ".reason");
      assertThat(c.weightSetting().earlierNames()).as(c.key()).contains(c.key() + "Weight");
      for (ScoreSetting s : c.settings()) {
        assertThat(s.key()).startsWith(c.key() + ".");
        assertThat(ScoreSettings.all()).as(c.key()).contains(s);
        assertThat(ScoreConfig.DEFAULTS.value(s)).as(s.key()).isEqualTo(s.defaultValue());
      }
      assertThat(c.title()).as(c.key()).isNotBlank().doesNotContain(" ");
      assertThat(PairComponent.byKey(c.key())).contains(c);
    }
  }

  @Test
  void everyComponentHasItsReadmeRows() throws IOException {
    String readme = Files.readString(Path.of("..", "README.md"), StandardCharsets.UTF_8);
    for (PairComponent c : PairComponent.values()) {
      assertThat(readme).as(c.key()).contains("| `" + c.key() + "` | `" + c.measure().key() + "` | " + c.title());
      for (ScoreSetting s : c.settings()) {
        assertThat(readme).as(s.key()).contains("| `" + s.key() + "` | " + s.defaultText() + " | ");
      }
    }
  }

  @Test
  void everyComponentIsScoredAndMeasuredUnderItsKey() {
    SplittableRandom random = new SplittableRandom(SEED);
    int complete = 0;
    for (int i = 0; i < 200; i++) {
      PairFacts f = PairScoreReferenceTest.facts(random);
      if (!f.measurable() || !Double.isFinite(f.measures().appearanceDistance())
          || !Double.isFinite(f.measures().deltaE00()) || !Double.isFinite(f.measures().backgroundDeltaE())) {
        continue;
      }
      complete++;
      PairScore s = SCORER.explain(f);
      List<String> keys = new ArrayList<>();
      for (PairComponent c : PairComponent.values()) {
        keys.add(c.key());
        assertThat(s.measures()).as("case %d (seed %d)", i, SEED).containsEntry(c.measure().key(), c.measure(f));
        assertThat(s.components().get(c.key())).isEqualTo(c.subScore(f, ScoreConfig.DEFAULTS));
      }
      assertThat(s.components().keySet()).as("case %d (seed %d)", i, SEED).containsExactlyElementsOf(keys);
    }
    assertThat(complete).as("pairs with every measure (seed %d)", SEED).isGreaterThan(50);
  }

  @Test
  void everyComponentsReasonIsWrittenExactlyWhenItsMeasureCrossesItsThreshold() {
    for (PairComponent c : PairComponent.values()) {
      SplittableRandom random = new SplittableRandom(SEED);
      int crossed = 0;
      int kept = 0;
      for (int i = 0; i < 400; i++) {
        PairFacts f = PairScoreReferenceTest.facts(random);
        if (!f.measurable()) {
          continue;
        }
        boolean crosses = c.measure().direction().crosses(c.measure(f), ScoreConfig.DEFAULTS.reason(c));
        List<String> reasons = SCORER.explain(f).reasons();
        assertThat(reasons.contains(c.reasonText(f))).as("%s, case %d (seed %d): %s", c.key(), i, SEED, reasons)
            .isEqualTo(crosses);
        if (crosses) {
          crossed++;
        } else {
          kept++;
        }
      }
      assertThat(crossed).as("%s crossed (seed %d)", c.key(), SEED).isPositive();
      assertThat(kept).as("%s not crossed (seed %d)", c.key(), SEED).isPositive();
    }
  }

  @Test
  void changingAComponentsSettingsChangesOnlyWhatItDefines() {
    // Setting a component's weight to 0 leaves it out of the score, which moves some scores: the scorer reads each
    // component's weight from its definition.
    SplittableRandom random = new SplittableRandom(SEED);
    List<PairFacts> facts = new ArrayList<>();
    while (facts.size() < 40) {
      PairFacts f = PairScoreReferenceTest.facts(random);
      if (f.measurable() && Double.isFinite(f.measures().appearanceDistance())
          && Double.isFinite(f.measures().deltaE00()) && Double.isFinite(f.measures().backgroundDeltaE())) {
        facts.add(f);
      }
    }
    for (PairComponent c : PairComponent.values()) {
      PairScorer without = new PairScorer(ScoreConfig.DEFAULTS.withOverrides(Map.of(c.key() + ".weight", "0")),
          ColourDifference.cie76(), new WarpEstimator());
      int changed = 0;
      for (PairFacts f : facts) {
        if (SCORER.score(f) != without.score(f)) {
          changed++;
        }
      }
      assertThat(changed).as("%s: scores changed by leaving it out (seed %d)", c.key(), SEED).isPositive();
    }
  }
}
