package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A catalog made by the previous release opens in this one, is converted in place, keeps its decisions and answers
 * the same queries. The fixture under {@code earlier-release/} was made by the release before the layout steps
 * (commit 010e8f9) from eight drawn test shapes: {@code index}, two {@code decide} calls, then {@code similar --json}
 * and {@code decisions --json}, whose outputs are kept beside it as the expected answers. Its images were at
 * {@code /tmp/morphscout-earlier-release/library}; they are not needed, as the catalog holds their analyses.
 */
class EarlierReleaseCatalogTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final String LIBRARY = "/tmp/morphscout-earlier-release/library/";

  @TempDir Path tmp;

  @Test
  void catalogOfThePreviousReleaseKeepsDecisionsAndAnswersTheSame() throws Exception {
    Path fixture = fixture();
    Path catalog = tmp.resolve("catalog");
    copy(fixture.resolve("catalog"), catalog);
    assertThat(tables(catalog)).as("the fixture is in the earlier layout").contains("schema_version")
        .doesNotContain("catalog_layout");
    Cli cli = new Cli(catalog);

    JsonNode decisions = cli.run("decisions", "--json").succeeds().json().get("decisions");
    assertThat(pairsOf(decisions)).isEqualTo(pairsOf(expected(fixture, "decisions.json").get("decisions")));

    assertSameResults(cli.run("similar", LIBRARY + "vase-a.png", "--json").succeeds().json(),
        expected(fixture, "similar-vase-a.json"));
    assertSameResults(cli.run("similar", LIBRARY + "jar-a.png", "--by", "shape", "--json").succeeds().json(),
        expected(fixture, "similar-jar-a-shape.json"));

    assertThat(tables(catalog)).as("converted in place").contains("catalog_layout").doesNotContain("schema_version");
  }

  /** Each decision as "pathX | pathY | verdict | note" with the two paths sorted (the order of a pair is no answer). */
  private static Set<String> pairsOf(JsonNode decisions) {
    Set<String> out = new TreeSet<>();
    for (JsonNode d : decisions) {
      List<String> paths = new ArrayList<>();
      d.properties().forEach(e -> {
        if (e.getValue().isTextual() && e.getValue().asText().startsWith(LIBRARY)) {
          paths.add(e.getValue().asText());
        }
      });
      assertThat(paths).as("two paths in %s", d).hasSize(2);
      paths.sort(null);
      // the earlier release named the decision "verdict"; it is "decision" now
      JsonNode decision = d.has("decision") ? d.get("decision") : d.get("verdict");
      out.add(paths.get(0) + " | " + paths.get(1) + " | " + decision.asText() + " | " + d.get("note").asText());
    }
    return out;
  }

  private static void assertSameResults(JsonNode actual, JsonNode expected) {
    List<String> got = new ArrayList<>();
    actual.get("results").forEach(r -> got.add(r.get("path").asText()));
    List<String> want = new ArrayList<>();
    expected.get("results").forEach(r -> want.add(r.get("path").asText()));
    assertThat(got).isEqualTo(want);
    for (int i = 0; i < want.size(); i++) {
      assertThat(actual.get("results").get(i).get("distance").asDouble())
          .as("distance of %s", want.get(i))
          .isCloseTo(expected.get("results").get(i).get("distance").asDouble(), Offset.offset(1e-4));
    }
  }

  private static JsonNode expected(Path fixture, String name) throws IOException {
    return JSON.readTree(fixture.resolve("expected").resolve(name).toFile());
  }

  private static Path fixture() throws URISyntaxException {
    return Path.of(EarlierReleaseCatalogTest.class.getResource("earlier-release").toURI());
  }

  private static void copy(Path from, Path to) throws IOException {
    try (Stream<Path> all = Files.walk(from)) {
      all.forEach(p -> {
        try {
          Path target = to.resolve(from.relativize(p).toString());
          if (Files.isDirectory(p)) {
            Files.createDirectories(target);
          } else {
            Files.copy(p, target);
          }
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      });
    }
  }

  private static Set<String> tables(Path catalog) throws Exception {
    Set<String> names = new TreeSet<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + catalog.resolve("catalog.db"));
        ResultSet rs = c.getMetaData().getTables(null, null, "%", new String[] {"TABLE"})) {
      while (rs.next()) {
        names.add(rs.getString("TABLE_NAME"));
      }
    }
    return names;
  }
}
