package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher script at the repository root (run after {@code package}, so its jar is there): the JVM's notice about
 * the incubator vector module no longer greets every command, while every other line of stderr still arrives and the
 * exit status is the application's.
 */
class LauncherIT {
  private static final Path LAUNCHER = Path.of("").toAbsolutePath().getParent().resolve("morphscout");

  @TempDir Path tmp;

  private record Run(int code, String out, String err) {}

  private Run run(String... args) throws IOException, InterruptedException {
    List<String> command = new ArrayList<>(List.of("bash", LAUNCHER.toString()));
    command.addAll(List.of(args));
    ProcessBuilder pb = new ProcessBuilder(command).redirectOutput(tmp.resolve("out").toFile())
        .redirectError(tmp.resolve("err").toFile());
    pb.environment().put("JAVA_HOME", System.getProperty("java.home"));
    Process p = pb.start();
    assertThat(p.waitFor(5, TimeUnit.MINUTES)).as("the launcher ended").isTrue();
    return new Run(p.exitValue(), Files.readString(tmp.resolve("out"), StandardCharsets.UTF_8),
        Files.readString(tmp.resolve("err"), StandardCharsets.UTF_8));
  }

  @Test
  void theIncubatorNoticeIsGoneAndOtherErrorsStay() throws Exception {
    assertThat(LAUNCHER).isRegularFile();
    Run version = run("--version");
    assertThat(version.code()).as("stderr: %s", version.err()).isZero();
    assertThat(version.out()).contains("morphscout");
    assertThat(version.err()).doesNotContain("incubator");

    Run usage = run("decide");
    assertThat(usage.code()).isEqualTo(ExitCodes.USAGE);
    assertThat(usage.err()).doesNotContain("incubator").contains("Missing required parameters");

    Run missing = run("--catalog", tmp.resolve("none").toString(), "status");
    assertThat(missing.code()).isNotZero();
    assertThat(missing.err()).doesNotContain("incubator").contains("no catalog in");
  }
}
