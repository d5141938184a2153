package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The full default library (200 products): must take well under a minute on 2 cores. Excluded from the suite. */
@Tag("benchmark")
class DemoLibraryBenchmarkTest {
  @Test
  void defaultLibraryWithinBudget(@TempDir Path dir) throws Exception {
    LibrarySummary s = DemoLibrary.generate(dir, DemoOptions.defaults());
    System.err.printf("demo library: %d pictures in %d ms%n", s.pictures(), s.elapsedMillis());
    assertThat(s.products()).isEqualTo(200);
    assertThat(s.pictures()).isEqualTo(200 + 8 + 6 + 16);
    assertThat(s.elapsedMillis()).as("generation time, ms").isLessThan(60_000);
  }
}
