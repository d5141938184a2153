package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;

/** Hostile values on the command line: options out of range, formulas in notes, control characters in text. */
class HostileInputCommandTest {
  private static final long SEED = 1811;

  @TempDir static Path tmp;
  static Cli cli;
  static List<String> images = new ArrayList<>();

  @BeforeAll
  static void indexThreeImages() throws IOException {
    List<FamilyItem> items = TestFamilies.silhouetteFamily(SEED, 3, Archetype.VASE, Archetype.BOTTLE);
    for (int i = 0; i < items.size(); i++) {
      images.add(Cli.abs(Cli.png(tmp.resolve("library/m" + i + ".png"), items.get(i).image())));
    }
    cli = new Cli(tmp.resolve("catalog"));
    cli.run("index", tmp.resolve("library").toString(), "--json", "--threads", "1").succeeds();
  }

  @Test
  void everyOptionOutOfRangeIsAUsageErrorNamingTheOption() {
    String a = images.get(0);
    String b = images.get(1);
    String[][] lines = {
      {"index", "--threads", "0"}, {"index", "--threads", "999"}, {"index", "--neighbours", "-3"},
      {"index", "--time-limit", "0"}, {"index", "--max-megapixels", "-5"}, {"index", "--max-megapixels", "NaN"},
      {"index", "--max-megapixels", "Infinity"}, {"pairs", "--count", "0"}, {"pairs", "--candidates", "0"},
      {"pairs", "--min-score", "NaN"}, {"pairs", "--min-score", "101"}, {"walk", "--shape-weight", "NaN"},
      {"walk", "--shape-weight", "2"}, {"preview", a, b, "--out", tmp.resolve("p.gif").toString(), "--frame-ms", "-5"},
      {"preview", a, b, "--out", tmp.resolve("p.gif").toString(), "--frames-per-step", "1"},
      {"chain", a, b, "--count", "0"}, {"chain", a, b, "--min-steps", "5", "--max-steps", "4"},
      {"chain", a, b, "--shape-weight", "-1"}, {"similar", a, "--count", "0"}, {"demo", "--products", "0"},
      {"bench", "--photos", "0"},
    };
    for (String[] line : lines) {
      Cli.Run run = cli.run(line).failsCleanly(ExitCodes.USAGE);
      String option = java.util.Arrays.stream(line).filter(s -> s.startsWith("-")).reduce((x, y) -> y).orElseThrow();
      assertThat(run.err()).as("%s", String.join(" ", line)).contains(option).doesNotContain("unexpected",
          "IllegalArgument");
    }
  }

  @Test
  void chainEndsAndWaypointsAreNamedNotNumbered() {
    Cli.Run same = cli.run("chain", images.get(0), images.get(0)).failsCleanly(ExitCodes.USAGE);
    assertThat(same.err()).contains("same image").doesNotContainPattern("got \\d+");
    Cli.Run via = cli.run("chain", images.get(0), images.get(2), "--via", images.get(0)).failsCleanly(ExitCodes.USAGE);
    assertThat(via.err()).contains("--via").doesNotContainPattern("\\[\\d+");
  }

  @Test
  void badVerdictsAreUsageErrors() {
    cli.run("decide", images.get(0), images.get(1), "perhaps").failsCleanly(ExitCodes.USAGE);
    assertThat(cli.run("decisions", "--only", "maybe").failsCleanly(ExitCodes.USAGE).err()).contains("--only");
  }

  @Test
  void formulasInNotesAreNeutralisedInCsvAndControlCharactersEscapedInText() {
    String note = "=HYPERLINK(\"http://example.invalid\",\"click\")";
    cli.run("decide", images.get(0), images.get(1), "approve", "--note", note).succeeds();
    Cli.Run csv = cli.run("decisions", "--csv").succeeds();
    assertThat(csv.csv()).anySatisfy(r -> assertThat(r.get("note")).isEqualTo("'" + note));

    String hostile = "\u001b[2J\u0007bell\rhidden";
    cli.run("decide", images.get(1), images.get(2), "reject", "--note", hostile).succeeds();
    Cli.Run text = cli.run("decisions").succeeds();
    assertThat(text.out()).doesNotContain("\u001b", "\u0007", "\r").contains("\\x1B[2J\\x07bell\\rhidden");
    // JSON keeps the note exactly (JSON escapes control characters itself).
    assertThat(cli.run("decisions", "--json").succeeds().json().toString()).contains("\\u001B[2J");
  }

  @Test
  void outputsNeverOverwriteAnInputNorReplaceAFolder() throws IOException {
    Path input = Path.of(images.get(0));
    byte[] before = Files.readAllBytes(input);
    Cli.Run preview = cli.run("preview", images.get(0), images.get(1), "--out", images.get(0));
    preview.failsCleanly(ExitCodes.ERROR);
    assertThat(preview.err()).contains("input");
    assertThat(Files.readAllBytes(input)).isEqualTo(before);

    Path empty = Files.createDirectories(tmp.resolve("empty-folder"));
    cli.run("walk", "--sheet", empty.toString()).failsCleanly(ExitCodes.ERROR);
    assertThat(empty).isDirectory();
    Path full = Files.createDirectories(tmp.resolve("full-folder"));
    Files.writeString(full.resolve("keep.txt"), "mine");
    assertThat(cli.run("chain", images.get(0), images.get(2), "--sheet", full.toString())
        .failsCleanly(ExitCodes.ERROR).err()).contains("is a folder");
    assertThat(full.resolve("keep.txt")).hasContent("mine");

    Path locked = Files.createDirectories(tmp.resolve("locked"));
    Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
    try {
      // Root may write anywhere: then the sheet is simply written.
      Cli.Run run = cli.run("walk", "--sheet", locked.resolve("sheet.png").toString());
      if (Files.isWritable(locked)) {
        run.succeeds();
      } else {
        assertThat(run.failsCleanly(ExitCodes.ERROR).err()).contains("not writable");
      }
    } finally {
      Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
    cli.run("walk", "--sheet", tmp.resolve("new/folder/sheet.png").toString()).succeeds();
    assertThat(tmp.resolve("new/folder/sheet.png")).isRegularFile();
    try (var listing = Files.list(tmp.resolve("new/folder"))) {
      assertThat(listing.toList()).as("no temporary file left").hasSize(1);
    }
  }

  @Test
  void statusCheckReadsEverythingAndAnEmptyCatalogFileIsRefused() throws IOException {
    var check = cli.run("status", "--check", "--json").succeeds().json().get("check");
    assertThat(check.get("database").asText()).isEqualTo("ok");
    assertThat(check.get("vectors").asText()).isEqualTo("ok");

    Path empty = Files.createDirectories(tmp.resolve("empty-catalog"));
    Files.createFile(empty.resolve("catalog.db"));
    Cli other = new Cli(empty);
    for (String[] line : new String[][] {{"status"}, {"decisions"}, {"index", tmp.resolve("library").toString()}}) {
      assertThat(other.run(line).failsCleanly(ExitCodes.ERROR).err()).contains("empty (0 bytes)");
    }
    assertThat(Files.size(empty.resolve("catalog.db"))).isZero();
  }

  @Test
  void screenReadsABomReportsBadRowsByLineAndSaysWhenThereAreNone() throws IOException {
    Path list = tmp.resolve("plans/list.csv");
    Files.createDirectories(list.getParent());
    byte[] good = ("\uFEFF" + images.get(0) + "," + images.get(1) + ",=cmd|' /C calc'!A0\n")
        .getBytes(java.nio.charset.StandardCharsets.UTF_8);
    byte[] bad = (images.get(0) + ",caf\u00e9.png\n").getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
    Files.write(list, good);
    Files.write(list, bad, java.nio.file.StandardOpenOption.APPEND);
    Cli.Run run = cli.run("screen", list.toString(), "--csv").succeeds();
    assertThat(run.csv()).hasSize(2);
    assertThat(run.csv().get(0).get("first")).isEqualTo(images.get(0));
    assertThat(run.csv().get(0).get("extra1")).as("a passed-through formula").isEqualTo("'=cmd|' /C calc'!A0");
    assertThat(run.csv().get(1).get("verdict")).isEqualTo("fail");
    assertThat(run.csv().get(1).get("reasons")).contains("line 2", "UTF-8");

    Path empty = Files.writeString(tmp.resolve("plans/empty.csv"), "");
    assertThat(cli.run("screen", empty.toString()).succeeds().err()).contains("holds no pairs");
    Path binary = Files.write(tmp.resolve("plans/binary.csv"), new byte[] {1, 0, 2, 0});
    assertThat(cli.run("screen", binary.toString()).failsCleanly(ExitCodes.ERROR).err()).contains("binary");
  }

  @Test
  void aPathTheSystemCannotHoldIsOneLineNotAStackTrace() {
    Cli.Run run = cli.run("similar", "bad\u0000name.png").failsCleanly(ExitCodes.ERROR);
    assertThat(run.err()).contains("not a usable path", "bad\\x00name.png").doesNotContain("unexpected");
  }
}
