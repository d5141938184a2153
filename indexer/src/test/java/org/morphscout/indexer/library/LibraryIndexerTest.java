package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.WriterLock;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/** Indexing end to end on generated files: new, unchanged, changed, moved, deleted and unreadable files. */
class LibraryIndexerTest {
  private static final long SEED = 4242;

  @TempDir Path tmp;
  Path root;
  Path catalogDir;

  @BeforeEach
  void writeLibrary() throws IOException {
    root = Files.createDirectories(tmp.resolve("library/vessels"));
    catalogDir = tmp.resolve("catalog");
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 6, Archetype.VASE, Archetype.BOTTLE);
    FamilyFolders.writePngs(family, root, "vessel-");
    byte[] jpeg = jpegBytes(family.get(0));
    Files.write(root.resolve("cut-short.jpg"), Arrays.copyOf(jpeg, jpeg.length / 2));
    Files.writeString(root.resolve("notes.jpg"), "not a picture at all");
  }

  private static byte[] jpegBytes(FamilyItem item) throws IOException {
    java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
    java.awt.image.BufferedImage rgb = new java.awt.image.BufferedImage(item.image().getWidth(),
        item.image().getHeight(), java.awt.image.BufferedImage.TYPE_INT_RGB);
    rgb.createGraphics().drawImage(item.image(), 0, 0, null);
    ImageIO.write(rgb, "jpg", out);
    return out.toByteArray();
  }

  private IndexReport index(Library library) throws IOException {
    return new LibraryIndexer(library, AnalysisSetup.defaults(), IndexOptions.defaults().withThreads(2).withNeighbours(4))
        .index(List.of(tmp.resolve("library")), ProgressListener.NONE, CancellationToken.none());
  }

  @Test
  void indexesIncrementallyAndKeepsIdentitiesAndDecisions() throws IOException {
    try (Library library = Library.open(catalogDir)) {
      IndexReport first = index(library);
      assertThat(first.indexed()).isEqualTo(6);
      assertThat(first.failures()).extracting(IndexReport.FileFailure::reason)
          .containsExactlyInAnyOrder("truncated JPEG data", "not an image");
      assertThat(first.failures()).allSatisfy(f -> assertThat(f.path()).startsWith(root.toString()));
      assertThat(library.images().countsByStatus()).containsEntry(ImageStatus.READY, 6)
          .containsEntry(ImageStatus.FAILED, 2);
      assertCatalogAndIndexAgree(library);
      assertThat(library.neighbours().all()).isNotEmpty();

      IndexReport again = index(library);
      assertThat(again.indexed()).isZero();
      assertThat(again.unchanged()).isEqualTo(8);

      ImageRow v0 = library.require(root.resolve("vessel-0.png").toString());
      ImageRow v1 = library.require(root.resolve("vessel-1.png").toString());
      library.decisions().decide(v0.id(), v1.id(), DecisionKind.APPROVED, "keep these");

      // Move and rename one file inside the root: same identity, decision follows it.
      Path moved = Files.createDirectories(root.resolve("renamed")).resolve("first-vessel.png");
      Files.move(root.resolve("vessel-0.png"), moved);
      IndexReport afterMove = index(library);
      assertThat(afterMove.moved()).isEqualTo(1);
      assertThat(afterMove.indexed()).isZero();
      ImageRow movedRow = library.require(moved.toString());
      assertThat(movedRow.id()).isEqualTo(v0.id());
      assertThat(movedRow.status()).isEqualTo(ImageStatus.READY);
      assertThat(library.decisions().find(v0.id(), v1.id())).get()
          .satisfies(d -> assertThat(d.pathA()).isEqualTo(moved.toString()));

      // Delete the other image of the pair: marked missing, never dropped with its decision.
      Files.delete(root.resolve("vessel-1.png"));
      IndexReport afterDelete = index(library);
      assertThat(afterDelete.missing()).isEqualTo(1);
      assertThat(library.images().byId(v1.id())).get().extracting(ImageRow::status).isEqualTo(ImageStatus.MISSING);
      assertThat(library.decisions().all()).hasSize(1);
      assertCatalogAndIndexAgree(library);

      // Change a file's content: analysed again, same identity.
      ImageRow v2 = library.require(root.resolve("vessel-2.png").toString());
      List<FamilyItem> other = TestFamilies.silhouetteFamily(SEED + 1, 2, Archetype.BOWL, Archetype.CUP);
      ImageIO.write(other.get(0).image(), "png", root.resolve("vessel-2.png").toFile());
      Files.setLastModifiedTime(root.resolve("vessel-2.png"),
          java.nio.file.attribute.FileTime.fromMillis(System.currentTimeMillis() + 5000));
      IndexReport afterChange = index(library);
      assertThat(afterChange.indexed()).isEqualTo(1);
      assertThat(library.require(root.resolve("vessel-2.png").toString()).id()).isEqualTo(v2.id());
      assertThat(library.require(root.resolve("vessel-2.png").toString()).contentHash()).isNotEqualTo(v2.contentHash());

      // The deleted file comes back: it is recognised by its content and is ready again.
      ImageIO.write(TestFamilies.silhouetteFamily(SEED, 6, Archetype.VASE, Archetype.BOTTLE).get(1).image(), "png",
          root.resolve("vessel-1.png").toFile());
      index(library);
      assertThat(library.images().byId(v1.id())).get().extracting(ImageRow::status).isEqualTo(ImageStatus.READY);
      assertCatalogAndIndexAgree(library);
    }
  }

  @Test
  void aSecondIndexerOnTheSameCatalogIsToldItIsInUse() throws IOException {
    try (Library library = Library.open(catalogDir); WriterLock held = WriterLock.acquire(catalogDir)) {
      assertThatThrownBy(() -> index(library)).isInstanceOf(MorphscoutException.class)
          .hasMessageContaining("catalog in use");
      assertThat(library.images().all()).isEmpty();
    }
  }

  @Test
  void aMissingRootIsAClearError() throws IOException {
    try (Library library = Library.open(catalogDir)) {
      assertThatThrownBy(() -> new LibraryIndexer(library, AnalysisSetup.defaults(), IndexOptions.defaults())
          .index(List.of(tmp.resolve("nowhere")), ProgressListener.NONE, CancellationToken.none()))
          .isInstanceOf(MorphscoutException.class).hasMessageContaining("folder not found")
          .hasMessageContaining("nowhere");
    }
  }

  @Test
  void lostVectorIndexIsRestoredFromTheCatalog() throws IOException {
    try (Library library = Library.open(catalogDir)) {
      index(library);
      // Simulate a crash that lost the vector index's last commits: wipe it.
      try (LuceneVectorIndex idx = LuceneVectorIndex.open(library.catalog().vectorDir(),
          org.morphscout.indexer.vector.LuceneIndexOptions.defaults())) {
        idx.clear();
        idx.commit();
      }
      IndexReport report = index(library);
      assertThat(report.vectorsRestored()).isEqualTo(6);
      assertCatalogAndIndexAgree(library);
    }
  }

  @Test
  void filesThatTimedOutAreTriedAgainButUnreadableOnesAreNot() throws IOException {
    try (Library library = Library.open(catalogDir)) {
      index(library);
      ImageRow v4 = library.require(root.resolve("vessel-4.png").toString());
      // The kind decides, not the wording: a reworded time-out is still tried again.
      library.images().markFailed(v4.id(), "took too long this time", FailureKind.TIMED_OUT.name(), 0);
      ImageRow v5 = library.require(root.resolve("vessel-5.png").toString());
      // A failure recorded before failures had a kind is read by its reason, as that release wrote it.
      library.images().markFailed(v5.id(), "timed out: reading and analysing took more than 60 s", null, 0);
      IndexReport again = index(library);
      assertThat(again.indexed()).isEqualTo(2);
      assertThat(library.images().byId(v5.id())).get().extracting(ImageRow::status).isEqualTo(ImageStatus.READY);
      assertThat(library.images().byId(v4.id())).get().extracting(ImageRow::status).isEqualTo(ImageStatus.READY);
      // The truncated JPEG and the text file stay failed, are not analysed again, and are still reported.
      assertThat(again.failures()).extracting(IndexReport.FileFailure::reason)
          .containsExactlyInAnyOrder("truncated JPEG data", "not an image");
      ImageRow truncated = library.images().failures().stream()
          .filter(f -> f.reason().equals("truncated JPEG data")).findFirst()
          .flatMap(f -> library.images().byPath(f.path())).orElseThrow();
      assertThat(library.images().failureOf(truncated.id())).get()
          .extracting(org.morphscout.indexer.catalog.ImageStore.StoredFailure::kind).isEqualTo("TRUNCATED");
    }
  }

  @Test
  void queriesBringAnIndexThatLostImagesInLineWithTheCatalog() throws IOException {
    try (Library library = Library.open(catalogDir)) {
      index(library);
      long lost = library.require(root.resolve("vessel-3.png").toString()).id();
      try (LuceneVectorIndex idx = LuceneVectorIndex.open(library.catalog().vectorDir(),
          org.morphscout.indexer.vector.LuceneIndexOptions.defaults())) {
        idx.delete(lost);
        idx.commit();
      }
      try (QueryContext context = new QueryContext(library, AnalysisSetup.defaults())) {
        assertThat(context.index().ids()).contains(lost);
      }
      assertCatalogAndIndexAgree(library);
    }
  }

  private static void assertCatalogAndIndexAgree(Library library) throws IOException {
    Set<Long> ready = new HashSet<>();
    library.images().withStatus(ImageStatus.READY).forEach(r -> ready.add(r.id()));
    try (LuceneVectorIndex idx = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir())) {
      assertThat(idx.ids()).isEqualTo(ready);
    }
  }
}
