package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

class ScoreConfigTest {
  @TempDir Path dir;

  @Test
  void rejectsBadValuesWithClearMessages() {
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatchWeight", "-1")))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("weights must be >= 0");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("iouZero", "0.99")))
        .hasMessageContaining("iouZero < iouFull");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("passScore", "30")))
        .hasMessageContaining("warnScore <= passScore");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("cutOffPenalty", "1.5")))
        .hasMessageContaining("cutOffPenalty must be in (0, 1]");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("effortScale", "abc")))
        .hasMessageContaining("effortScale").hasMessageContaining("must be a number").hasMessageContaining("'abc'");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("tinyLongSide", "12.5")))
        .hasMessageContaining("whole number");
  }

  @Test
  void allWeightsZeroIsRejected() {
    Map<String, String> zero = new java.util.HashMap<>();
    for (var c : ScoreConfig.class.getRecordComponents()) {
      if (c.getName().endsWith("Weight")) {
        zero.put(c.getName(), "0");
      }
    }
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(zero))
        .hasMessageContaining("at least one score weight must be positive");
  }

  @Test
  void unknownKeysAreRejectedByName() {
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatchWieght", "2")))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("unknown setting silhouetteMatchWieght")
        .hasMessageContaining("silhouetteMatchWeight")
        .hasMessageNotContaining("overlapWeight"); // the earlier name is read, never offered
  }

  @Test
  void theEarlierNameOfTheSilhouetteMatchWeightStillLoads() throws IOException {
    // Settings files written before the sub-score was renamed say overlapWeight; they load with the same meaning.
    Path props = dir.resolve("earlier.properties");
    Files.writeString(props, "overlapWeight = 4.5\npassScore = 70\n");
    ScoreConfig p = ScoreConfig.load(props);
    assertThat(p.silhouetteMatchWeight()).isEqualTo(4.5);
    assertThat(p.passScore()).isEqualTo(70);
    Path json = dir.resolve("earlier.json");
    Files.writeString(json, "{\"overlapWeight\": 0.5}");
    assertThat(ScoreConfig.load(json).silhouetteMatchWeight()).isEqualTo(0.5);
    assertThat(ScoreConfig.DEFAULTS.withOverrides(Map.of("overlapWeight", "2")).silhouetteMatchWeight())
        .isEqualTo(2);
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("overlapWeight", "2",
        "silhouetteMatchWeight", "3")))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("give only silhouetteMatchWeight");
    assertThatThrownBy(() -> ScoreConfig.DEFAULTS.withOverrides(Map.of("overlapWeight", "-1")))
        .hasMessageContaining("weights must be >= 0");
  }

  @Test
  void overridesReplaceOnlyTheNamedValues() {
    ScoreConfig c = ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatchWeight", "2.5", "passScore", "70"));
    assertThat(c.silhouetteMatchWeight()).isEqualTo(2.5);
    assertThat(c.passScore()).isEqualTo(70);
    assertThat(c.colourWeight()).isEqualTo(ScoreConfig.DEFAULTS.colourWeight());
  }

  @Test
  void loadsPropertiesAndJsonFiles() throws IOException {
    Path props = dir.resolve("score.properties");
    Files.writeString(props, "# stricter\nwarnScore = 50\nreasonDeltaE=15\n");
    ScoreConfig p = ScoreConfig.load(props);
    assertThat(p.warnScore()).isEqualTo(50);
    assertThat(p.reasonDeltaE()).isEqualTo(15);

    Path json = dir.resolve("score.json");
    Files.writeString(json, "{\"colourWeight\": 0, \"tinyLongSide\": 200}");
    ScoreConfig j = ScoreConfig.load(json);
    assertThat(j.colourWeight()).isZero();
    assertThat(j.tinyLongSide()).isEqualTo(200);
  }

  @Test
  void fileErrorsNameTheFile() throws IOException {
    Path json = dir.resolve("bad.json");
    Files.writeString(json, "{\"colourWeigth\": 1}");
    assertThatThrownBy(() -> ScoreConfig.load(json)).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("bad.json").hasMessageContaining("colourWeigth");
    Path broken = dir.resolve("broken.json");
    Files.writeString(broken, "{colourWeight: ");
    assertThatThrownBy(() -> ScoreConfig.load(broken)).hasMessageContaining("not valid JSON");
    Path txt = dir.resolve("score.txt");
    Files.writeString(txt, "x=1");
    assertThatThrownBy(() -> ScoreConfig.load(txt)).hasMessageContaining(".json or .properties");
  }
}
