package org.morphscout.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.ScoreSetting;
import org.morphscout.indexer.pairing.ScoreSettings;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** Options that tune the pair score: a settings file and single overrides. */
final class ScoreOptions {
  @Option(names = "--score-config", paramLabel = "<file>",
      description = "Pair-score settings from a JSON or .properties file; every key with its default is listed by "
          + "'morphscout pairs --help'.")
  Path file;

  @Option(names = "--set", paramLabel = "<key>=<value>",
      description = "Set one pair-score setting, e.g. --set passScore=70 --set silhouetteMatch.weight=3. "
          + "Repeatable.")
  Map<String, String> overrides = new LinkedHashMap<>();

  ScoreConfig config() throws IOException {
    ScoreConfig c = file == null ? ScoreConfig.DEFAULTS : ScoreConfig.load(file);
    return overrides.isEmpty() ? c : c.withOverrides(overrides);
  }

  /** Lists every score setting with its default, accepted values and meaning below a command's help. */
  static void listSettings(CommandLine command) {
    List<String> lines = new ArrayList<>();
    lines.add("");
    lines.add("Score settings (--set <key>=<value>, or a --score-config file; in JSON a sub-score's settings may be "
        + "grouped, {\"silhouetteMatch\": {\"weight\": 3}}):");
    for (ScoreSetting s : ScoreSettings.all()) {
      lines.add("  " + s.key() + " = " + s.defaultText() + "   (" + s.allowedText() + ")");
      lines.addAll(Text.wrap(s.meaning(), 70, "      "));
    }
    lines.replaceAll(l -> l.replace("%", "%%")); // footer lines are format strings
    command.getCommandSpec().usageMessage().footer(lines.toArray(String[]::new));
  }
}
