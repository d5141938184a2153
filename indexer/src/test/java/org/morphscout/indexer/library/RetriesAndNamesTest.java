package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.ImageStatus;

/** A lower pixel cap's refusals are retried when the cap is raised; undecodable file names are reported, not lost. */
class RetriesAndNamesTest {
  private static final long SEED = 1819;

  @TempDir Path tmp;

  private IndexReport index(Library library, long maxPixels) throws IOException {
    AnalysisSetup setup = AnalysisSetup.defaults().withDecode(DecodeOptions.defaults().withMaxPixels(maxPixels));
    return new LibraryIndexer(library, setup, IndexOptions.defaults().withThreads(1).withNeighbours(2))
        .index(List.of(tmp.resolve("library")), ProgressListener.NONE, CancellationToken.none());
  }

  @Test
  void raisingTheMegapixelCapRetriesWhatItRefused() throws IOException {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 2, Archetype.VASE, Archetype.JUG);
    FamilyFolders.writePngs(family, root, "v");
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      IndexReport low = index(library, 1000);
      assertThat(low.failures()).hasSize(2).allSatisfy(f -> assertThat(f.reason()).startsWith("image too large"));
      assertThat(index(library, 1000).indexed()).as("the same cap: still refused, not retried").isZero();
      IndexReport raised = index(library, DecodeOptions.defaults().maxPixels());
      assertThat(raised.indexed()).isEqualTo(2);
      assertThat(raised.failures()).isEmpty();
      assertThat(library.images().countsByStatus()).containsEntry(ImageStatus.READY, 2);
    }
  }

  @Test
  void aFileNameThatIsNotUtf8IsReportedWithHowToFixIt() throws Exception {
    Path root = Files.createDirectories(tmp.resolve("library"));
    FamilyItem item = TestFamilies.silhouetteFamily(SEED, 2, Archetype.VASE, Archetype.JUG).get(0);
    Path good = root.resolve("good.png");
    ImageIO.write(item.image(), "png", good.toFile());
    // Java cannot spell a name that is not UTF-8, so the shell makes it: "bad", byte 0xFF, ".png".
    Process p = new ProcessBuilder("sh", "-c", "cp good.png \"$(printf 'bad\\377.png')\"").directory(root.toFile())
        .start();
    assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
    assertThat(p.exitValue()).isZero();
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      IndexReport report = index(library, DecodeOptions.defaults().maxPixels());
      assertThat(report.indexed()).isEqualTo(1);
      assertThat(report.failures()).singleElement()
          .satisfies(f -> assertThat(f.reason()).contains("not valid text", "rename the file"));
      assertThat(library.images().all()).extracting(r -> r.path()).containsExactly(good.toString());
    }
  }
}
