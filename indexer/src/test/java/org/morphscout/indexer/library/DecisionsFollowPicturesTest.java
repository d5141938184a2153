package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;

/** A decision belongs to the pictures judged (content hashes), never to the path a picture happened to have. */
class DecisionsFollowPicturesTest {
  private static final long SEED = 1818;

  @TempDir Path tmp;

  @Test
  void aDifferentPictureAtAnOldPathDoesNotInheritItsDecisions() throws IOException {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 3, Archetype.VASE, Archetype.BOTTLE);
    Path a = write(root.resolve("a.png"), family.get(0));
    Path c = write(root.resolve("c.png"), family.get(1));
    Path d = write(root.resolve("d.png"), family.get(2));
    byte[] aBytes = Files.readAllBytes(a);
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      index(library);
      long ia = row(library, a).id();
      long ic = row(library, c).id();
      library.decisions().decide(ia, ic, DecisionKind.APPROVED, "smooth");

      // The trial from the report: delete a, rename d to a, index.
      Files.delete(a);
      Files.move(d, a);
      IndexReport report = index(library);
      assertThat(report.replaced()).isEqualTo(1);
      assertThat(report.missing()).isEqualTo(1);
      assertThat(library.decisions().find(row(library, a).id(), ic)).as("d's picture at a's old path").isEmpty();
      assertThat(library.decisions().all()).singleElement().satisfies(dec -> {
        assertThat(dec.imageA() == -1 ? dec.pathA() : dec.pathB()).isEqualTo(a.toString());
        assertThat(dec.imageA() == -1 || dec.imageB() == -1).as("a's picture is not in the catalog").isTrue();
      });

      // a's picture comes back under another name: the decision is its own again.
      Path back = Files.write(root.resolve("a-restored.png"), aBytes);
      index(library);
      long restored = row(library, back).id();
      assertThat(library.decisions().find(restored, ic)).get()
          .satisfies(dec -> assertThat(dec.note()).isEqualTo("smooth"));
      assertThat(library.decisions().all()).singleElement()
          .satisfies(dec -> assertThat(List.of(dec.pathA(), dec.pathB())).contains(back.toString(), c.toString()));

      // Forgetting works through the images holding the pictures.
      assertThat(library.decisions().clear(ic, restored)).isTrue();
      assertThat(library.decisions().count()).isZero();
    }
  }

  private static ImageRow row(Library library, Path p) {
    return library.images().byPath(p.toAbsolutePath().normalize().toString()).orElseThrow();
  }

  private static Path write(Path file, FamilyItem item) throws IOException {
    ImageIO.write(item.image(), "png", file.toFile());
    return file;
  }

  private IndexReport index(Library library) throws IOException {
    return new LibraryIndexer(library, AnalysisSetup.defaults(), IndexOptions.defaults().withThreads(1)
        .withNeighbours(2)).index(List.of(tmp.resolve("library")), ProgressListener.NONE, CancellationToken.none());
  }
}
