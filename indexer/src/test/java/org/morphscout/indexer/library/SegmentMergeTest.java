package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.testing.CatalogChecks;
import org.morphscout.indexer.values.VectorSegments;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/** When an indexing run leaves the vector index split into several graphs, and when it merges them into one. */
class SegmentMergeTest {
  private static final long SEED = 20261205L;

  @TempDir Path tmp;

  @Test
  void mergesFromATenthOfTheImagesOutsideTheLargestSegment() {
    assertThat(SegmentMerge.worthMerging(new VectorSegments(1, 1000, 0, 50))).isFalse();
    assertThat(SegmentMerge.worthMerging(new VectorSegments(2, 1000, 99, 0))).isFalse();
    assertThat(SegmentMerge.worthMerging(new VectorSegments(2, 1000, 100, 0))).isTrue();
    assertThat(SegmentMerge.worthMerging(new VectorSegments(5, 1000, 900, 3))).isTrue();
    // No overflow at a catalog of billions of images.
    assertThat(SegmentMerge.worthMerging(
        new VectorSegments(3, 1_900_000_000, 400_000_000, 0))).isTrue();
  }

  @Test
  void indexingRunsLeaveOneGraphUnlessLittleWasAddedOutsideIt() throws IOException {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> cups = TestFamilies.silhouetteFamily(SEED, 20, Archetype.CUP, Archetype.BOWL);
    List<FamilyItem> later = TestFamilies.silhouetteFamily(SEED + 1, 4, Archetype.VASE, Archetype.BOTTLE);
    FamilyFolders.writePngs(cups, root, "cup-");
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      // A first run committing every 5 images writes several segments; it ends merged into one.
      index(library, 5);
      assertThat(segments(library)).extracting(VectorSegments::count, VectorSegments::images)
          .containsExactly(1, 20);

      // One image more: 1 of 21 outside the largest segment, under a tenth, so the new segment is kept.
      writeOne(later.get(0), root.resolve("vase-0.png"));
      index(library, 256);
      assertThat(segments(library)).extracting(VectorSegments::count,
          VectorSegments::outsideLargest).containsExactly(2, 1);

      // Three more: 4 of 24 outside it, over a tenth: merged into one again, every image kept.
      for (int i = 1; i < later.size(); i++) {
        writeOne(later.get(i), root.resolve("vase-" + i + ".png"));
      }
      index(library, 256);
      assertThat(segments(library)).extracting(VectorSegments::count, VectorSegments::images)
          .containsExactly(1, 24);
      CatalogChecks.catalogAndIndexAgree(library, "after the merge");
      CatalogChecks.noDuplicatesOrOrphans(library, "after the merge");
    }
  }

  @Test
  void aCancelledRunStopsTheMergeAndKeepsTheLastCommit() throws IOException {
    Path dir = tmp.resolve("vectors");
    java.util.Random random = new java.util.Random(SEED);
    try (LuceneVectorIndex index = LuceneVectorIndex.open(dir, LuceneIndexOptions.defaults())) {
      for (int segment = 0; segment < 2; segment++) {
        for (int i = 0; i < 20; i++) {
          float[] v = new float[16];
          for (int d = 0; d < v.length; d++) {
            v[d] = (float) random.nextGaussian();
          }
          index.upsert(segment * 100L + i, v, null);
        }
        index.commit();
      }
      CancellationToken cancel = new CancellationToken();
      cancel.cancel();
      assertThatThrownBy(() -> SegmentMerge.mergeIfWorthIt(index, ProgressListener.NONE, cancel))
          .isInstanceOf(CancellationToken.CancelledException.class);
    }
    try (LuceneVectorIndex reopened = LuceneVectorIndex.openReadOnly(dir)) {
      assertThat(reopened.segments()).extracting(VectorSegments::count, VectorSegments::images)
          .containsExactly(2, 40);
    }
  }

  private void index(Library library, int commitEvery) throws IOException {
    IndexOptions options = IndexOptions.defaults().withThreads(2).withNeighbours(4).withCommitEvery(commitEvery);
    new LibraryIndexer(library, AnalysisSetup.defaults(), options)
        .index(List.of(tmp.resolve("library")), ProgressListener.NONE, CancellationToken.none());
  }

  private static void writeOne(FamilyItem item, Path file) throws IOException {
    javax.imageio.ImageIO.write(item.image(), "png", file.toFile());
  }

  private static VectorSegments segments(Library library) throws IOException {
    try (LuceneVectorIndex index = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir())) {
      return index.segments();
    }
  }
}
