package org.morphscout.app.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code chain}, {@code walk} and {@code preview} on one small indexed catalog. */
class ChainWalkPreviewCommandTest {
  private static final long SEED = 7303;

  @TempDir static Path tmp;
  static TestLibrary lib;
  static Cli cli;
  static String from;
  static String to;

  @BeforeAll
  static void indexLibrary() throws IOException {
    lib = new TestLibrary(tmp.resolve("library"), SEED);
    cli = new Cli(tmp.resolve("catalog"));
    cli.run("index", lib.root.toString(), "--json", "--threads", "2").succeeds();
    from = Cli.abs(lib.family.get(0));
    to = Cli.abs(lib.family.get(TestLibrary.FAMILY_SIZE - 1));
  }

  private static List<List<String>> chainImages(JsonNode doc) {
    List<List<String>> out = new ArrayList<>();
    doc.get("chains").forEach(c -> out.add(Cli.texts(c.get("images"))));
    return out;
  }

  @Test
  void chainJsonRunsFromStartToEndWithStepsAndSummaries() {
    JsonNode doc = cli.run("chain", from, to, "--json").succeeds().json();
    assertThat(doc.get("from").asText()).isEqualTo(from);
    assertThat(doc.get("to").asText()).isEqualTo(to);
    assertThat(doc.get("direct").get("score").asDouble()).isBetween(0.0, 100.0);
    assertThat(doc.get("chains")).isNotEmpty();
    for (JsonNode c : doc.get("chains")) {
      List<String> images = Cli.texts(c.get("images"));
      assertThat(images.get(0)).isEqualTo(from);
      assertThat(images.get(images.size() - 1)).isEqualTo(to);
      assertThat(images).doesNotHaveDuplicates();
      assertThat(c.get("steps")).hasSize(images.size() - 1);
      double max = 0;
      for (int i = 0; i < c.get("steps").size(); i++) {
        JsonNode s = c.get("steps").get(i);
        assertThat(s.get("first").asText()).isEqualTo(images.get(i));
        assertThat(s.get("second").asText()).isEqualTo(images.get(i + 1));
        max = Math.max(max, s.get("stepCost").asDouble());
      }
      assertThat(c.get("largestStep").asDouble()).isCloseTo(max, org.assertj.core.data.Offset.offset(1e-3));
      assertThat(c.get("unevenness").asDouble()).isGreaterThanOrEqualTo(0);
    }
  }

  @Test
  void chainHonoursAlternativesStepBoundsAvoidAndVia() {
    assertThat(cli.run("chain", from, to, "--json", "--count", "1").succeeds().json().get("chains"))
        .hasSize(1);

    JsonNode bounded = cli.run("chain", from, to, "--json", "--min-steps", "3", "--max-steps", "4").succeeds().json();
    assertThat(bounded.get("chains")).isNotEmpty();
    bounded.get("chains").forEach(c -> assertThat(c.get("steps").size()).isBetween(3, 4));

    String avoided = Cli.abs(lib.family.get(3));
    JsonNode avoiding = cli.run("chain", from, to, "--json", "--avoid", avoided, "--min-steps", "2").succeeds()
        .json();
    assertThat(avoiding.get("chains")).isNotEmpty();
    assertThat(chainImages(avoiding)).allSatisfy(images -> assertThat(images).doesNotContain(avoided));

    String via = Cli.abs(lib.distractors.get(2));
    JsonNode through = cli.run("chain", from, to, "--json", "--via", via).succeeds().json();
    assertThat(through.get("chains")).isNotEmpty();
    assertThat(chainImages(through)).allSatisfy(images -> assertThat(images).contains(via));
  }

  @Test
  void chainWritesASheet() throws IOException {
    Path sheet = tmp.resolve("out/chain-sheet.png");
    Files.createDirectories(sheet.getParent());
    cli.run("chain", from, to, "--sheet", sheet.toString()).succeeds();
    BufferedImage img = ImageIO.read(sheet.toFile());
    assertThat(img).as("a readable PNG").isNotNull();
    assertThat(img.getWidth()).isGreaterThan(100);
  }

  @Test
  void unreachableTargetSaysNoChainAndNamesTheClosestReachable() {
    // Forbid the direct step and every intermediate except two: the target becomes unreachable, and the diagnosis
    // names the reachable image closest to it.
    List<String> args = new ArrayList<>(List.of("chain", from, to, "--min-steps", "4", "--max-steps", "4"));
    List<String> open = List.of(Cli.abs(lib.family.get(1)), Cli.abs(lib.family.get(2)));
    for (Path p : lib.all()) {
      String s = Cli.abs(p);
      if (!s.equals(from) && !s.equals(to) && !open.contains(s)) {
        args.add("--avoid");
        args.add(s);
      }
    }
    Cli.Run text = cli.run(args.toArray(String[]::new)).succeeds();
    assertThat(text.out()).contains("no chain", "closest reachable");
    args.add("--json");
    JsonNode doc = cli.run(args.toArray(String[]::new)).succeeds().json();
    assertThat(doc.get("chains")).isEmpty();
    assertThat(doc.get("reason").asText()).isNotBlank();
    assertThat(doc.get("closestReachable").asText()).isIn(from, open.get(0), open.get(1));
  }

  @Test
  void walkOrdersTheFamilyByItsParameter() throws IOException {
    Path folder = lib.root.resolve("family");
    JsonNode doc = cli.run("walk", folder.toString(), "--json").succeeds().json();
    List<String> order = Cli.texts(doc.get("order"));
    List<String> family = lib.family.stream().map(Cli::abs).toList();
    assertThat(order).containsExactlyInAnyOrderElementsOf(family);
    double sum = 0;
    double max = 0;
    for (JsonNode s : doc.get("stepCosts")) {
      sum += s.asDouble();
      max = Math.max(max, s.asDouble());
    }
    assertThat(doc.get("stepCosts")).hasSize(order.size() - 1);
    assertThat(doc.get("total").asDouble()).isCloseTo(sum, org.assertj.core.data.Offset.offset(1e-2));
    assertThat(doc.get("largestStep").asDouble()).isCloseTo(max, org.assertj.core.data.Offset.offset(1e-3));
    assertThat(doc.has("improvement")).isTrue();
    // Members differ only in t, so the smoothest order follows t one way or the other (ground truth of the family).
    List<Integer> ranks = order.stream().map(family::indexOf).toList();
    boolean up = true;
    boolean down = true;
    for (int i = 1; i < ranks.size(); i++) {
      up &= ranks.get(i) > ranks.get(i - 1);
      down &= ranks.get(i) < ranks.get(i - 1);
    }
    assertThat(up || down).as("seed %d, order %s", SEED, ranks).isTrue();

    String start = family.get(3);
    String end = family.get(0);
    JsonNode bounded = cli.run("walk", folder.toString(), "--start", start, "--end", end, "--json").succeeds().json();
    List<String> o = Cli.texts(bounded.get("order"));
    assertThat(o.get(0)).isEqualTo(start);
    assertThat(o.get(o.size() - 1)).isEqualTo(end);
    assertThat(o).containsExactlyInAnyOrderElementsOf(family);

    Path sheet = tmp.resolve("out/walk-sheet.png");
    Files.createDirectories(sheet.getParent());
    cli.run("walk", folder.toString(), "--sheet", sheet.toString()).succeeds();
    assertThat(ImageIO.read(sheet.toFile())).isNotNull();
  }

  @Test
  void previewWritesAnAnimatedGifWithTheFramesAsked() throws IOException {
    Path gif = tmp.resolve("out/preview.gif");
    Files.createDirectories(gif.getParent());
    cli.run("preview", from, Cli.abs(lib.family.get(2)), "--out", gif.toString(), "--frames-per-step", "5")
        .succeeds();
    assertThat(gifFrames(gif)).isEqualTo(5);

    // Two legs of 5 frames share their middle frame: 5 + 4.
    Path two = tmp.resolve("out/two-legs.gif");
    cli.run("preview", from, Cli.abs(lib.family.get(1)), Cli.abs(lib.family.get(2)), "--out", two.toString(),
        "--frames-per-step", "5").succeeds();
    assertThat(gifFrames(two)).isEqualTo(9);
  }

  @Test
  void previewWritesAPngStripAndRefusesOtherExtensions() throws IOException {
    Path png = tmp.resolve("out/strip.png");
    Files.createDirectories(png.getParent());
    cli.run("preview", from, Cli.abs(lib.family.get(2)), "--out", png.toString(), "--frames-per-step", "4")
        .succeeds();
    BufferedImage strip = ImageIO.read(png.toFile());
    assertThat(strip).isNotNull();
    assertThat(strip.getWidth()).as("four frames side by side").isGreaterThan(strip.getHeight());

    Path bmp = tmp.resolve("out/preview.bmp");
    Cli.Run bad = cli.run("preview", from, Cli.abs(lib.family.get(2)), "--out", bmp.toString());
    bad.failsCleanly(ExitCodes.ERROR);
    assertThat(bad.err()).contains(".gif", ".png");
    assertThat(Files.exists(bmp)).isFalse();
  }

  private static int gifFrames(Path gif) throws IOException {
    try (ImageInputStream in = ImageIO.createImageInputStream(gif.toFile())) {
      ImageReader reader = ImageIO.getImageReadersByFormatName("gif").next();
      try {
        reader.setInput(in);
        int n = reader.getNumImages(true);
        for (int i = 0; i < n; i++) {
          assertThat(reader.read(i)).isNotNull();
        }
        return n;
      } finally {
        reader.dispose();
      }
    }
  }
}
