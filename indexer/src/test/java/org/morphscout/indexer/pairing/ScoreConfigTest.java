package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

class ScoreConfigTest {
  @TempDir Path dir;

  @Test
  void rejectsBadValuesWithClearMessages() {
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.weight", "-1")))
        .isInstanceOf(MorphscoutException.class)
        .hasMessage("setting silhouetteMatch.weight in command-line options must be >= 0, got -1");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.zero", "0.99")))
        .hasMessage("invalid settings in command-line options: silhouetteMatch.zero must be below "
            + "silhouetteMatch.full, got 0.99 and 0.95");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("passScore", "30")))
        .hasMessageContaining("warnScore must be at most passScore, got 40 and 30");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("cutOffPenalty", "1.5")))
        .hasMessageContaining("cutOffPenalty in command-line options must be > 0 and <= 1, got 1.5");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("warpEffort.scale", "abc")))
        .hasMessageContaining("warpEffort.scale").hasMessageContaining("must be a number")
        .hasMessageContaining("'abc'");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("tinyLongSide", "12.5")))
        .hasMessageContaining("whole number");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("colour.scale", "Infinity")))
        .hasMessageContaining("colour.scale").hasMessageContaining("finite");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.with(ScoreConfig.PASS_SCORE, 101))
        .isInstanceOf(IllegalArgumentException.class).hasMessage("passScore must be 0 to 100, got 101");
  }

  @Test
  void allWeightsZeroIsRejected() {
    Map<String, String> zero = new HashMap<>();
    for (PairComponent c : PairComponent.values()) {
      zero.put(c.weightSetting().key(), "0");
    }
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(zero))
        .hasMessageContaining("at least one sub-score weight must be positive");
  }

  @Test
  void unknownKeysAreRejectedByName() {
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.wieght", "2")))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("unknown setting silhouetteMatch.wieght in command-line options")
        .hasMessageContaining("silhouetteMatch.weight")
        .hasMessageNotContaining("overlapWeight") // earlier names are read, never offered
        .hasMessageNotContaining("silhouetteMatchWeight");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("passScore.x", "2")))
        .hasMessageContaining("unknown setting passScore.x");
  }

  @Test
  void earlierFlatNamesStillLoadWithTheirMeaning() throws IOException {
    // Settings files written before the settings were grouped by sub-score say overlapWeight (the silhouette match
    // was called overlap before), silhouetteMatchWeight, iouZero or reasonDeltaE; they load with the same meaning.
    Path props = dir.resolve("earlier.properties");
    Files.writeString(props, "overlapWeight = 4.5\npassScore = 70\niouZero = 0.2\nreasonDeltaE = 12\n");
    ScoreConfig p = ScoreConfig.load(props);
    assertThat(p.weight(PairComponent.SILHOUETTE_MATCH)).isEqualTo(4.5);
    assertThat(p.passScore()).isEqualTo(70);
    assertThat(p.value(ScoreSettings.byName("silhouetteMatch.zero").orElseThrow())).isEqualTo(0.2);
    assertThat(p.reason(PairComponent.COLOUR)).isEqualTo(12);
    Path json = dir.resolve("earlier.json");
    Files.writeString(json, "{\"overlapWeight\": 0.5}");
    assertThat(ScoreConfig.load(json).weight(PairComponent.SILHOUETTE_MATCH)).isEqualTo(0.5);
    assertThat(ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatchWeight", "2"))
        .weight(PairComponent.SILHOUETTE_MATCH)).isEqualTo(2);
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("overlapWeight", "2",
        "silhouetteMatch.weight", "3")))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("give only silhouetteMatch.weight");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("overlapWeight", "-1")))
        .hasMessage("setting overlapWeight in command-line options must be >= 0, got -1");
  }

  @Test
  void everyEarlierFlatNameReachesItsSetting() {
    // The flat names of the release before settings were grouped (ScoreConfig's record components then), each with
    // the setting it now sets.
    Map<String, String> earlier = new HashMap<>();
    for (PairComponent c : PairComponent.values()) {
      earlier.put(c.key() + "Weight", c.key() + ".weight");
    }
    earlier.putAll(Map.ofEntries(Map.entry("iouZero", "silhouetteMatch.zero"),
        Map.entry("iouFull", "silhouetteMatch.full"), Map.entry("effortScale", "warpEffort.scale"),
        Map.entry("foldTolerance", "foldSafety.tolerance"), Map.entry("appearanceScale", "appearance.scale"),
        Map.entry("deltaEScale", "colour.scale"), Map.entry("lightnessScale", "lightness.scale"),
        Map.entry("aspectScale", "aspect.scale"), Map.entry("resolutionFull", "resolution.full"),
        Map.entry("scaleFull", "objectScale.full"), Map.entry("offsetScale", "placement.scale"),
        Map.entry("backgroundScale", "background.scale"), Map.entry("reasonIou", "silhouetteMatch.reason"),
        Map.entry("reasonEffort", "warpEffort.reason"), Map.entry("reasonFold", "foldSafety.reason"),
        Map.entry("reasonAppearance", "appearance.reason"), Map.entry("reasonDeltaE", "colour.reason"),
        Map.entry("reasonLightness", "lightness.reason"), Map.entry("reasonContrast", "contrast.reason"),
        Map.entry("reasonAspect", "aspect.reason"), Map.entry("reasonScale", "objectScale.reason"),
        Map.entry("reasonOffset", "placement.reason"), Map.entry("reasonResolution", "resolution.reason"),
        Map.entry("reasonBackground", "background.reason"), Map.entry("overlapWeight", "silhouetteMatch.weight")));
    for (String general : new String[] {"cutOffPenalty", "severalObjectsPenalty", "tinyPenalty", "tinyLongSide",
        "passScore", "warnScore", "reasonTurnGain", "reasonExposure", "passMaxAspectGap"}) {
      earlier.put(general, general);
    }
    assertThat(earlier).hasSize(12 + 24 + 1 + 9); // the 45 record components and overlapWeight
    earlier.forEach((name, now) -> assertThat(ScoreSettings.byName(name)).as(name).get()
        .extracting(ScoreSetting::key).isEqualTo(now));
  }

  @Test
  void overridesReplaceOnlyTheNamedValues() {
    ScoreConfig c = ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.weight", "2.5", "passScore", "70"));
    assertThat(c.weight(PairComponent.SILHOUETTE_MATCH)).isEqualTo(2.5);
    assertThat(c.passScore()).isEqualTo(70);
    for (ScoreSetting s : ScoreSettings.all()) {
      if (!s.key().equals("silhouetteMatch.weight") && !s.key().equals("passScore")) {
        assertThat(c.value(s)).as(s.key()).isEqualTo(s.defaultValue());
      }
    }
  }

  @Test
  void loadsGroupedAndDottedSettingsFromJsonAndProperties() throws IOException {
    Path props = dir.resolve("score.properties");
    Files.writeString(props, "# stricter\nwarnScore = 50\ncolour.reason=15\n");
    ScoreConfig p = ScoreConfig.load(props);
    assertThat(p.warnScore()).isEqualTo(50);
    assertThat(p.reason(PairComponent.COLOUR)).isEqualTo(15);

    Path json = dir.resolve("score.json");
    Files.writeString(json, "{\"silhouetteMatch\": {\"weight\": 3.5, \"reason\": 0.5}, \"colour.weight\": 0, "
        + "\"tinyLongSide\": 200, \"passScore\": 60}");
    ScoreConfig j = ScoreConfig.load(json);
    assertThat(j.weight(PairComponent.SILHOUETTE_MATCH)).isEqualTo(3.5);
    assertThat(j.reason(PairComponent.SILHOUETTE_MATCH)).isEqualTo(0.5);
    assertThat(j.weight(PairComponent.COLOUR)).isZero();
    assertThat(j.tinyLongSide()).isEqualTo(200);
    assertThat(j.passScore()).isEqualTo(60);
    assertThat(j).isEqualTo(ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.weight", "3.5",
        "silhouetteMatch.reason", "0.5", "colour.weight", "0", "tinyLongSide", "200", "passScore", "60")));
  }

  @Test
  void fileErrorsNameTheFileAndTheKey() throws IOException {
    Path json = dir.resolve("bad.json");
    Files.writeString(json, "{\"colour\": {\"weigth\": 1}}");
    assertThatThrownBy(() -> ScoreConfig.load(json)).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("unknown setting colour.weigth in " + json);
    Path deep = dir.resolve("deep.json");
    Files.writeString(deep, "{\"colour\": {\"weight\": {\"value\": 1}}}");
    assertThatThrownBy(() -> ScoreConfig.load(deep)).hasMessageContaining("setting colour.weight in " + deep)
        .hasMessageContaining("must be a number");
    Path invalid = dir.resolve("invalid.properties");
    Files.writeString(invalid, "aspect.scale = -2\n");
    assertThatThrownBy(() -> ScoreConfig.load(invalid))
        .hasMessage("setting aspect.scale in " + invalid + " must be > 0, got -2");
    Path broken = dir.resolve("broken.json");
    Files.writeString(broken, "{colourWeight: ");
    assertThatThrownBy(() -> ScoreConfig.load(broken)).hasMessageContaining("not valid JSON");
    Path txt = dir.resolve("score.txt");
    Files.writeString(txt, "x=1");
    assertThatThrownBy(() -> ScoreConfig.load(txt)).hasMessageContaining(".json or .properties");
  }
}
