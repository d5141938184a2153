package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.vector.VectorIndex.Field;
import org.morphscout.indexer.vector.VectorIndex.Hit;

/**
 * Behaviour every {@link VectorIndex} must show, run against each implementation by a subclass. Rankings and
 * similarities are checked against an exact scan written independently in {@link TestVectors} (cosine by its
 * textbook definition); the sets are small enough that HNSW must be exact on them.
 */
abstract class VectorIndexContractTest {
  static final int APPEARANCE_DIM = 12;
  static final int SHAPE_DIM = 5;

  protected VectorIndex index;
  protected Random random;

  /** A fresh, empty index; the subclass owns any folder it needs. */
  protected abstract VectorIndex newIndex() throws IOException;

  @BeforeEach
  void setUp() throws IOException {
    random = new Random(TestVectors.SEED);
    index = newIndex();
  }

  @AfterEach
  void tearDown() throws IOException {
    index.close();
  }

  protected String seed() {
    return "seed=" + TestVectors.SEED;
  }

  /** Indexes count images with ids base..base+count-1, both vectors random; returns the appearance vectors. */
  protected float[][] fill(long base, int count) throws IOException {
    float[][] appearance = TestVectors.randomUnits(random, count, APPEARANCE_DIM);
    for (int i = 0; i < count; i++) {
      index.upsert(base + i, appearance[i], TestVectors.randomUnit(random, SHAPE_DIM));
    }
    index.commit();
    return appearance;
  }

  @Test
  void searchReturnsTheExactNearestNeighboursBestFirst() throws IOException {
    float[][] vectors = fill(100, 300);
    for (int q = 0; q < 20; q++) {
      float[] query = TestVectors.randomUnit(random, APPEARANCE_DIM);
      List<Hit> hits = index.search(Field.APPEARANCE, query, 10, Set.of());
      List<Long> expected = TestVectors.exactTop(vectors, 100, query, 10, Set.of());
      assertThat(hits).extracting(Hit::id).as(seed()).containsExactlyElementsOf(expected);
      for (Hit hit : hits) {
        double exact = TestVectors.cosine(vectors[(int) (hit.id() - 100)], query);
        assertThat((double) hit.similarity()).as(seed()).isCloseTo(exact, within(1e-5));
      }
    }
  }

  @Test
  void similarityIsCosineWhateverTheVectorLengths() throws IOException {
    float[] a = {3, 0, 0, 0, 0};
    float[] b = {1, 1, 0, 0, 0};
    float[] c = {-2, 0, 0, 0, 0};
    index.upsert(1, null, a);
    index.upsert(2, null, b);
    index.upsert(3, null, c);
    index.commit();
    List<Hit> hits = index.search(Field.SHAPE, new float[] {0.5f, 0, 0, 0, 0}, 3, Set.of());
    // cos 0 = 1, cos 45 degrees = 1/sqrt(2), cos 180 degrees = -1 (textbook values).
    assertThat(hits).extracting(Hit::id).containsExactly(1L, 2L, 3L);
    assertThat(hits.get(0).similarity()).isCloseTo(1f, within(1e-6f));
    assertThat(hits.get(1).similarity()).isCloseTo((float) (1 / Math.sqrt(2)), within(1e-6f));
    assertThat(hits.get(2).similarity()).isCloseTo(-1f, within(1e-6f));
    assertThat(hits).allSatisfy(h -> assertThat(h.similarity()).isBetween(-1f, 1f));
  }

  @Test
  void changesAreInvisibleUntilCommit() throws IOException {
    float[] v = TestVectors.randomUnit(random, APPEARANCE_DIM);
    index.upsert(7, v, null);
    assertThat(index.ids()).isEmpty();
    assertThat(index.search(Field.APPEARANCE, v, 5, Set.of())).isEmpty();
    index.commit();
    assertThat(index.ids()).containsExactly(7L);
    index.delete(7);
    assertThat(index.ids()).containsExactly(7L);
    index.commit();
    assertThat(index.ids()).isEmpty();
  }

  @Test
  void upsertReplacesTheVectorsOfAnImage() throws IOException {
    float[] v = TestVectors.randomUnit(random, APPEARANCE_DIM);
    float[] w = TestVectors.randomUnit(random, APPEARANCE_DIM);
    float[] s = TestVectors.randomUnit(random, SHAPE_DIM);
    index.upsert(1, v, s);
    index.commit();
    index.upsert(1, w, null);
    index.commit();
    assertThat(index.ids()).containsExactly(1L);
    List<Hit> hits = index.search(Field.APPEARANCE, v, 5, Set.of());
    assertThat(hits).hasSize(1);
    assertThat((double) hits.get(0).similarity()).as(seed()).isCloseTo(TestVectors.cosine(v, w), within(1e-5));
    assertThat(index.search(Field.SHAPE, s, 5, Set.of())).as("shape left out on replace").isEmpty();
  }

  @Test
  void deleteRemovesAnImageAndIgnoresUnknownIds() throws IOException {
    float[][] vectors = fill(0, 20);
    index.delete(3);
    index.delete(999);
    index.commit();
    assertThat(index.ids()).hasSize(19).doesNotContain(3L);
    List<Hit> hits = index.search(Field.APPEARANCE, vectors[3], 20, Set.of());
    assertThat(hits).hasSize(19).extracting(Hit::id).doesNotContain(3L);
  }

  @Test
  void upsertWithNoVectorsRemovesTheImage() throws IOException {
    fill(0, 3);
    index.upsert(1, null, null);
    index.commit();
    assertThat(index.ids()).containsExactlyInAnyOrder(0L, 2L);
  }

  @Test
  void excludedIdsAreSkippedAndTheNextBestTakeTheirPlace() throws IOException {
    float[][] vectors = fill(0, 200);
    float[] query = TestVectors.randomUnit(random, APPEARANCE_DIM);
    List<Long> top = TestVectors.exactTop(vectors, 0, query, 5, Set.of());
    Set<Long> exclude = new HashSet<>(top.subList(0, 3));
    List<Hit> hits = index.search(Field.APPEARANCE, query, 5, exclude);
    assertThat(hits).extracting(Hit::id).as(seed())
        .containsExactlyElementsOf(TestVectors.exactTop(vectors, 0, query, 5, exclude));
    Set<Long> all = new HashSet<>();
    for (long id = 0; id < 200; id++) {
      all.add(id);
    }
    assertThat(index.search(Field.APPEARANCE, query, 5, all)).isEmpty();
  }

  @Test
  void anImageWithoutAFieldIsNotFoundOnThatField() throws IOException {
    float[] s = TestVectors.randomUnit(random, SHAPE_DIM);
    index.upsert(1, null, s);
    index.upsert(2, TestVectors.randomUnit(random, APPEARANCE_DIM), null);
    index.commit();
    assertThat(index.ids()).containsExactlyInAnyOrder(1L, 2L);
    assertThat(index.search(Field.SHAPE, s, 5, Set.of())).extracting(Hit::id).containsExactly(1L);
    assertThat(index.search(Field.APPEARANCE, TestVectors.randomUnit(random, APPEARANCE_DIM), 5, Set.of()))
        .extracting(Hit::id).containsExactly(2L);
  }

  @Test
  void kLargerThanTheIndexReturnsEverythingAndAnEmptyIndexNothing() throws IOException {
    float[] query = TestVectors.randomUnit(random, APPEARANCE_DIM);
    assertThat(index.search(Field.APPEARANCE, query, 10, Set.of())).isEmpty();
    fill(0, 4);
    assertThat(index.search(Field.APPEARANCE, query, 10, Set.of())).hasSize(4);
    assertThatThrownBy(() -> index.search(Field.APPEARANCE, query, 0, Set.of()))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void aVectorOfTheWrongDimensionIsRejectedNamingBothDimensions() throws IOException {
    fill(0, 2);
    float[] good = TestVectors.randomUnit(random, APPEARANCE_DIM);
    float[] badShape = TestVectors.randomUnit(random, SHAPE_DIM + 3);
    assertThatThrownBy(() -> index.upsert(42, good, badShape))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("Image 42")
        .hasMessageContaining("shape")
        .hasMessageContaining("has " + (SHAPE_DIM + 3) + " dimensions")
        .hasMessageContaining("expects " + SHAPE_DIM);
    index.commit();
    assertThat(index.ids()).as("a rejected upsert changes nothing").doesNotContain(42L);
    assertThatThrownBy(() -> index.search(Field.APPEARANCE, TestVectors.randomUnit(random, APPEARANCE_DIM - 1), 3, Set.of()))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("has " + (APPEARANCE_DIM - 1) + " dimensions")
        .hasMessageContaining(APPEARANCE_DIM + "-dimensional");
  }

  @Test
  void theFirstVectorFixesTheDimensionEvenBeforeCommit() throws IOException {
    index.upsert(1, new float[] {1, 2, 3}, null);
    assertThatThrownBy(() -> index.upsert(2, new float[] {1, 2}, null))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("has 2 dimensions")
        .hasMessageContaining("expects 3");
  }

  @Test
  void zeroAndNonFiniteVectorsAreRejected() throws IOException {
    assertThatThrownBy(() -> index.upsert(5, new float[APPEARANCE_DIM], null))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("Image 5")
        .hasMessageContaining("zero length");
    float[] nan = new float[SHAPE_DIM];
    nan[2] = Float.NaN;
    assertThatThrownBy(() -> index.upsert(6, null, nan))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("NaN");
    fill(0, 2);
    assertThatThrownBy(() -> index.search(Field.SHAPE, new float[SHAPE_DIM], 1, Set.of()))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("shape query vector has zero length");
  }

  @Test
  void clearRemovesEverythingAndForgetsTheDimensions() throws IOException {
    fill(0, 30);
    index.clear();
    index.commit();
    assertThat(index.ids()).isEmpty();
    float[] longer = TestVectors.randomUnit(random, APPEARANCE_DIM * 2);
    index.upsert(1, longer, null);
    index.commit();
    assertThat(index.search(Field.APPEARANCE, longer, 1, Set.of())).extracting(Hit::id).containsExactly(1L);
  }

  @Test
  void searchesRunConcurrentlyWithWritesWithoutErrors() throws Exception {
    fill(0, 100);
    int total = 600;
    ConcurrentLinkedQueue<Throwable> errors = new ConcurrentLinkedQueue<>();
    AtomicBoolean writing = new AtomicBoolean(true);
    AtomicInteger searches = new AtomicInteger();
    CountDownLatch done = new CountDownLatch(3);
    CountDownLatch searchersRunning = new CountDownLatch(2);
    ThreadFactory threads = Thread.ofPlatform().name("vector-contract-test-", 0).factory();
    Random writerRandom = new Random(TestVectors.SEED + 1);
    threads.newThread(() -> {
      try {
        searchersRunning.await(30, TimeUnit.SECONDS);
        for (int i = 100; i < total; i++) {
          if (i == total / 2) {
            awaitMoreSearches(searches); // guarantees searches overlap the writes, however threads are scheduled
          }
          index.upsert(i, TestVectors.randomUnit(writerRandom, APPEARANCE_DIM), null);
          if (i % 7 == 0) {
            index.delete(i - 50);
            index.upsert(i - 50, TestVectors.randomUnit(writerRandom, APPEARANCE_DIM), null);
          }
          if (i % 200 == 0) {
            index.commit();
          }
        }
        index.commit();
      } catch (Throwable t) {
        errors.add(t);
      } finally {
        writing.set(false);
        done.countDown();
      }
    }).start();
    for (int t = 0; t < 2; t++) {
      Random searchRandom = new Random(TestVectors.SEED + 2 + t);
      threads.newThread(() -> {
        try {
          while (writing.get()) {
            List<Hit> hits =
                index.search(Field.APPEARANCE, TestVectors.randomUnit(searchRandom, APPEARANCE_DIM), 10, Set.of(3L));
            if (hits.size() != 10 || hits.stream().anyMatch(h -> h.id() == 3L)) {
              throw new AssertionError("bad result during writes: " + hits);
            }
            index.ids();
            searches.incrementAndGet();
            searchersRunning.countDown();
          }
        } catch (Throwable e) {
          errors.add(e);
        } finally {
          done.countDown();
        }
      }).start();
    }
    assertThat(done.await(60, TimeUnit.SECONDS)).as("threads finished").isTrue();
    assertThat(new ArrayList<>(errors)).as(seed()).isEmpty();
    assertThat(index.ids()).hasSize(total);
  }

  private static void awaitMoreSearches(AtomicInteger searches) throws InterruptedException {
    int before = searches.get();
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
    while (searches.get() < before + 3 && System.nanoTime() < deadline) {
      Thread.sleep(1);
    }
    if (searches.get() < before + 3) {
      throw new AssertionError("searches made no progress during writes");
    }
  }
}
