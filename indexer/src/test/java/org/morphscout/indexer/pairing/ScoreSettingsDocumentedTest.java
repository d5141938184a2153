package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The README documents exactly the settings and sub-scores the code defines: its settings table is the one
 * {@link #settingsTable()} writes from the {@link ScoreSetting}s (keys, defaults, accepted values and meanings, in
 * order), and its sub-score table has one row per {@link PairComponent} with its key, measure and column title. When
 * a setting changes, paste the table this test prints into the README.
 */
class ScoreSettingsDocumentedTest {
  private static final Path README = Path.of("..", "README.md");
  private static final String SETTINGS_HEADER = "| setting | default | accepted | what it does |";
  private static final String COMPONENTS_HEADER = "| sub-score | measure | browser column | what it measures |";

  @Test
  void theReadmeSettingsTableIsTheOneTheCodeDefines() throws IOException {
    List<String> table = table(SETTINGS_HEADER);
    assertThat(String.join("\n", table)).as("the README's settings table; expected:%n%s", String.join("\n",
        settingsTable())).isEqualTo(String.join("\n", settingsTable()));
  }

  @Test
  void theReadmeHasOneRowPerSubScoreWithItsMeasureAndColumn() throws IOException {
    List<String> rows = table(COMPONENTS_HEADER);
    assertThat(rows).hasSize(PairComponent.values().length + 2);
    for (PairComponent c : PairComponent.values()) {
      String row = rows.get(c.ordinal() + 2);
      assertThat(row).as("README row of %s", c).startsWith("| `" + c.key() + "` | `" + c.measure().key() + "` | "
          + c.title() + " | ");
    }
  }

  @Test
  void everySettingHasAKeyOfItsOwnAndAUsableDefault() {
    List<ScoreSetting> all = ScoreSettings.all();
    assertThat(all).isNotEmpty();
    assertThat(all).extracting(ScoreSetting::key).doesNotHaveDuplicates();
    for (ScoreSetting s : all) {
      assertThat(ScoreConfig.DEFAULTS.value(s)).as(s.key()).isEqualTo(s.defaultValue());
      assertThat(s.meaning()).as(s.key()).isNotBlank();
      assertThat(ScoreSettings.byName(s.key())).as(s.key()).contains(s);
    }
  }

  /** The README's settings table, as the code defines it. */
  static List<String> settingsTable() {
    List<String> out = new ArrayList<>(List.of(SETTINGS_HEADER, "|---|---|---|---|"));
    for (ScoreSetting s : ScoreSettings.all()) {
      out.add("| `" + s.key() + "` | " + s.defaultText() + " | " + cell(s.allowedText()) + " | "
          + cell(s.meaning()) + " |");
    }
    return out;
  }

  private static String cell(String text) {
    return text.replace("|", "\\|");
  }

  /** The lines of the README table that starts with this header line, up to its first non-table line. */
  private static List<String> table(String header) throws IOException {
    List<String> lines = Files.readAllLines(README, StandardCharsets.UTF_8);
    int start = lines.indexOf(header);
    assertThat(start).as("a table headed '%s' in %s", header, README.toAbsolutePath()).isNotNegative();
    List<String> out = new ArrayList<>();
    for (int i = start; i < lines.size() && lines.get(i).startsWith("|"); i++) {
      out.add(lines.get(i));
    }
    return out;
  }
}
