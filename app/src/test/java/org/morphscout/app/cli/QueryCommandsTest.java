package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;

/** {@code similar}, {@code pairs}, {@code screen}, {@code decide}, {@code decisions} on one small indexed catalog. */
class QueryCommandsTest {
  private static final long SEED = 7202;

  @TempDir static Path tmp;
  static TestLibrary lib;
  static Cli cli;

  @BeforeAll
  static void indexLibrary() throws IOException {
    lib = new TestLibrary(tmp.resolve("library"), SEED);
    cli = new Cli(tmp.resolve("catalog"));
    cli.run("index", lib.root.toString(), "--json", "--threads", "2").succeeds();
  }

  private static void assertNearestFirst(JsonNode results) {
    double last = -1;
    for (JsonNode r : results) {
      assertThat(r.get("distance").asDouble()).isGreaterThanOrEqualTo(last);
      last = r.get("distance").asDouble();
    }
  }

  @Test
  void similarListsNearestFirstWithoutTheQuery() {
    for (String by : List.of("appearance", "shape", "both")) {
      String query = Cli.abs(lib.original);
      JsonNode doc = cli.run("similar", query, "--count", "5", "--by", by, "--json").succeeds().json();
      assertThat(doc.get("query").asText()).isEqualTo(query);
      JsonNode results = doc.get("results");
      assertThat(results).as("by %s", by).hasSize(5);
      assertNearestFirst(results);
      List<String> paths = new ArrayList<>();
      results.forEach(r -> paths.add(r.get("path").asText()));
      assertThat(paths).as("by %s", by).doesNotContain(query).doesNotHaveDuplicates();
      if (!by.equals("shape")) {
        // A resized or recompressed copy looks like its original (the point of near-duplicate sets): the nearest
        // image by appearance is one of the five copies.
        assertThat(lib.duplicateGroup()).as("nearest to the original by %s: %s", by, paths).contains(paths.get(0));
      }
    }
  }

  @Test
  void similarAnalysesAnOutsideFileOnTheFly() {
    // A family member at t = 0.5, rendered like the catalog's family (same seed, glaze, light) but not indexed: its
    // outline lies between catalog members 3 (t = 3/7) and 4 (t = 4/7).
    List<FamilyItem> fine = TestFamilies.silhouetteFamily(SEED, 15, Archetype.VASE, Archetype.BOTTLE);
    Path outside = Cli.png(tmp.resolve("outside/half-way.png"), fine.get(7).image());
    JsonNode doc = cli.run("similar", outside.toString(), "--count", "3", "--by", "shape", "--json").succeeds().json();
    assertThat(doc.get("query").asText()).isEqualTo(Cli.abs(outside));
    JsonNode results = doc.get("results");
    assertThat(results).hasSize(3);
    assertNearestFirst(results);
    assertThat(results.get(0).get("path").asText()).as("seed %d: %s", SEED, results)
        .isIn(Cli.abs(lib.family.get(3)), Cli.abs(lib.family.get(4)));

    // The same bytes as a catalog image under another name: that catalog image is left out as the query itself.
    Path copy = tmp.resolve("outside/copy-of-member-2.png");
    try {
      Files.copy(lib.family.get(2), copy);
    } catch (IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
    JsonNode same = cli.run("similar", copy.toString(), "--count", "4", "--json").succeeds().json();
    List<String> paths = new ArrayList<>();
    same.get("results").forEach(r -> paths.add(r.get("path").asText()));
    assertThat(paths).hasSize(4).doesNotContain(Cli.abs(lib.family.get(2)), Cli.abs(copy));
  }

  @Test
  void pairsJsonHasScoresComponentsAndReasonsBestFirst() {
    JsonNode pairs = cli.run("pairs", "--candidates", "8", "--json", "--count", "30").succeeds().json().get("pairs");
    assertThat(pairs).isNotEmpty().hasSizeLessThanOrEqualTo(30);
    double last = Double.MAX_VALUE;
    for (JsonNode p : pairs) {
      assertThat(p.get("first").asText()).isNotEqualTo(p.get("second").asText());
      assertThat(Path.of(p.get("first").asText()).isAbsolute()).isTrue();
      double score = p.get("score").asDouble();
      assertThat(score).isBetween(0.0, 100.0).isLessThanOrEqualTo(last);
      last = score;
      assertThat(p.get("components").isObject()).isTrue();
      assertThat(p.get("components").size()).isPositive();
      p.get("components").forEach(c -> assertThat(c.asDouble()).isBetween(0.0, 1.0));
      assertThat(p.get("reasons").isArray()).isTrue();
    }
  }

  @Test
  void earlierOptionNamesStillWorkAsHiddenAliases() {
    // --count replaced -k (similar), --top (pairs) and --alternatives (chain); scripts using the old names keep working.
    String query = Cli.abs(lib.original);
    assertThat(cli.run("similar", query, "-k", "2", "--json").succeeds().json().get("results")).hasSize(2);
    assertThat(cli.run("pairs", "--top", "2", "--json").succeeds().json().get("pairs")).hasSize(2);
    assertThat(cli.run("similar", "--help").succeeds().out()).contains("--count").doesNotContain("-k,", " -k ");
  }

  @Test
  void pairsTopMinScoreForAndCsv() throws IOException {
    JsonNode all = cli.run("pairs", "--candidates", "4", "--json", "--count", "200").succeeds().json().get("pairs");
    double median = all.get(all.size() / 2).get("score").asDouble();
    JsonNode high = cli.run("pairs", "--candidates", "4", "--json", "--count", "200", "--min-score", "" + median)
        .succeeds().json().get("pairs");
    assertThat(high).isNotEmpty().hasSizeLessThan(all.size());
    high.forEach(p -> assertThat(p.get("score").asDouble()).isGreaterThanOrEqualTo(median));
    // Another candidate count than the stored one is scored live, and the answer says so; nothing else to explain.
    assertThat(cli.run("pairs", "--candidates", "4", "--json", "--count", "200").succeeds().json().get("notes"))
        .singleElement().satisfies(n -> assertThat(n.asText()).startsWith("scored live: ").contains("not 4"));
    assertThat(cli.run("pairs", "--json", "--count", "200").succeeds().json().get("notes"))
        .as("answered from the stored pairs: nothing to explain").isEmpty();
    Cli.Run none = cli.run("pairs", "--json", "--min-score", "100").succeeds();
    if (none.json().get("pairs").isEmpty()) { // no silent nothing: an empty answer says why, in JSON and on stderr
      assertThat(none.json().get("notes").get(0).asText()).contains("no pairs found", "scoring at least 100");
      assertThat(none.err()).contains("no pairs found", "try a lower --min-score");
    }

    String member = Cli.abs(lib.family.get(2));
    JsonNode partners = cli.run("pairs", "--candidates", "4", "--for", member, "--json", "--count", "5").succeeds()
        .json().get("pairs");
    assertThat(partners).isNotEmpty().hasSizeLessThanOrEqualTo(5);
    partners.forEach(p -> assertThat(List.of(p.get("first").asText(), p.get("second").asText())).contains(member));

    Cli.Run csv = cli.run("pairs", "--candidates", "4", "--csv", "--count", "3").succeeds();
    assertThat(csv.csvHeader()).startsWith("first", "second", "score", "verdict", "reasons");
    List<CSVRecord> rows = csv.csv();
    assertThat(rows).as("--top 3").hasSize(3);
    for (CSVRecord r : rows) {
      assertThat(Files.isRegularFile(Path.of(r.get("first")))).isTrue();
      assertThat(Double.parseDouble(r.get("score"))).isBetween(0.0, 100.0);
      assertThat(r.get("verdict")).isIn("pass", "warn", "fail");
    }
  }

  @Test
  void nearDuplicatesAreListedAndNeverPaired() {
    Set<String> group = new HashSet<>(lib.duplicateGroup());
    JsonNode dupes = cli.run("pairs", "--candidates", "8", "--duplicates", "--json", "--count", "200").succeeds().json()
        .get("duplicates");
    Set<String> seen = new HashSet<>();
    for (JsonNode d : dupes) {
      if (group.contains(d.get("first").asText()) && group.contains(d.get("second").asText())) {
        seen.add(d.get("first").asText());
        seen.add(d.get("second").asText());
      }
    }
    // Every edited copy is found as a near-duplicate inside its group (TestFamilies.nearDuplicates ground truth).
    assertThat(seen).as("seed %d", SEED).containsExactlyInAnyOrderElementsOf(group);

    JsonNode pairs = cli.run("pairs", "--candidates", "8", "--json", "--count", "500").succeeds().json().get("pairs");
    assertThat(pairs).as("pairs to check against the near-duplicate group").isNotEmpty();
    for (JsonNode p : pairs) {
      assertThat(group.contains(p.get("first").asText()) && group.contains(p.get("second").asText()))
          .as("near-duplicates proposed as a pair: %s", p).isFalse();
    }
  }

  @Test
  void onlyEditedCopiesAreNearDuplicates() {
    Set<String> group = new HashSet<>(lib.duplicateGroup());
    JsonNode dupes = cli.run("pairs", "--duplicates", "--json", "--count", "200").succeeds().json().get("duplicates");
    for (JsonNode d : dupes) {
      // Near-duplicates are the same picture resized, recompressed or lightly edited (pairs --help); the family's
      // members are different vessels, the unrelated pictures other vessels or glazes.
      assertThat(group).as("a listed duplicate pair lies inside the planted group (seed %d): %s", SEED, d)
          .contains(d.get("first").asText(), d.get("second").asText());
    }
  }

  @Test
  void screenKeepsExtrasFailsUnreadableRowsAndHonoursStrict() throws IOException {
    Path unreadable = Files.writeString(tmp.resolve("garbage.png"), "not a png");
    Path plans = Files.createDirectories(tmp.resolve("plans"));
    Path csv = plans.resolve("planned.csv");
    Files.writeString(csv, "a,b,shot\n"
        + Cli.abs(lib.family.get(0)) + "," + Cli.abs(lib.family.get(1)) + ",opening\n"
        + "../library/family/member-5.png,../library/family/member-6.png,middle\n"
        + Cli.abs(lib.family.get(7)) + "," + Cli.abs(unreadable) + ",broken\n");

    Cli.Run lenient = cli.run("screen", csv.toString(), "--json");
    assertThat(lenient.code()).as("without --strict; stderr %s", lenient.err()).isEqualTo(ExitCodes.OK);
    JsonNode results = lenient.json().get("results");
    assertThat(results).hasSize(3);
    assertThat(results.get(1).get("first").asText()).isEqualTo(Cli.abs(lib.family.get(5)));
    assertThat(results.get(0).get("extras").get("shot").asText()).isEqualTo("opening");
    assertThat(results.get(2).get("extras").get("shot").asText()).isEqualTo("broken");
    for (JsonNode r : results) {
      assertThat(r.has("verdict") && r.has("score") && r.has("reasons")).isTrue();
    }
    JsonNode bad = results.get(2);
    assertThat(bad.get("verdict").asText()).isEqualTo("fail");
    assertThat(bad.get("reasons").toString()).contains("garbage.png");
    // Adjacent members of a silhouette family (t differs by 1/7) are a good pair.
    assertThat(results.get(0).get("verdict").asText()).isNotEqualTo("fail");

    Cli.Run strict = cli.run("screen", csv.toString(), "--json", "--strict");
    assertThat(strict.code()).isEqualTo(ExitCodes.FINISHED_WITH_FAILURES).isEqualTo(1);

    Cli.Run asCsv = cli.run("screen", csv.toString(), "--csv").succeeds();
    assertThat(asCsv.csvHeader()).containsSubsequence("first", "second", "shot", "verdict", "score", "reasons");
    assertThat(asCsv.csv()).extracting(r -> r.get("shot")).containsExactly("opening", "middle", "broken");
    assertThat(asCsv.csv().get(2).get("verdict")).isEqualTo("fail");

    Path clean = plans.resolve("clean.csv");
    Files.writeString(clean, Cli.abs(lib.family.get(0)) + "," + Cli.abs(lib.family.get(1)) + "\n");
    Cli.Run cleanStrict = cli.run("screen", clean.toString(), "--json", "--strict");
    assertThat(cleanStrict.code()).as("stderr %s", cleanStrict.err()).isEqualTo(ExitCodes.OK);
    assertThat(cleanStrict.json().get("results")).hasSize(1);
  }

  @Test
  void decideThenDecisionsShowsItAndRedecidingReplaces() {
    String a = Cli.abs(lib.distractors.get(0));
    String b = Cli.abs(lib.distractors.get(1));
    cli.run("decide", a, b, "approve", "--note", "good opener").succeeds();
    JsonNode mine = decisionOn(a, b);
    assertThat(mine.get("decision").asText()).isEqualTo("approved");
    assertThat(mine.get("note").asText()).isEqualTo("good opener");

    Cli.Run csv = cli.run("decisions", "--csv").succeeds();
    assertThat(csv.csvHeader()).containsExactly("first", "second", "decision", "note", "decided_at");
    assertThat(csv.csv()).anySatisfy(r -> {
      assertThat(Set.of(r.get("first"), r.get("second"))).isEqualTo(Set.of(a, b)); // an unordered pair
      assertThat(r.get("note")).isEqualTo("good opener");
    });

    cli.run("decide", b, a, "reject", "--note", "too far apart").succeeds();
    JsonNode replaced = decisionOn(a, b);
    assertThat(replaced.get("decision").asText()).isEqualTo("rejected");
    assertThat(replaced.get("note").asText()).isEqualTo("too far apart");

    Cli.Run unknown = cli.run("decide", a, b, "maybe");
    unknown.failsCleanly(ExitCodes.USAGE);
    assertThat(unknown.err()).contains("maybe", "approve", "reject");
    assertThat(decisionOn(a, b).get("decision").asText()).isEqualTo("rejected");
  }

  @Test
  void decideClearRemovesTheDecisionInEitherOrder() {
    String a = Cli.abs(lib.distractors.get(2));
    String b = Cli.abs(lib.distractors.get(3));
    cli.run("decide", a, b, "approve").succeeds();
    assertThat(decisionOn(a, b).get("decision").asText()).isEqualTo("approved");
    // both orders name the same unordered pair
    Cli.Run cleared = cli.run("decide", b, a, "--clear", "--json").succeeds();
    assertThat(cleared.json().get("cleared").asBoolean()).isTrue();
    assertThat(cleared.json().get("decision").isNull()).isTrue();
    assertThat(cli.run("decisions", "--json").succeeds().json().get("decisions"))
        .noneMatch(d -> Set.of(d.get("first").asText(), d.get("second").asText()).equals(Set.of(a, b)));
    assertThat(cli.run("decide", a, b, "--clear").succeeds().out()).startsWith("no decision to clear");
    cli.run("decide", a, b, "approve", "--clear").failsCleanly(ExitCodes.USAGE);
    cli.run("decide", a, b).failsCleanly(ExitCodes.USAGE);
  }

  /** The one decision on {a, b} in either order, failing when there is not exactly one. */
  private static JsonNode decisionOn(String a, String b) {
    List<JsonNode> found = new ArrayList<>();
    for (JsonNode d : cli.run("decisions", "--json").succeeds().json().get("decisions")) {
      Set<String> ends = Set.of(d.get("first").asText(), d.get("second").asText());
      if (ends.equals(Set.of(a, b))) {
        found.add(d);
      }
    }
    assertThat(found).hasSize(1);
    return found.get(0);
  }
}
