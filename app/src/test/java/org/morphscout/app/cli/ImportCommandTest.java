package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The desktop build carries no Parquet reader (the cluster job's module brings it; its own tests import real job
 * output): without it, import says in one line how to build it, and touches no catalog.
 */
class ImportCommandTest {
  @TempDir Path tmp;

  @Test
  void withoutTheJobsModuleSaysHowToBuildItAndCreatesNoCatalog() throws Exception {
    assertThat(ImportCommand.reader()).as("no reader on the desktop class path").isEmpty();
    Path catalog = tmp.resolve("catalog");
    Path folder = Files.createDirectories(tmp.resolve("job-output"));
    Cli.Run run = new Cli(catalog).run("import", folder.toString()).failsCleanly(ExitCodes.ERROR);
    assertThat(run.err()).contains("mvn -B -q -pl indexer/spark -am package -DskipTests");
    assertThat(catalog).doesNotExist();
  }

  @Test
  void aBadThreadCountIsAUsageError() {
    Cli.Run run = new Cli(tmp.resolve("catalog")).run("import", tmp.toString(), "--threads", "0");
    run.failsCleanly(ExitCodes.USAGE);
    assertThat(run.err()).contains("--threads");
  }
}
