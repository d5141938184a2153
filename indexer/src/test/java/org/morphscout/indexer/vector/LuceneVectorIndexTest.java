package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.values.VectorSegments;
import org.morphscout.indexer.vector.VectorIndex.Field;
import org.morphscout.indexer.vector.VectorIndex.Hit;

/** The behavioural contract on the Lucene index (float graphs), plus what only a folder on disk can show. */
class LuceneVectorIndexTest extends VectorIndexContractTest {
  @TempDir Path temp;

  private Path dir() {
    return temp.resolve("vectors");
  }

  @Override
  protected VectorIndex newIndex() throws IOException {
    return LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults());
  }

  @Test
  void reopeningKeepsCommittedDataAndDropsUncommitted() throws IOException {
    float[][] vectors = fill(0, 50);
    index.upsert(1000, TestVectors.randomUnit(random, APPEARANCE_DIM), null);
    index.close();
    index = LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults());
    assertThat(index.ids()).hasSize(50).doesNotContain(1000L);
    assertThat(index.search(Field.APPEARANCE, vectors[17], 1, Set.of())).extracting(Hit::id).containsExactly(17L);
    assertThatThrownBy(() -> index.upsert(2000, TestVectors.randomUnit(random, APPEARANCE_DIM + 1), null))
        .as("the dimension survives a reopen")
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("expects " + APPEARANCE_DIM);
  }

  @Test
  void theDirectGraphSearchFindsWhatTheQueryFinds() throws IOException {
    // The direct per-segment search against the plain reference (Lucene's KnnFloatVectorQuery), on four segments
    // with replaced and deleted images, with and without exclusions. Per segment both run the same graph search, so
    // the answers agree exactly; only the merging of segments' lists differs in code.
    float[][] vectors = new float[800][];
    for (int batch = 0; batch < 4; batch++) {
      float[][] part = fill(batch * 200L, 200); // each commit writes a segment
      System.arraycopy(part, 0, vectors, batch * 200, 200);
    }
    for (long id = 5; id < 800; id += 37) {
      index.delete(id);
    }
    for (long id = 11; id < 800; id += 53) {
      vectors[(int) id] = TestVectors.randomUnit(random, APPEARANCE_DIM);
      index.upsert(id, vectors[(int) id], TestVectors.randomUnit(random, SHAPE_DIM));
    }
    index.commit();
    LuceneVectorIndex lucene = (LuceneVectorIndex) index;
    for (int q = 0; q < 40; q++) {
      float[] query = TestVectors.randomUnit(random, APPEARANCE_DIM);
      int k = 1 + q % 25;
      Set<Long> exclude = q % 2 == 0 ? Set.of() : Set.of((long) q, (long) q + 100, 999L, (long) q * 7 % 800);
      List<Hit> direct = lucene.search(Field.APPEARANCE, query, k, exclude, true);
      List<Hit> reference = lucene.search(Field.APPEARANCE, query, k, exclude, false);
      assertThat(direct).as(seed() + ", query " + q).isEqualTo(reference).hasSize(k);
      assertThat(direct).extracting(Hit::id).noneMatch(exclude::contains).noneMatch(id -> id % 37 == 5);
    }
    assertThat(lucene.search(Field.APPEARANCE, vectors[11], 1, Set.of())).extracting(Hit::id).containsExactly(11L);
  }

  @Test
  void aSecondWriterOnTheSameFolderIsToldTheCatalogIsInUse() {
    assertThatThrownBy(() -> LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults()))
        .isInstanceOf(MorphscoutException.class)
        .hasMessage("catalog in use by another Morphscout process (vector index locked): " + dir());
  }

  @Test
  void theFolderCanBeOpenedAgainAfterClose() throws IOException {
    fill(0, 3);
    index.close();
    index = LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults().withGraph(8, 50));
    assertThat(((LuceneVectorIndex) index).count()).isEqualTo(3);
  }

  @Test
  void aReadOnlyIndexSeesNewCommitsAfterRefresh() throws IOException {
    float[][] first = fill(0, 10);
    try (LuceneVectorIndex reader = LuceneVectorIndex.openReadOnly(dir())) {
      assertThat(reader.isReadOnly()).isTrue();
      assertThat(reader.ids()).hasSize(10);
      assertThat(reader.search(Field.APPEARANCE, first[4], 1, Set.of())).extracting(Hit::id).containsExactly(4L);

      fill(10, 5);
      index.delete(0);
      index.commit();
      assertThat(reader.ids()).as("no refresh yet").hasSize(10);
      assertThat(reader.refresh()).isTrue();
      assertThat(reader.ids()).hasSize(14).doesNotContain(0L);
      assertThat(reader.refresh()).as("nothing new").isFalse();

      assertThatThrownBy(() -> reader.upsert(99, first[0], null))
          .isInstanceOf(MorphscoutException.class)
          .hasMessageContaining("read-only");
      assertThatThrownBy(reader::clear).isInstanceOf(MorphscoutException.class);
    }
  }

  @Test
  void aReadOnlyOpenWithoutAnIndexSaysSo() {
    Path nowhere = temp.resolve("missing");
    assertThatThrownBy(() -> LuceneVectorIndex.openReadOnly(nowhere))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("No vector index at " + nowhere);
  }

  @Test
  void aFreshWriterMakesTheFolderReadableAtOnce() throws IOException {
    try (LuceneVectorIndex reader = LuceneVectorIndex.openReadOnly(dir())) {
      assertThat(reader.ids()).isEmpty();
      List<Hit> hits = reader.search(Field.SHAPE, TestVectors.randomUnit(random, SHAPE_DIM), 3, Set.of());
      assertThat(hits).isEmpty();
    }
  }

  @Test
  void refreshOnTheWriterDoesNotExposeUncommittedChanges() throws IOException {
    fill(0, 5);
    index.upsert(99, TestVectors.randomUnit(random, APPEARANCE_DIM), null);
    assertThat(((LuceneVectorIndex) index).refresh()).isFalse();
    assertThat(index.ids()).hasSize(5).doesNotContain(99L);
  }

  @Test
  void vectorsLongerThanLuceneSupportsAreRejectedClearly() {
    // Lucene's per-field vector formats accept at most 1024 dimensions (KnnVectorsFormat.DEFAULT_MAX_DIMENSIONS).
    assertThatThrownBy(() -> index.upsert(3, TestVectors.randomUnit(random, 1025), null))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("Image 3")
        .hasMessageContaining("1025 dimensions")
        .hasMessageContaining("at most 1024");
  }

  @Test
  void mergingIntoOneSegmentKeepsEveryImageAndItsNearestNeighbour() throws IOException {
    LuceneVectorIndex lucene = (LuceneVectorIndex) index;
    float[][] vectors = new float[100][];
    for (int batch = 0; batch < 4; batch++) {
      System.arraycopy(fill(batch * 25L, 25), 0, vectors, batch * 25, 25); // each commit writes a segment
    }
    lucene.delete(3);
    lucene.commit();
    assertThat(lucene.segments()).extracting(VectorSegments::count, VectorSegments::images,
        VectorSegments::outsideLargest, VectorSegments::deleted)
        .containsExactly(4, 99, 74, 1); // the largest segment is one of the three untouched ones (25 live)

    assertThat(lucene.mergeIntoOne(() -> false)).isTrue();
    assertThat(lucene.segments()).extracting(VectorSegments::count, VectorSegments::images,
        VectorSegments::deleted).containsExactly(1, 99, 0);
    assertThat(lucene.ids()).hasSize(99).doesNotContain(3L);
    for (long id : new long[] {0, 26, 51, 99}) {
      assertThat(lucene.search(Field.APPEARANCE, vectors[(int) id], 1, Set.of())).extracting(Hit::id)
          .containsExactly(id);
    }
    lucene.close();
    index = LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults());
    assertThat(((LuceneVectorIndex) index).segments().count()).as("the merge was committed").isEqualTo(1);
  }

  @Test
  void aStoppedMergeLeavesTheLastCommitAsItWas() throws IOException {
    LuceneVectorIndex lucene = (LuceneVectorIndex) index;
    for (int batch = 0; batch < 3; batch++) {
      fill(batch * 30L, 30);
    }
    assertThat(lucene.mergeIntoOne(() -> true)).isFalse();
    lucene.close();
    index = LuceneVectorIndex.open(dir(), LuceneIndexOptions.defaults());
    LuceneVectorIndex reopened = (LuceneVectorIndex) index;
    assertThat(reopened.segments().count()).isEqualTo(3);
    assertThat(reopened.ids()).hasSize(90);
  }
}
