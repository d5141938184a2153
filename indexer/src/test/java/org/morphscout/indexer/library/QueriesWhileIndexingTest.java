package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.Chain;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.chain.Edge;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.testing.CatalogChecks;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * Queries ({@code similar}, {@code chain}, partners of an image) while an indexing run adds, changes and re-analyses images: every answer is
 * well-formed and refers only to catalog images, and no query fails. One query loop shares the indexer's
 * {@link Library} (the browser's case), the other opens the catalog a second time (a command run beside the indexer:
 * its own database connection and a read-only view of the vector index).
 */
class QueriesWhileIndexingTest {
  private static final long SEED = 20261204L;
  private static final int SIZE = 160;

  @TempDir Path tmp;

  private static void writeFamily(Path dir, String prefix, long seed, Archetype a, Archetype b, int n)
      throws IOException {
    List<FamilyItem> items = TestFamilies.silhouetteFamily(seed, n, a, b, SIZE, SIZE);
    for (int i = 0; i < n; i++) {
      ImageIO.write(items.get(i).image(), "png", dir.resolve(prefix + "-" + i + ".png").toFile());
    }
  }

  private IndexReport index(Library library, Path root) throws IOException {
    return index(library, root, ProgressListener.NONE);
  }

  private IndexReport index(Library library, Path root, ProgressListener progress) throws IOException {
    return new LibraryIndexer(library, AnalysisSetup.defaults(),
        new IndexOptions(2, 4, java.time.Duration.ofSeconds(30), false, false, 4, 8, false))
        .index(List.of(root), progress, CancellationToken.none());
  }

  /**
   * Holds the run at the start of its analysis (changed pictures pending again, the links others stored to them still
   * there) until the queries have answered a few times, so that they surely meet that state.
   */
  private static ProgressListener pauseMidRun(CountDownLatch queried) {
    return new ProgressListener() {
      private volatile boolean analysing;

      @Override
      public void phase(String name, long total) {
        analysing = name.equals("analysing");
      }

      @Override
      public void progressed(long done, String item) {
        if (analysing && done == 1) {
          try {
            queried.await(60, TimeUnit.SECONDS);
          } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
          }
        }
      }
    };
  }

  @Test
  @Timeout(value = 120, unit = TimeUnit.SECONDS)
  void similarAndChainQueriesStayConsistentWhileIndexingRuns() throws Exception {
    Path root = Files.createDirectories(tmp.resolve("library"));
    Path catalog = tmp.resolve("catalog");
    writeFamily(root, "a", SEED, Archetype.VASE, Archetype.BOTTLE, 8);
    writeFamily(root, "b", SEED + 1, Archetype.BOWL, Archetype.CUP, 8);
    try (Library library = Library.open(catalog)) {
      index(library, root);
      Path fromFile = root.resolve("a-0.png");
      Path toFile = root.resolve("a-7.png");
      long from = library.require(fromFile.toString()).id();
      long to = library.require(toFile.toString()).id();

      // Work for the second run: new pictures, and changed ones whose stored links go stale while it runs.
      writeFamily(root, "c", SEED + 2, Archetype.JUG, Archetype.JAR, 8);
      writeFamily(root, "d", SEED + 3, Archetype.AMPHORA, Archetype.VASE, 8);
      List<FamilyItem> other = TestFamilies.silhouetteFamily(SEED + 4, 6, Archetype.CUP, Archetype.JAR, SIZE, SIZE);
      for (int i = 1; i <= 6; i++) {
        Path p = root.resolve("a-" + i + ".png");
        ImageIO.write(other.get(i - 1).image(), "png", p.toFile());
        Files.setLastModifiedTime(p, FileTime.fromMillis(System.currentTimeMillis() + 5000));
      }

      AtomicBoolean indexing = new AtomicBoolean(true);
      CountDownLatch queried = new CountDownLatch(4);
      CompletableFuture<IndexReport> run = CompletableFuture.supplyAsync(() -> {
        try {
          return index(library, root, pauseMidRun(queried));
        } catch (IOException e) {
          throw new java.io.UncheckedIOException(e);
        } finally {
          indexing.set(false);
        }
      });
      ConcurrentLinkedQueue<Throwable> errors = new ConcurrentLinkedQueue<>();
      AtomicInteger whileIndexing = new AtomicInteger();
      Runnable shared = () -> queryLoop(library, fromFile, toFile, from, to, indexing, whileIndexing, queried, errors);
      Runnable separate = () -> {
        try (Library second = Library.open(catalog)) {
          queryLoop(second, fromFile, toFile, from, to, indexing, whileIndexing, queried, errors);
        } catch (Throwable t) {
          errors.add(t);
        }
      };
      CompletableFuture<Void> q1 = CompletableFuture.runAsync(shared);
      CompletableFuture<Void> q2 = CompletableFuture.runAsync(separate);
      IndexReport report = run.get(100, TimeUnit.SECONDS);
      q1.get(60, TimeUnit.SECONDS);
      q2.get(60, TimeUnit.SECONDS);

      assertThat(errors).as("query errors while indexing (seed %d)", SEED).isEmpty();
      assertThat(report.indexed()).isEqualTo(22); // 8 + 8 new, 6 changed
      assertThat(whileIndexing.get()).as("queries answered while the run was going on").isGreaterThanOrEqualTo(4);
      CatalogChecks.catalogAndIndexAgree(library, "after the run");
    }
  }

  /** Queries until the run is over (and once more after it), checking each answer; failures go to {@code errors}. */
  private static void queryLoop(Library library, Path fromFile, Path toFile, long from, long to, AtomicBoolean indexing,
      AtomicInteger answered, CountDownLatch queried, ConcurrentLinkedQueue<Throwable> errors) {
    try (QueryContext context = new QueryContext(library, AnalysisSetup.defaults())) {
      boolean last = false;
      while (!last) {
        last = !indexing.get();
        try {
          ImageAnalysis query = context.resolve(fromFile.toString());
          for (SimilarityService.By by : SimilarityService.By.values()) {
            checkSimilar(library, from, new SimilarityService(context).similar(query, 5, by));
          }
          PairService pairs = new PairService(context, ScoreConfig.DEFAULTS);
          org.morphscout.indexer.pairing.PairSearchResult partners = pairs.partners(query,
              org.morphscout.indexer.pairing.PairQuery.DEFAULTS, ProgressListener.NONE, CancellationToken.none());
          partners.pairs().forEach(pair -> assertThat(library.images().byId(pair.b())).isPresent());
          ChainService chains = new ChainService(context, pairs);
          ChainService.ChainAnswer answer = chains.chains(query, context.resolve(toFile.toString()),
              ChainQuery.between(from, to));
          for (ChainService.ChainDetail d : answer.chains()) {
            checkChain(library, from, to, d);
          }
          if (!last) {
            answered.incrementAndGet();
            queried.countDown();
          }
        } catch (Throwable t) {
          errors.add(t);
          return;
        }
      }
    } catch (IOException e) {
      errors.add(e);
    }
  }

  private static void checkSimilar(Library library, long query, List<SimilarityService.Hit> hits) {
    assertThat(hits).as("similar images of a ready image").isNotEmpty();
    Set<Long> seen = new HashSet<>();
    double previous = 0;
    for (SimilarityService.Hit h : hits) {
      assertThat(h.id()).as("the query itself is left out").isNotEqualTo(query);
      assertThat(seen.add(h.id())).as("each image once").isTrue();
      assertThat(h.distance()).isBetween(0.0, 2.0).isGreaterThanOrEqualTo(previous);
      previous = h.distance();
      assertThat(library.images().byId(h.id())).as("hit %d is a catalog image", h.id()).isPresent();
    }
  }

  private static void checkChain(Library library, long from, long to, ChainService.ChainDetail d) {
    Chain c = d.chain();
    assertThat(c.images().get(0)).isEqualTo(from);
    assertThat(c.images().get(c.images().size() - 1)).isEqualTo(to);
    for (int i = 0; i < c.steps().size(); i++) {
      Edge e = c.steps().get(i);
      assertThat(Set.of(e.from(), e.to())).isEqualTo(Set.of(c.images().get(i), c.images().get(i + 1)));
    }
    assertThat(d.steps()).hasSameSizeAs(c.steps());
    for (long id : c.images()) {
      assertThat(library.images().byId(id)).as("chain image %d is in the catalog", id).isPresent();
    }
  }

  @Test
  void theChainGraphLeavesOutImagesThatAreNotReady() throws IOException {
    // The state an indexing run passes through: a changed file is set back to pending, but the links other images
    // stored to it are only recomputed at the end of the run. A chain must not step onto it meanwhile.
    Path root = Files.createDirectories(tmp.resolve("library"));
    writeFamily(root, "a", SEED, Archetype.JUG, Archetype.BOTTLE, 6);
    try (Library library = Library.open(tmp.resolve("catalog"))) {
      index(library, root);
      long pending = library.require(root.resolve("a-3.png").toString()).id();
      assertThat(library.neighbours().all()).as("some stored link leads to the image")
          .anySatisfy(l -> assertThat(List.of(l.from(), l.to())).contains(pending));
      library.images().setStatus(pending, ImageStatus.PENDING);
      try (QueryContext context = new QueryContext(library, AnalysisSetup.defaults())) {
        ChainService chains = new ChainService(context, new PairService(context, ScoreConfig.DEFAULTS));
        assertThat(chains.graph().nodes()).doesNotContain(pending).hasSize(5);
        for (long id : chains.graph().nodes()) {
          assertThat(chains.graph().neighbours(id)).extracting(Edge::to).doesNotContain(pending);
        }
        // And a chain across the family still comes out, around the pending image.
        ImageRow first = library.require(root.resolve("a-0.png").toString());
        ImageRow lastRow = library.require(root.resolve("a-5.png").toString());
        ChainService.ChainAnswer answer = chains.chains(context.resolve(first.path()), context.resolve(lastRow.path()),
            ChainQuery.between(first.id(), lastRow.id()));
        assertThat(answer.chains()).isNotEmpty().allSatisfy(d -> assertThat(d.chain().images()).doesNotContain(pending));
      }
    }
  }
}
