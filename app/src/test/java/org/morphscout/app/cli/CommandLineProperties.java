package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Hostile command lines: every option that takes a number or a word, given generated values (out of range, NaN,
 * infinities, huge, empty, control characters). Every run must end in a clean one-line message with exit 2 (usage) or
 * 3 (no catalog here), never a stack trace or "unexpected error". The catalog folder does not exist, so nothing is
 * written. Seed fixed; jqwik prints it on failure.
 */
class CommandLineProperties {
  private static final Path NOWHERE = Path.of(System.getProperty("java.io.tmpdir"), "morphscout-no-such-catalog-18");

  @Provide
  Arbitrary<String> values() {
    return Arbitraries.oneOf(
        Arbitraries.of("0", "-1", "-3", "NaN", "Infinity", "-Infinity", "1e309", "99999999999999999999", "", " ",
            "0x10", "1,5", "\u001b[31m", "approve", "maybe", "2147483648", "-0", "0.0000001"),
        Arbitraries.integers().map(String::valueOf),
        Arbitraries.doubles().map(String::valueOf),
        Arbitraries.strings().ofMaxLength(12));
  }

  @Provide
  Arbitrary<List<String>> optionLines() {
    Arbitrary<List<String>> lines = Arbitraries.of(
        List.of("index", "--threads"), List.of("index", "--neighbours"), List.of("index", "--time-limit"),
        List.of("index", "--max-megapixels"), List.of("pairs", "--count"), List.of("pairs", "--candidates"),
        List.of("pairs", "--min-score"), List.of("walk", "--shape-weight"), List.of("chain", "a.png", "b.png",
            "--count"), List.of("chain", "a.png", "b.png", "--max-steps"), List.of("similar", "a.png", "--count"),
        List.of("preview", "a.png", "b.png", "--out", "x.gif", "--frame-ms"), List.of("decisions", "--only"),
        List.of("similar", "a.png", "--by"), List.of("index", "--silhouettes"));
    return lines;
  }

  @Property(tries = 250, seed = "1804")
  void everyOptionValueEndsInACleanMessage(@ForAll("optionLines") List<String> line,
      @ForAll("values") String value) {
    List<String> args = new ArrayList<>(List.of("--catalog", NOWHERE.toString()));
    args.addAll(line);
    args.add(value);
    Cli.Run run = Cli.runRaw(args.toArray(String[]::new));
    String context = String.join(" ", args);
    assertThat(run.code()).as("%s%n%s", context, run.err()).isIn(ExitCodes.USAGE, ExitCodes.ERROR);
    assertThat(run.err().strip().lines().count()).as("one line for %s:%n%s", context, run.err()).isEqualTo(1);
    assertThat(run.err()).as(context).doesNotContain("\tat ", "unexpected error", "Exception", "\u001b");
    assertThat(NOWHERE).as("nothing written").doesNotExist();
  }
}
