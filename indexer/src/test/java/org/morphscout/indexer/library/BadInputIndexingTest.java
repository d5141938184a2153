package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.testing.BadFiles;
import org.morphscout.indexer.testing.CatalogChecks;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * One folder holding every awkward file of the "bad input" list at once, next to good pictures, indexed end to end:
 * each file ends as an indexed image or as a failure with a clear reason, every good file is ready, the run returns
 * (time limit), and the catalog and the vector index agree. The decoder-level checks of each case are in the ingest
 * tests; this test checks what the indexer makes of them together.
 */
class BadInputIndexingTest {
  private static final long SEED = 20261202L;

  @TempDir Path tmp;

  /** What should become of a file: ready, or failed with exactly this reason. */
  private record Expected(Path file, Optional<String> reason) {
    static Expected ready(Path file) {
      return new Expected(file, Optional.empty());
    }

    static Expected failed(Path file, String reason) {
      return new Expected(file, Optional.of(reason));
    }
  }

  @Test
  @Timeout(value = 150, unit = TimeUnit.SECONDS)
  void everyFileEndsReadyOrFailedWithAReasonAndGoodFilesAreAllIndexed() throws IOException {
    Path root = Files.createDirectories(tmp.resolve("library"));
    Path odd = Files.createDirectories(root.resolve("odd names"));
    Path outside = Files.createDirectories(tmp.resolve("elsewhere"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 8, Archetype.JUG, Archetype.JAR);
    BufferedImage picture = family.get(0).image();
    List<Expected> expected = new ArrayList<>();

    // Good files, several encodings; reasons of the failures are the decoder's wording (ingest tests).
    for (int i = 0; i < 4; i++) {
      Path p = root.resolve("good-" + i + ".png");
      ImageIO.write(family.get(i).image(), "png", p.toFile());
      expected.add(Expected.ready(p));
    }
    expected.add(Expected.ready(BadFiles.write(root, "good-4.jpg", BadFiles.encode(family.get(4).image(), "jpeg"))));
    expected.add(Expected.ready(BadFiles.cmykJpeg(root, "cmyk.jpg", family.get(5).image())));
    expected.add(Expected.ready(BadFiles.png16BitRgb(root, "sixteen-bit.png", family.get(6).image())));
    expected.add(Expected.ready(BadFiles.greyAlphaPng(root, "grey-alpha.png", family.get(7).image(),
        opaqueWhere(family.get(7)))));
    expected.add(Expected.ready(BadFiles.animatedGif(root, "animated.gif", family.get(1).image(),
        family.get(2).image())));
    expected.add(Expected.ready(BadFiles.multiPageTiff(root, "two-pages.tif", family.get(3).image(), picture)));
    // Odd names: spaces, letters outside ASCII, a newline (where the file system allows one).
    Path spaces = odd.resolve("vase at noon.png");
    Files.copy(root.resolve("good-1.png"), spaces);
    expected.add(Expected.ready(spaces));
    Path accents = odd.resolve("Ærø_straße_日本.png");
    Files.copy(root.resolve("good-2.png"), accents);
    expected.add(Expected.ready(accents));
    Path newline = null;
    try {
      newline = Files.copy(root.resolve("good-3.png"), odd.resolve("two\nlines.png"));
      expected.add(Expected.ready(newline));
    } catch (IOException | java.nio.file.InvalidPathException e) {
      // a file system that forbids newlines in names
    }
    // Degenerate but readable pictures: indexed, with no silhouette where there is none.
    expected.add(Expected.ready(BadFiles.filledPng(root, "one-pixel.png", 1, 1, 0xFF336699)));
    expected.add(Expected.ready(BadFiles.filledPng(root, "clear.png", 64, 48, 0x00000000)));
    expected.add(Expected.ready(BadFiles.filledJpeg(root, "grey.jpg", 200, 150, 0x777777)));

    expected.add(Expected.failed(BadFiles.empty(root, "empty.jpg"), "empty file (0 bytes)"));
    expected.add(Expected.failed(BadFiles.truncatedJpeg(root, "cut.jpg", picture, 0.5), "truncated JPEG data"));
    expected.add(Expected.failed(BadFiles.truncatedPng(root, "cut.png", picture, 0.5), "truncated PNG data"));
    expected.add(Expected.failed(BadFiles.randomBytes(root, "noise.jpg", SEED, 4096), "not an image"));
    expected.add(Expected.failed(BadFiles.pngHeaderOnly(root, "huge.png", 100_000, 100_000),
        "image too large: 100000x100000 = 10000.0 MP exceeds the 250 MP cap"));
    expected.add(Expected.failed(BadFiles.heic(root, "IMG_0001.HEIC"), "unsupported format (HEIC)"));
    expected.add(Expected.failed(BadFiles.tiffBasedRaw(root, "DSC_0001.NEF"), "unsupported format (camera raw NEF)"));
    // Deleted after the scan and the reconciliation, before decoding (the "analysing" phase starts in between).
    Path vanishing = root.resolve("vanishing.png");
    Files.copy(root.resolve("good-0.png"), vanishing);
    Files.writeString(vanishing, "x", java.nio.file.StandardOpenOption.APPEND); // own content hash, not a copy
    expected.add(Expected.failed(vanishing, "file disappeared before decoding"));

    // Links: a loop back to the root, and a file and a folder outside the root (not followed unless asked).
    boolean links = symlinks(tmp);
    Path outsidePicture = outside.resolve("outside.png");
    ImageIO.write(family.get(5).image(), "png", outsidePicture.toFile());
    if (links) {
      Files.createSymbolicLink(odd.resolve("loop"), root);
      Files.createSymbolicLink(root.resolve("outside-link.png"), outsidePicture);
      Files.createSymbolicLink(root.resolve("outside-folder"), outside);
    }

    ProgressListener deleteBeforeDecoding = new ProgressListener() {
      @Override
      public void phase(String name, long total) {
        if (name.equals("analysing")) {
          try {
            Files.delete(vanishing);
          } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
          }
        }
      }
    };
    IndexOptions options = IndexOptions.defaults().withThreads(2).withNeighbours(4)
        .withPerFileTimeLimit(Duration.ofSeconds(30));
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      IndexReport report = new LibraryIndexer(library, AnalysisSetup.defaults(), options)
          .index(List.of(root), deleteBeforeDecoding, CancellationToken.none());

      Map<String, String> outcome = new LinkedHashMap<>();
      for (ImageRow row : library.images().all()) {
        outcome.put(row.path(), row.status() == ImageStatus.READY ? "ready"
            : row.status() + ": " + library.images().failureReason(row.id()).orElse("(no reason)"));
      }
      for (Expected e : expected) {
        String key = CatalogChecks.key(e.file());
        assertThat(outcome).as("seed %d: catalog status of %s", SEED, e.file()).containsKey(key);
        assertThat(outcome.get(key)).as("seed %d: %s", SEED, e.file())
            .isEqualTo(e.reason().map(r -> "FAILED: " + r).orElse("ready"));
      }
      // Nothing else entered the catalog: not the loop, not the links leading out of the root.
      assertThat(outcome).as("seed %d: every row was expected", SEED).hasSize(expected.size());
      assertThat(report.indexed()).isEqualTo((int) expected.stream().filter(e -> e.reason().isEmpty()).count());
      // The report lists the same failures, plus the loop: a scan problem (no catalog row), named as a loop.
      List<String> reported = new ArrayList<>(
          expected.stream().filter(e -> e.reason().isPresent()).map(e -> CatalogChecks.key(e.file())).toList());
      if (links) {
        reported.add(CatalogChecks.key(odd.resolve("loop")));
        assertThat(report.failures()).filteredOn(f -> f.path().endsWith("loop")).singleElement()
            .satisfies(f -> assertThat(f.reason()).contains("loop"));
      }
      assertThat(report.failures()).extracting(IndexReport.FileFailure::path)
          .containsExactlyInAnyOrderElementsOf(reported);
      CatalogChecks.catalogAndIndexAgree(library, "after the first run");
      CatalogChecks.noDuplicatesOrOrphans(library, "after the first run");

      // The indexed degenerate pictures carry no silhouette, and their vectors are finite (VectorSync checks).
      assertThat(library.find(root.resolve("grey.jpg").toString()).flatMap(r -> library.features().load(r)))
          .get().satisfies(a -> assertThat(a.silhouette().mask().area()).as("uniform grey: no silhouette").isZero());

      if (links) {
        // Asked to follow links: the outside file comes in (once, though two links reach it), and the loop is
        // reported as a scan problem instead of hanging the run.
        IndexReport following = new LibraryIndexer(library, AnalysisSetup.defaults(), options.withFollowLinks(true))
            .index(List.of(root), ProgressListener.NONE, CancellationToken.none());
        assertThat(following.indexed()).isEqualTo(1);
        assertThat(following.failures()).anySatisfy(f -> assertThat(f.reason()).contains("loop"));
        assertThat(library.images().withStatus(ImageStatus.READY)).extracting(ImageRow::path)
            .containsOnlyOnce(CatalogChecks.key(root.resolve("outside-folder/outside.png")));
        CatalogChecks.catalogAndIndexAgree(library, "after following links");
        CatalogChecks.noDuplicatesOrOrphans(library, "after following links");
      }
    }
  }

  @Test
  @Timeout(value = 60, unit = TimeUnit.SECONDS)
  void filesOverThePerFileTimeLimitFailAsTimedOutAndTheRunReturns() throws IOException {
    // A limit far below what reading and analysing a 1600x1200 picture takes (a large fraction of a second): every
    // file hits it. The pictures are that large so that the next file cannot be finished while the run is still
    // recording the previous one's failure (the limit counts from when the run comes to a file).
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 3, Archetype.CUP, Archetype.BOWL, 1600, 1200);
    FamilyFolders.writePngs(family, root, "slow-");
    IndexOptions options = IndexOptions.defaults().withThreads(1).withNeighbours(2)
        .withPerFileTimeLimit(Duration.ofMillis(1));
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      IndexReport report = new LibraryIndexer(library, AnalysisSetup.defaults(), options)
          .index(List.of(root), ProgressListener.NONE, CancellationToken.none());
      assertThat(report.indexed()).isZero();
      assertThat(report.failures()).hasSize(3)
          .allSatisfy(f -> assertThat(f.reason()).startsWith("timed out: reading and analysing took more than"));
      assertThat(library.images().withStatus(ImageStatus.FAILED)).hasSize(3);
      CatalogChecks.catalogAndIndexAgree(library, "after timeouts");
      CatalogChecks.noDuplicatesOrOrphans(library, "after timeouts");
    }
  }

  private static boolean[] opaqueWhere(FamilyItem item) {
    int w = item.image().getWidth();
    int h = item.image().getHeight();
    boolean[] opaque = new boolean[w * h];
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        opaque[y * w + x] = item.mask().get(x, y);
      }
    }
    return opaque;
  }

  private static boolean symlinks(Path dir) {
    try {
      Path probe = Files.createSymbolicLink(dir.resolve("probe-link"), dir);
      Files.delete(probe);
      return true;
    } catch (IOException | UnsupportedOperationException e) {
      return false; // the link cases are left out below; the rest of the test still runs
    }
  }
}
