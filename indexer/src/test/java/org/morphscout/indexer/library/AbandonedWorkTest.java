package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.feature.ColourStatistics;
import org.morphscout.indexer.ingest.ContentHash;
import org.morphscout.indexer.ingest.ImageDecoder;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.silhouette.ShapeDescriptors;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * A file abandoned at the per-file time limit may keep its worker busy after the run has moved on (decoders do not
 * all heed interrupts). Whatever that worker does afterwards, nothing appears in the catalog folder for the file: no
 * thumbnail of an image recorded as failed, and no write racing the caller that deletes or moves the catalog.
 */
class AbandonedWorkTest {
  private static final long SEED = 20261204L;

  @TempDir Path tmp;

  @Test
  void aWorkerThatFinishesAfterItsTimeLimitWritesNothingIntoTheCatalog() throws Exception {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 2, Archetype.CUP, Archetype.BOWL);
    FamilyFolders.writePngs(family, root, "late-");
    Path file = root.resolve("late-0.png");
    CountDownLatch started = new CountDownLatch(1);
    CountDownLatch release = new CountDownLatch(1);
    // The limit leaves the worker ample time to reach the decoder (checked below) even on a loaded machine.
    IndexOptions options = IndexOptions.defaults().withThreads(1).withPerFileTimeLimit(Duration.ofSeconds(2));

    try (Library library = Library.open(tmp.resolve("catalog"))) {
      ImageAnalyzer real = AnalyzerFactory.create(library, AnalysisSetup.defaults());
      AtomicReference<Thread> worker = new AtomicReference<>();
      ImageAnalyzer late = new ImageAnalyzer(uninterruptiblyHeld(real.decoder(), worker, started, release),
          real.silhouettes(), new ShapeDescriptors(), new ColourStatistics(), real.embedder());
      long rootId = library.images().ensureRoot(root);
      long id = library.images().insertPending(rootId, file.toString(), Files.size(file),
          Files.getLastModifiedTime(file).toMillis(), ContentHash.sha256Hex(file));
      ImageRow row = library.images().byId(id).orElseThrow();
      List<IndexReport.FileFailure> failures = new ArrayList<>();
      try (LuceneVectorIndex index = LuceneVectorIndex.open(tmp.resolve("vectors"), LuceneIndexOptions.defaults())) {
        new AnalysisPipeline(library, AnalysisSetup.defaults(), options).run(List.of(row), late, index,
            new ArrayList<>(), failures, ProgressListener.NONE, CancellationToken.none());
      } finally {
        real.embedder().close();
      }
      assertThat(started.await(0, TimeUnit.SECONDS)).as("the worker reached the decoder").isTrue();
      assertThat(failures).singleElement().satisfies(f -> assertThat(f.reason()).startsWith("timed out"));

      // Now let the abandoned worker finish its decode and analysis, and wait until it has stopped.
      release.countDown();
      worker.get().join(Duration.ofSeconds(60));
      assertThat(worker.get().isAlive()).as("the abandoned worker ended").isFalse();
      assertThat(library.catalog().thumbnail(id)).as("thumbnail of a file recorded as timed out").isEmpty();
      assertThat(library.images().withStatus(ImageStatus.FAILED)).extracting(ImageRow::id).containsExactly(id);
    }
  }

  /** Signals {@code started}, then holds until {@code release}, ignoring interrupts as a stuck native decoder would. */
  private static ImageDecoder uninterruptiblyHeld(ImageDecoder decoder, AtomicReference<Thread> worker,
      CountDownLatch started, CountDownLatch release) {
    return file -> {
      worker.set(Thread.currentThread());
      started.countDown();
      while (release.getCount() > 0) {
        try {
          release.await();
        } catch (InterruptedException e) {
          // swallowed, as by a decoder that never looks at the flag
        }
      }
      return decoder.decode(file);
    };
  }
}
