package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.morphscout.indexer.library.AnalysisSetup;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** The analysis options every analysing command shares. */
class AnalysisOptionsTest {
  @Command(name = "probe")
  static final class Probe {
    @Mixin AnalysisOptions analysis;
  }

  @Test
  void withoutOptionsTheyAreTheSetupTheBrowserUses() {
    Probe probe = new Probe();
    new CommandLine(probe).parseArgs();
    AnalysisSetup cli = probe.analysis.setup();
    AnalysisSetup shared = AnalysisSetup.indexDefaults();
    assertThat(cli.silhouettes()).isEqualTo(shared.silhouettes()).isEqualTo(AnalysisSetup.SilhouetteMode.AUTO);
    assertThat(cli.decode()).isEqualTo(shared.decode());
    assertThat(cli.model()).isEqualTo(shared.model());
    assertThat(cli.models()).isEqualTo(shared.models());
  }
}
