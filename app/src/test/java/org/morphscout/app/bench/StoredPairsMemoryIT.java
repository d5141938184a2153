package org.morphscout.app.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A whole-library pair query does not hold the stored pairs in memory: 20,000 images with about 490,000 stored pairs
 * (some 150 MiB of measures and facts if they were all loaded as objects) are ranked in a 48 MiB heap, in a child JVM.
 */
class StoredPairsMemoryIT {
  @TempDir Path tmp;

  @Test
  void theBestPairsOfALargeStoreAreFoundInASmallHeap() throws IOException, InterruptedException {
    String java = ProcessHandle.current().info().command().orElse(
        Path.of(System.getProperty("java.home"), "bin", "java").toString());
    Path out = tmp.resolve("child.out");
    Path err = tmp.resolve("child.err");
    Process child = new ProcessBuilder(List.of(java, "-Xmx48m", "-Djava.awt.headless=true",
        "-Dorg.slf4j.simpleLogger.defaultLogLevel=warn", "-cp", System.getProperty("java.class.path"),
        StoredPairsChild.class.getName(), tmp.resolve("catalog").toString(), "20000"))
        .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
    assertThat(child.waitFor(5, TimeUnit.MINUTES)).as("child finished").isTrue();
    assertThat(child.exitValue()).as("exit code; stderr: %s", Files.readString(err)).isZero();
    String line = Files.readString(out).strip();
    assertThat(line).startsWith("pairs ");
    assertThat(Long.parseLong(line.substring(6))).isGreaterThan(400_000);
  }
}
