package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One word per idea, checked on what the commands really print (not on the sources): every command's JSON, CSV, text
 * and {@code --help} run on one small indexed catalog, and none of the retired words of the README's glossary comes
 * back (the pair's pictures are first and second, not a and b; folders, not roots; one key for the model; step costs
 * and distances named as such).
 */
class OutputVocabularyTest {
  private static final long SEED = 7216;

  /** JSON keys that the glossary retired, with the word that replaced each. */
  private static final Map<String, String> RETIRED_KEYS = Map.ofEntries(
      Map.entry("a", "first"), Map.entry("b", "second"), Map.entry("roots", "folders"), Map.entry("root", "folder"),
      Map.entry("featureModel", "model"), Map.entry("maxStep", "largestStep"), Map.entry("cost", "stepCost"),
      Map.entry("evenness", "unevenness"), Map.entry("overlap", "alignedIou or sharedImages"),
      Map.entry("look", "appearance"), Map.entry("indexed", "analysed or ready"), Map.entry("walkthrough", "walk"),
      Map.entry("flags", "findings"), Map.entry("bounded", "notWarped"));

  /** Sub-score names: as keys they may only name sub-scores (higher is better), never a distance. */
  private static final Set<String> SUB_SCORE_ONLY = Set.of("appearance", "shape", "colour", "warpEffort");

  /** Words retired from text, help and CSV headers (whole words, any case), with what replaced them. */
  private static final Map<String, String> RETIRED_WORDS = Map.of(
      "roots?", "folders", "walkthroughs?", "walk", "evenness", "unevenness", "featureModel", "model",
      "[KM]B", "KiB / MiB", "a,b", "first,second", "\\d+ indexed", "analysed (a count) or ready (a state)");

  @TempDir static Path tmp;
  static TestLibrary lib;
  static Cli cli;
  /** Every output, labelled by its command line. */
  static final Map<String, Cli.Run> JSON = new LinkedHashMap<>();
  static final Map<String, Cli.Run> CSV = new LinkedHashMap<>();
  static final Map<String, Cli.Run> TEXT = new LinkedHashMap<>();

  @BeforeAll
  static void runEveryCommand() throws IOException {
    lib = new TestLibrary(tmp.resolve("library"), SEED);
    cli = new Cli(tmp.resolve("catalog"));
    JSON.put("index --json", cli.run("index", lib.root.toString(), "--json", "--threads", "2").succeeds());
    String first = Cli.abs(lib.family.get(0));
    String second = Cli.abs(lib.family.get(1));
    String last = Cli.abs(lib.family.get(lib.family.size() - 1));
    JSON.put("decide --json", cli.run("decide", first, second, "approve", "--note", "kept", "--json").succeeds());
    Path plan = tmp.resolve("plan.csv");
    // the second row pairs a family member with unrelated pictures, so the reasons have something to say
    Files.writeString(plan, "first,second,shot\n" + first + "," + last + ",one\n" + first + ","
        + Cli.abs(lib.unrelated.get(0)) + ",two\n" + Cli.abs(lib.distractors.get(0)) + ","
        + Cli.abs(lib.unrelated.get(lib.unrelated.size() - 1)) + ",three\n");
    List<List<String>> lines = List.of(
        List.of("status"), List.of("similar", first, "--count", "3"), List.of("pairs", "--count", "5"),
        List.of("pairs", "--duplicates"), List.of("pairs", "--for", first, "--count", "3"),
        List.of("chain", first, last, "--count", "2"), List.of("walk", lib.root.resolve("family").toString()),
        List.of("screen", plan.toString()), List.of("decisions"));
    Set<String> withCsv = Set.of("pairs", "chain", "walk", "screen", "decisions");
    for (List<String> line : lines) {
      String label = String.join(" ", line);
      TEXT.put(label, cli.run(line.toArray(String[]::new)).succeeds());
      JSON.put(label + " --json", cli.run(with(line, "--json")).succeeds());
      if (withCsv.contains(line.get(0))) {
        CSV.put(label + " --csv", cli.run(with(line, "--csv")).succeeds());
      }
    }
    for (String command : List.of("demo", "index", "import", "status", "similar", "pairs", "screen", "decide",
        "decisions", "chain", "walk", "preview", "models", "browse", "bench")) {
      TEXT.put(command + " --help", Cli.runRaw(command, "--help").succeeds());
    }
    TEXT.put("--help", Cli.runRaw("--help").succeeds());
    TEXT.put("index", cli.run("index").succeeds());
  }

  private static String[] with(List<String> line, String option) {
    List<String> all = new ArrayList<>(line);
    all.add(option);
    return all.toArray(String[]::new);
  }

  @Test
  void noJsonOutputUsesARetiredKey() {
    Map<String, Set<String>> found = new LinkedHashMap<>();
    int keys = 0;
    for (Map.Entry<String, Cli.Run> e : JSON.entrySet()) {
      Set<String> bad = new TreeSet<>();
      keys += walk(e.getValue().json(), "", bad);
      if (!bad.isEmpty()) {
        found.put(e.getKey(), bad);
      }
    }
    assertThat(keys).as("keys seen").isGreaterThan(100);
    assertThat(found).as("retired keys (%s), by command line", RETIRED_KEYS).isEmpty();
  }

  @Test
  void thePairsOfEveryCommandNameTheirPicturesFirstAndSecond() {
    // The positive side of the check above: the keys are there, so the absence of "a" and "b" means something.
    assertThat(JSON.get("pairs --count 5 --json").json().get("pairs").get(0).fieldNames()).toIterable()
        .startsWith("first", "second");
    assertThat(JSON.get("decisions --json").json().get("decisions").get(0).fieldNames()).toIterable()
        .startsWith("first", "second");
    JsonNode chain = JSON.get("chain " + Cli.abs(lib.family.get(0)) + " "
        + Cli.abs(lib.family.get(lib.family.size() - 1)) + " --count 2 --json").json();
    assertThat(chain.get("direct").fieldNames()).toIterable().startsWith("first", "second");
    assertThat(chain.get("chains").get(0).get("steps").get(0).fieldNames()).toIterable()
        .startsWith("first", "second", "stepCost", "appearanceDistance", "shapeDistance");
    for (Map.Entry<String, Cli.Run> e : CSV.entrySet()) {
      List<String> header = e.getValue().csvHeader();
      if (!e.getKey().startsWith("walk")) {
        assertThat(header).as(e.getKey()).containsSubsequence("first", "second");
      }
    }
    JsonNode status = JSON.get("status --json").json();
    assertThat(status.has("folders") && status.has("model")).as("status keys: %s", status).isTrue();
  }

  @Test
  void csvHeadersAreTheJsonKeysInSnakeCaseAndNoneIsRetired() {
    assertThat(CSV).isNotEmpty();
    for (Map.Entry<String, Cli.Run> e : CSV.entrySet()) {
      List<String> header = e.getValue().csvHeader();
      assertThat(header).as(e.getKey()).isNotEmpty().allSatisfy(h -> {
        assertThat(h).as("%s: %s", e.getKey(), header).matches("[a-z][a-z0-9_]*|shot");
        assertThat(RETIRED_KEYS).as("%s: %s", e.getKey(), header).doesNotContainKey(h);
        if (!(e.getKey().startsWith("pairs") && PairRows.componentColumns().contains(h))) { // there a sub-score
          assertThat(SUB_SCORE_ONLY).as("%s: %s is a sub-score name", e.getKey(), header).doesNotContain(h);
        }
      });
    }
  }

  @Test
  void noTextOrHelpUsesARetiredWord() {
    Map<String, List<String>> found = new LinkedHashMap<>();
    Map<String, Cli.Run> all = new LinkedHashMap<>(TEXT);
    all.putAll(CSV);
    for (Map.Entry<String, Cli.Run> e : all.entrySet()) {
      assertThat(e.getValue().out()).as(e.getKey()).isNotBlank();
      for (String word : RETIRED_WORDS.keySet()) {
        Matcher m = Pattern.compile("(?i)(?<![\\w-])" + word + "(?![\\w-])").matcher(e.getValue().out());
        while (m.find()) {
          String line = lineAround(e.getValue().out(), m.start());
          found.computeIfAbsent(e.getKey(), k -> new ArrayList<>()).add(m.group() + " in: " + line);
        }
      }
    }
    assertThat(found).as("retired words (%s), by command line", RETIRED_WORDS).isEmpty();
  }

  @Test
  void reasonsNameThePicturesFirstAndSecond() {
    // "the first picture is tiny", not "A is tiny": the pair's pictures are first and second in prose too
    List<String> reasons = new ArrayList<>();
    for (Cli.Run run : JSON.values()) {
      run.json().findValues("reasons").forEach(list -> list.forEach(r -> reasons.add(r.asText())));
    }
    assertThat(reasons).as("reasons seen").isNotEmpty();
    assertThat(reasons).noneMatch(r -> Pattern.compile("(?<![\\w'-])[AB](?![\\w-])").matcher(r).find());
  }

  @Test
  void jsonNumbersArePlainDecimals() {
    // 0.0005, not 5.0E-4: the shape distances of similar and the step costs of a smooth walk are that small
    for (Map.Entry<String, Cli.Run> e : JSON.entrySet()) {
      assertThat(e.getValue().out()).as(e.getKey()).doesNotContainPattern("\\d[eE][-+]?\\d");
    }
    java.io.StringWriter small = new java.io.StringWriter();
    JsonOut.write(new java.io.PrintWriter(small), new java.util.TreeMap<>(Map.of("a", 0.0005, "b", 1.0E-7, "c", 97.1)));
    assertThat(small.toString()).contains("0.0005", "0.0000001", "97.1").doesNotContain("E-");
  }

  @Test
  void decisionsShowPeopleALocalDateAndScriptsAnInstant() {
    // Human dates in text (the glossary: 2026-12-03 22:15), ISO-8601 instants for scripts.
    assertThat(TEXT.get("decisions").out()).containsPattern("decided \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d\\n");
    assertThat(JSON.get("decisions --json").json().get("decisions").get(0).get("decidedAt").asText())
        .matches("\\d{4}-\\d\\d-\\d\\dT.*Z");
  }

  @Test
  void stepFiguresCarryFourDecimals() {
    // Neighbouring steps of a walk often differ in the fourth decimal (0.0037 against 0.0043): text shows four.
    String walk = TEXT.get("walk " + lib.root.resolve("family")).out();
    assertThat(walk).containsPattern("\\n +2\\. \\d\\.\\d{4} ");
    assertThat(walk).containsPattern("total \\d\\.\\d{4}, largest step \\d\\.\\d{4}");
    // walk names its list of step costs for what it holds (a chain's steps are objects with more than the cost)
    JsonNode doc = JSON.get("walk " + lib.root.resolve("family") + " --json").json();
    assertThat(doc.get("stepCosts")).hasSize(doc.get("order").size() - 1);
  }

  /** Collects retired keys under {@code node}; returns the number of keys seen. */
  private static int walk(JsonNode node, String parent, Set<String> bad) {
    int n = 0;
    if (node.isObject()) {
      for (Map.Entry<String, JsonNode> f : node.properties()) {
        n++;
        String key = f.getKey();
        boolean extras = parent.equals("extras"); // the user's own CSV column names, kept as given
        if (!extras && RETIRED_KEYS.containsKey(key)) {
          bad.add(key + " -> " + RETIRED_KEYS.get(key));
        }
        if (!extras && SUB_SCORE_ONLY.contains(key) && !parent.equals("components")) {
          bad.add(key + " outside components (a distance is named ...Distance)");
        }
        n += walk(f.getValue(), key, bad);
      }
    } else if (node.isArray()) {
      for (JsonNode e : node) {
        n += walk(e, parent, bad);
      }
    }
    return n;
  }

  private static String lineAround(String text, int at) {
    int s = text.lastIndexOf('\n', at) + 1;
    int e = text.indexOf('\n', at);
    return text.substring(s, e < 0 ? text.length() : e).strip();
  }
}
