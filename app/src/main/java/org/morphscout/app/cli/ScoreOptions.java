package org.morphscout.app.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.morphscout.indexer.pairing.ScoreConfig;
import picocli.CommandLine.Option;

/** Options that tune the pair score: a settings file and single overrides. */
final class ScoreOptions {
  @Option(names = "--score-config", paramLabel = "<file>",
      description = "Pair-score weights and thresholds from a JSON or .properties file (see the README).")
  Path file;

  @Option(names = "--set", paramLabel = "<key>=<value>",
      description = "Override one score setting, e.g. --set passScore=70 --set silhouetteMatchWeight=3. Repeatable.")
  Map<String, String> overrides = new LinkedHashMap<>();

  ScoreConfig config() throws IOException {
    ScoreConfig c = file == null ? ScoreConfig.DEFAULTS : ScoreConfig.load(file);
    return overrides.isEmpty() ? c : c.withOverrides(overrides);
  }
}
