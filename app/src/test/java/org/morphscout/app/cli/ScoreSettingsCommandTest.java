package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.pairing.PairComponent;
import org.morphscout.indexer.pairing.ScoreSetting;
import org.morphscout.indexer.pairing.ScoreSettings;

/**
 * The pair-score settings on the command line: listed by {@code pairs --help} from their one definition, given by
 * {@code --set} or a settings file (grouped, dotted or in the earlier flat names), refused with the key and the
 * source named; and the sub-scores and measures of {@code pairs --json} and {@code --csv} keyed by their components.
 */
class ScoreSettingsCommandTest {
  private static final long SEED = 1604;

  @TempDir static Path tmp;
  static Cli cli;

  @BeforeAll
  static void indexFourImages() throws IOException {
    List<FamilyItem> items = TestFamilies.silhouetteFamily(SEED, 4, Archetype.VASE, Archetype.BOTTLE);
    for (int i = 0; i < items.size(); i++) {
      Cli.png(tmp.resolve("library/m" + i + ".png"), items.get(i).image());
    }
    cli = new Cli(tmp.resolve("catalog"));
    cli.run("index", tmp.resolve("library").toString(), "--json", "--threads", "1").succeeds();
  }

  @Test
  void pairsHelpListsEverySettingWithItsDefault() {
    String help = Cli.runRaw("pairs", "--help").succeeds().out();
    assertThat(ScoreSettings.all()).isNotEmpty();
    for (ScoreSetting s : ScoreSettings.all()) {
      assertThat(help).as("pairs --help").contains("  " + s.key() + " = " + s.defaultText() + "   (");
    }
    assertThat(help).doesNotContain("overlapWeight", "silhouetteMatchWeight", "iouZero");
  }

  @Test
  void subScoresAndMeasuresAreKeyedByTheirComponents() {
    JsonNode pairs = cli.run("pairs", "--json", "--count", "3").succeeds().json().get("pairs");
    assertThat(pairs).as("seed %d", SEED).isNotEmpty();
    for (JsonNode p : pairs) {
      List<String> components = new ArrayList<>();
      p.get("components").fieldNames().forEachRemaining(components::add);
      List<String> expected = new ArrayList<>();
      for (PairComponent c : PairComponent.values()) {
        expected.add(c.key());
        assertThat(p.get("measures").has(c.measure().key())).as("measure %s (seed %d)", c.measure().key(), SEED)
            .isTrue();
      }
      assertThat(components).as("seed %d", SEED).isEqualTo(expected);
    }
  }

  @Test
  void pairsCsvHasOneColumnPerSubScoreWithTheJsonValues() {
    List<CSVRecord> rows = cli.run("pairs", "--csv", "--count", "3").succeeds().csv();
    JsonNode pairs = cli.run("pairs", "--json", "--count", "3").succeeds().json().get("pairs");
    assertThat(rows).as("seed %d", SEED).isNotEmpty().hasSize(pairs.size());
    List<String> columns = new ArrayList<>();
    for (PairComponent c : PairComponent.values()) {
      columns.add(c.csvColumn());
    }
    assertThat(rows.get(0).getParser().getHeaderNames()).endsWith(columns.toArray(String[]::new));
    for (int i = 0; i < rows.size(); i++) {
      for (PairComponent c : PairComponent.values()) {
        assertThat(Double.parseDouble(rows.get(i).get(c.csvColumn()))).as("pair %d, %s (seed %d)", i, c, SEED)
            .isEqualTo(pairs.get(i).get("components").get(c.key()).asDouble());
      }
    }
  }

  @Test
  void anEarlierSettingsFileScoresLikeTheSameSettingsGivenByTheirKeys() throws IOException {
    Path earlier = Files.writeString(tmp.resolve("earlier.properties"),
        "overlapWeight = 1\niouZero = 0.5\nreasonIou = 0.9\npassScore = 50\n");
    Path grouped = Files.writeString(tmp.resolve("grouped.json"),
        "{\"silhouetteMatch\": {\"weight\": 1, \"zero\": 0.5, \"reason\": 0.9}, \"passScore\": 50}");
    JsonNode byFile = cli.run("pairs", "--json", "--score-config", earlier.toString()).succeeds().json();
    JsonNode byGroups = cli.run("pairs", "--json", "--score-config", grouped.toString()).succeeds().json();
    JsonNode byKeys = cli.run("pairs", "--json", "--set", "silhouetteMatch.weight=1", "--set",
        "silhouetteMatch.zero=0.5", "--set", "silhouetteMatch.reason=0.9", "--set", "passScore=50").succeeds().json();
    JsonNode byDefaults = cli.run("pairs", "--json").succeeds().json();
    assertThat(byFile.get("pairs")).as("seed %d", SEED).isNotEmpty();
    assertThat(byFile.get("pairs")).isEqualTo(byKeys.get("pairs")).isEqualTo(byGroups.get("pairs"));
    assertThat(byFile.get("pairs")).as("the settings change the scores").isNotEqualTo(byDefaults.get("pairs"));
  }

  @Test
  void unknownKeysAndBadValuesNameTheKeyAndWhereTheyWereGiven() throws IOException {
    String err = cli.run("pairs", "--set", "silhouetteMatch.wieght=2").failsCleanly(ExitCodes.ERROR).err();
    assertThat(err).contains("unknown setting silhouetteMatch.wieght in command-line options")
        .contains("silhouetteMatch.weight");
    Path bad = Files.writeString(tmp.resolve("bad.json"), "{\"colour\": {\"scale\": -4}}");
    assertThat(cli.run("pairs", "--score-config", bad.toString()).failsCleanly(ExitCodes.ERROR).err())
        .contains("setting colour.scale in " + bad).contains("must be > 0, got -4");
  }
}
