package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DemoLibraryTest {
  private static final long SEED = 0x5EED_0004L;
  /** Small library: 12 products (so one near-duplicate), the problem set, 5 shelf views. */
  private static final DemoOptions OPTIONS =
      DemoOptions.defaults().withSeed(SEED).withProductCount(12).withShelfViews(5).withThreads(2);

  @TempDir
  static Path first;
  static LibrarySummary summary;
  static List<ManifestRow> rows;

  @BeforeAll
  static void generate() throws IOException {
    summary = DemoLibrary.generate(first, OPTIONS);
    List<String> lines = Files.readAllLines(summary.manifest(), StandardCharsets.UTF_8);
    assertThat(lines.get(0)).isEqualTo(ManifestRow.HEADER);
    rows = lines.stream().skip(1).map(ManifestRow::parse).toList();
  }

  @Test
  void sameSeedGivesIdenticalBytesWhateverTheThreadCount(@TempDir Path second) throws IOException {
    DemoLibrary.generate(second, OPTIONS.withThreads(1));
    Set<String> a = files(first);
    assertThat(a).as("seed %d: files generated", SEED).isNotEmpty();
    assertThat(files(second)).isEqualTo(a);
    for (String f : a) {
      assertThat(Files.readAllBytes(second.resolve(f))).as("seed %d file %s", SEED, f)
          .isEqualTo(Files.readAllBytes(first.resolve(f)));
    }
  }

  @Test
  void manifestRowsMatchTheFilesOnDisk() throws IOException {
    Set<String> pictures = files(first).stream()
        .filter(f -> !f.equals("manifest.csv") && !f.equals("README.txt")).collect(Collectors.toSet());
    assertThat(rows.stream().map(ManifestRow::file).collect(Collectors.toSet())).isEqualTo(pictures);
    assertThat(rows).hasSize(pictures.size());
    assertThat(summary.pictures()).isEqualTo(pictures.size());
    assertThat(summary.products()).isEqualTo(12);
    for (ManifestRow r : rows) {
      byte[] bytes = Files.readAllBytes(first.resolve(r.file()));
      assertThat(r.file()).startsWith(r.problem().isEmpty() ? r.productLine() + "/" : "problems/");
      if (r.format().equals("jpeg")) {
        // JPEG: SOI marker FF D8 (ITU-T T.81, B.1.1.3).
        assertThat(Arrays.copyOf(bytes, 2)).as(r.file()).isEqualTo(new byte[] {(byte) 0xFF, (byte) 0xD8});
      } else {
        // PNG signature 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948, section 5.2).
        assertThat(Arrays.copyOf(bytes, 8)).as(r.file())
            .isEqualTo(new byte[] {(byte) 0x89, 'P', 'N', 'G', 13, 10, 26, 10});
      }
      if (r.problem().equals("corrupt")) {
        continue;
      }
      BufferedImage img = ImageCodec.decode(bytes);
      assertThat(img.getWidth()).as(r.file()).isEqualTo(r.width());
      assertThat(img.getHeight()).as(r.file()).isEqualTo(r.height());
      assertThat(img.getColorModel().hasAlpha()).as(r.file()).isEqualTo(r.alpha());
      if (r.alpha()) {
        assertThat(img.getRGB(0, 0) >>> 24).as("corner of cut-out %s", r.file()).isZero();
      }
      if (!r.duplicateOf().isEmpty()) {
        assertThat(Files.exists(first.resolve(r.duplicateOf()))).as(r.duplicateOf()).isTrue();
      }
    }
  }

  @Test
  void nearDuplicateLooksLikeItsOriginal() throws IOException {
    List<ManifestRow> dups = rows.stream().filter(r -> !r.duplicateOf().isEmpty()).toList();
    assertThat(dups).hasSize(summary.duplicates()).isNotEmpty();
    for (ManifestRow d : dups) {
      BufferedImage copy = ImageCodec.decode(Files.readAllBytes(first.resolve(d.file())));
      BufferedImage original = ImageCodec.decode(Files.readAllBytes(first.resolve(d.duplicateOf())));
      assertThat(TestFamiliesTest.signatureDistance(original, copy)).as("seed %d %s", SEED, d.file())
          .isLessThan(0.2);
    }
  }

  @Test
  void problemFilesExistAndAreWhatTheyClaim() throws IOException {
    Map<String, ManifestRow> byProblem = new HashMap<>();
    for (ManifestRow r : rows) {
      if (!r.problem().isEmpty()) {
        byProblem.put(r.problem(), r);
      }
    }
    assertThat(byProblem.keySet()).containsExactlyInAnyOrder("cut-off", "two-objects", "very-dark", "panoramic",
        "tiny", "corrupt");
    assertThat(byProblem.get("tiny").width()).isEqualTo(96);
    assertThat(byProblem.get("tiny").height()).isEqualTo(72);
    assertThat(byProblem.get("panoramic").width()).isEqualTo(2 * byProblem.get("panoramic").height());

    byte[] corrupt = Files.readAllBytes(first.resolve(byProblem.get("corrupt").file()));
    // Outside marker segments a JPEG can only hold FF D9 as its EOI marker: entropy-coded 0xFF bytes are
    // followed by a stuffed 0x00 or a restart marker (ITU-T T.81, F.1.2.3 and B.1.1.5). No FF D9 = cut short.
    for (int i = 0; i + 1 < corrupt.length; i++) {
      assertThat((corrupt[i] & 0xFF) == 0xFF && (corrupt[i + 1] & 0xFF) == 0xD9).as("EOI at %d", i).isFalse();
    }
    assertThat(corrupt.length).isGreaterThan(1000);

    BufferedImage dark = ImageCodec.decode(Files.readAllBytes(first.resolve(byProblem.get("very-dark").file())));
    assertThat(meanLuma(dark)).as("very dark mean luma").isLessThan(30);
    BufferedImage normal = ImageCodec.decode(Files.readAllBytes(first.resolve(byProblem.get("tiny").file())));
    assertThat(meanLuma(normal)).isGreaterThan(100);

    List<ProblemPlanner.Planned> planned = new ProblemPlanner(OPTIONS).planShots();
    assertThat(planned).extracting(p -> p.row().problem()).contains("cut-off", "two-objects");
    VesselRenderer renderer = new VesselRenderer();
    for (ProblemPlanner.Planned p : planned) {
      assertThat(p.row()).isIn(rows);
      Rendering r = renderer.render(p.shot());
      assertThat(r.mask().touchesFrame()).as(p.row().problem()).isEqualTo(p.row().problem().equals("cut-off"));
      assertThat(r.vesselMasks()).as(p.row().problem()).hasSize(p.row().problem().equals("two-objects") ? 2 : 1);
    }
  }

  @Test
  void shelfViewsHaveAShuffledTrueOrderAndNeighboursLookAlike() throws IOException {
    List<ManifestRow> shelf = new ArrayList<>(rows.stream().filter(r -> r.shelfOrder() >= 0).toList());
    assertThat(shelf).hasSize(5);
    shelf.sort((a, b) -> Integer.compare(a.shelfOrder(), b.shelfOrder()));
    for (int i = 0; i < shelf.size(); i++) {
      assertThat(shelf.get(i).shelfOrder()).isEqualTo(i);
    }
    List<String> byName = shelf.stream().map(ManifestRow::file).sorted().toList();
    assertThat(byName).as("seed %d: file names must not give the order away", SEED)
        .isNotEqualTo(shelf.stream().map(ManifestRow::file).toList());
    List<BufferedImage> views = new ArrayList<>();
    for (ManifestRow r : shelf) {
      views.add(ImageCodec.decode(Files.readAllBytes(first.resolve(r.file()))));
    }
    // A slow pan: each view is nearer its true neighbour than the first view is to the last.
    double ends = TestFamiliesTest.signatureDistance(views.get(0), views.get(views.size() - 1));
    for (int i = 1; i < views.size(); i++) {
      assertThat(TestFamiliesTest.signatureDistance(views.get(i - 1), views.get(i))).as("seed %d step %d", SEED, i)
          .isLessThan(ends);
    }
  }

  @Test
  void readmeSaysTheLibraryIsInventedAndApacheLicensed() throws IOException {
    String text = Files.readString(summary.readme(), StandardCharsets.UTF_8);
    assertThat(text).contains("Quernhollow Ceramics", "invented", "synthetic", "Apache License, Version 2.0",
        "no real people");
  }

  private static double meanLuma(BufferedImage img) {
    double sum = 0;
    for (int y = 0; y < img.getHeight(); y++) {
      for (int x = 0; x < img.getWidth(); x++) {
        int p = img.getRGB(x, y);
        // Rec. 601 luma weights (ITU-R BT.601).
        sum += 0.299 * ((p >> 16) & 0xFF) + 0.587 * ((p >> 8) & 0xFF) + 0.114 * (p & 0xFF);
      }
    }
    return sum / (img.getWidth() * img.getHeight());
  }

  private static Set<String> files(Path root) throws IOException {
    try (Stream<Path> s = Files.walk(root)) {
      return s.filter(Files::isRegularFile).map(p -> root.relativize(p).toString().replace('\\', '/'))
          .collect(Collectors.toCollection(TreeSet::new));
    }
  }
}
