package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** {@code index}, {@code status}, {@code models add-salient}, help and error lines, through {@code Main.execute}. */
class IndexStatusCommandTest {
  private static final long SEED = 7101;

  @TempDir static Path tmp;
  static TestLibrary lib;
  static Cli cli;
  static Path broken;
  static Cli.Run first;

  @BeforeAll
  static void indexLibrary() throws IOException {
    lib = new TestLibrary(tmp.resolve("library"), SEED);
    byte[] jpeg = Files.readAllBytes(lib.distractors.get(0));
    broken = Files.createDirectories(tmp.resolve("library/bad")).resolve("cut-short.jpg");
    Files.write(broken, Arrays.copyOf(jpeg, jpeg.length / 3));
    cli = new Cli(tmp.resolve("catalog"));
    first = cli.run("index", tmp.resolve("library").toString(), "--json", "--threads", "2");
  }

  @Test
  void indexReportsCountsAndTheCorruptFileWithExitCodeOne() {
    // Keys and exit code 1: {"analysed","unchanged","failed","failures":[{path,reason}]} ("analysed" was "indexed").
    assertThat(first.code()).as("exit code with a corrupt file; stderr: %s", first.err())
        .isEqualTo(ExitCodes.FINISHED_WITH_FAILURES).isEqualTo(1);
    JsonNode doc = first.json();
    assertThat(doc.get("analysed").asInt()).isEqualTo(lib.all().size());
    assertThat(doc.get("unchanged").asInt()).isZero();
    assertThat(doc.get("failed").asInt()).isEqualTo(1);
    assertThat(doc.get("failures")).hasSize(1);
    JsonNode failure = doc.get("failures").get(0);
    assertThat(failure.get("path").asText()).isEqualTo(Cli.abs(broken));
    assertThat(Path.of(failure.get("path").asText()).isAbsolute()).isTrue();
    assertThat(failure.get("reason").asText()).isNotBlank();
  }

  @Test
  void rerunReportsEverythingUnchanged() {
    Cli.Run again = cli.run("index", tmp.resolve("library").toString(), "--json", "--threads", "2");
    JsonNode doc = again.json();
    assertThat(doc.get("analysed").asInt()).as("stderr: %s", again.err()).isZero();
    // Every file seen before, the unreadable one included, is unchanged (the issue: "a rerun reports unchanged").
    assertThat(doc.get("unchanged").asInt()).isEqualTo(lib.all().size() + 1);
  }

  @Test
  void rerunStillReportsTheCorruptFile() {
    Cli.Run again = cli.run("index", tmp.resolve("library").toString(), "--json", "--threads", "2");
    // Index issue: exit code 1 ("finished with failures") when a corrupt file is present.
    assertThat(again.code()).as("stdout %s", again.out()).isEqualTo(ExitCodes.FINISHED_WITH_FAILURES);
    assertThat(again.json().get("failed").asInt()).isEqualTo(1);
    assertThat(again.json().get("failures").get(0).get("path").asText()).isEqualTo(Cli.abs(broken));
  }

  @Test
  void cleanFolderExitsZero(@TempDir Path other) throws IOException {
    Path folder = other.resolve("clean");
    Files.createDirectories(folder);
    Files.copy(lib.family.get(0), folder.resolve("a.png"));
    Files.copy(lib.family.get(3), folder.resolve("b.png"));
    Cli.Run run = new Cli(other.resolve("catalog")).run("index", folder.toString(), "--json", "--threads", "1");
    assertThat(run.code()).as("stderr: %s", run.err()).isEqualTo(ExitCodes.OK);
    assertThat(run.json().get("analysed").asInt()).isEqualTo(2);
    assertThat(run.json().get("failed").asInt()).isZero();
    assertThat(run.json().get("failures")).isEmpty();
  }

  @Test
  void aLoneImageHasNoSimilarImagesAndTheAnswerSaysWhy(@TempDir Path other) throws IOException {
    Path folder = other.resolve("lone");
    Files.createDirectories(folder);
    Files.copy(lib.family.get(0), folder.resolve("a.png"));
    Cli one = new Cli(other.resolve("catalog"));
    one.run("index", folder.toString(), "--json", "--threads", "1").succeeds();
    Cli.Run similar = one.run("similar", folder.resolve("a.png").toString(), "--json").succeeds();
    assertThat(similar.json().get("results")).isEmpty();
    assertThat(similar.json().get("notes")).singleElement().asString().contains("1 ready image");
    assertThat(similar.err()).contains("no similar images");
    // The status shows the stored pairs of a one-image catalog: none, and complete.
    JsonNode stored = one.run("status", "--json").succeeds().json().get("storedPairs");
    assertThat(stored.get("pairs").asLong()).isZero();
    assertThat(stored.get("complete").asBoolean()).isTrue();
  }

  @Test
  void unknownOptionIsAUsageError() {
    Cli.Run run = cli.run("index", "--no-such-option", tmp.resolve("library").toString());
    assertThat(run.code()).isEqualTo(ExitCodes.USAGE).isEqualTo(2);
    assertThat(run.err()).contains("--no-such-option").doesNotContain("\tat ");
  }

  @Test
  void missingFolderExitsThreeNamingIt(@TempDir Path other) {
    Path nowhere = other.resolve("no-such-folder");
    Cli.Run run = new Cli(other.resolve("catalog")).run("index", nowhere.toString(), "--json");
    run.failsCleanly(ExitCodes.ERROR);
    assertThat(run.code()).isEqualTo(3);
    assertThat(run.err()).contains(nowhere.toString());
  }

  @Test
  void statusCountsImagesFailuresAndFolders() {
    JsonNode doc = cli.run("status", "--json").succeeds().json();
    assertThat(doc.get("images").asInt()).isEqualTo(lib.all().size() + 1);
    assertThat(doc.get("failed").asInt()).isEqualTo(1);
    assertThat(Cli.texts(doc.get("folders"))).containsExactly(Cli.abs(tmp.resolve("library")));
    // One key for the appearance model, the one index and import write.
    assertThat(doc.get("model").asText()).isEqualTo(first.json().get("model").asText());
    // Every ready image's silhouette is counted once, by what made it; the uncertain ones are counted from the
    // stored confidences, read here independently of the command.
    JsonNode silhouettes = doc.get("silhouettes");
    int counted = 0;
    for (JsonNode n : silhouettes.get("bySource")) {
      counted += n.asInt();
    }
    assertThat(counted).isEqualTo(doc.get("ready").asInt());
    // In the glossary's words: the border model's silhouettes are counted as classical.
    List<String> sources = new java.util.ArrayList<>();
    silhouettes.get("bySource").fieldNames().forEachRemaining(sources::add);
    assertThat(sources).isSubsetOf("alpha", "classical", "learned").contains("classical");
    int uncertain = 0;
    try (var c = java.sql.DriverManager.getConnection("jdbc:sqlite:" + tmp.resolve("catalog/catalog.db"));
        var rs = c.createStatement().executeQuery("SELECT coverage, confidence FROM features")) {
      while (rs.next()) {
        uncertain += rs.getDouble(1) > 0 && rs.getDouble(2) < 0.45 ? 1 : 0;
      }
    } catch (java.sql.SQLException e) {
      throw new AssertionError(e);
    }
    assertThat(silhouettes.get("uncertain").asInt()).isEqualTo(uncertain);
    assertThat(cli.run("status").succeeds().out()).containsPattern("silhouettes .*; " + uncertain + " uncertain");
  }

  @Test
  void statusShowsHowTheVectorIndexIsSplit() {
    JsonNode doc = cli.run("status", "--json").succeeds().json();
    JsonNode vectors = doc.get("vectorIndex");
    // Every ready image has its vectors in the index; a library this small is written as one segment.
    assertThat(vectors.get("images").asInt()).isEqualTo(doc.get("ready").asInt()).isPositive();
    assertThat(vectors.get("segments").asInt()).isEqualTo(1);
    assertThat(vectors.get("outsideLargest").asInt()).isZero();
    assertThat(cli.run("status").succeeds().out())
        .contains("vectors     " + doc.get("ready").asInt() + " images in 1 segment" + System.lineSeparator());
  }

  @Test
  void statusStillAnswersWhenTheVectorIndexIsUnreadable(@TempDir Path other) throws IOException {
    Path catalog = other.resolve("catalog");
    Cli own = new Cli(catalog);
    own.run("index", lib.all().get(0).getParent().toString(), "--json", "--threads", "2");
    try (var commits = Files.list(catalog.resolve("vectors"))) {
      for (Path p : commits.filter(p -> p.getFileName().toString().startsWith("segments_")).toList()) {
        Files.write(p, new byte[] {1, 2, 3}); // a damaged commit point
      }
    }
    JsonNode doc = own.run("status", "--json").succeeds().json();
    assertThat(doc.get("ready").asInt()).isPositive();
    assertThat(doc.get("vectorIndex").get("unreadable").asText()).isNotBlank();
    assertThat(own.run("status").succeeds().out()).contains("vectors     unreadable: ")
        .contains("the next index run rebuilds the vector index from the catalog");
    // As promised: the next run rebuilds it.
    own.run("index", "--json", "--threads", "2");
    JsonNode after = own.run("status", "--json").succeeds().json();
    assertThat(after.get("vectorIndex").get("images").asInt()).isEqualTo(after.get("ready").asInt());
  }

  @Test
  void statusWithoutCatalogIsAClearError(@TempDir Path other) {
    Cli.Run run = new Cli(other.resolve("empty")).run("status", "--json");
    run.failsCleanly(ExitCodes.ERROR);
    assertThat(run.err()).contains(Cli.abs(other.resolve("empty")));
  }

  @Test
  void salientModelWithWrongBytesIsRefused(@TempDir Path other) throws IOException {
    Path fake = Files.writeString(other.resolve("u2netp.onnx"), "these are not the model's bytes");
    Cli.Run run = new Cli(other.resolve("catalog")).run("models", "add-salient", "--from", fake.toString(),
        "--models", other.resolve("models").toString());
    run.failsCleanly(ExitCodes.ERROR);
    assertThat(run.err()).contains("checksum mismatch");
    assertThat(Files.exists(other.resolve("models/u2netp.onnx"))).isFalse();
  }

  @ParameterizedTest
  @ValueSource(strings = {"index", "import", "status", "similar", "pairs", "screen", "decide", "decisions", "chain", "walk",
      "preview", "models", "demo"})
  void everyHelpHasAOneLineHeaderAndTheExitCodes(String command) {
    Cli.Run run = Cli.runRaw(command, "--help");
    assertThat(run.code()).isZero();
    List<String> lines = run.out().lines().toList();
    // One header entry (picocli wraps it at the 80-column width when it is longer), printed before "Usage:".
    String[] header = MorphscoutCommand.commandLine(new java.io.PrintWriter(java.io.Writer.nullWriter()),
        new java.io.PrintWriter(java.io.Writer.nullWriter())).getSubcommands().get(command).getCommandSpec()
        .usageMessage().header();
    assertThat(header).as("header of %s", command).hasSize(1);
    assertThat(header[0]).doesNotContain("\n").endsWith(".");
    int usage = lines.indexOf(lines.stream().filter(l -> l.startsWith("Usage:")).findFirst().orElseThrow());
    assertThat(usage).as("header lines before Usage:").isBetween(1, 2);
    assertThat(String.join(" ", lines.subList(0, usage))).isEqualTo(header[0]);
    assertThat(run.out()).contains("Exit codes:");
    for (String code : List.of("0", "1", "2", "3", "130")) {
      assertThat(lines).as("exit code %s listed by %s --help", code, command)
          .anyMatch(l -> l.strip().startsWith(code + " ") || l.strip().startsWith(code + "\t"));
    }
  }

  @Test
  void aMissingImageIsOneLineNamingTheFile() {
    Path nowhere = tmp.resolve("library/family/no-such.png");
    Cli.Run run = cli.run("similar", nowhere.toString(), "--json");
    run.failsCleanly(ExitCodes.ERROR);
    assertThat(run.err()).contains(nowhere.toString());
    assertThat(run.out()).isEmpty();
  }
}
