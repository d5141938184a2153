package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.values.SilhouetteCounts;

/**
 * What the per-image choice of silhouettes costs: the same folder indexed into two new catalogs, one after the other,
 * with the classical extractor alone and with the default choice (the learned model where the classical silhouette is
 * doubtful), on all cores; wall and process CPU time of each run, and what made the masks.
 */
public final class SilhouetteCost {
  /**
   * One run.
   *
   * @param mode the silhouette setting
   * @param seconds wall time
   * @param cpuSeconds process CPU time
   * @param masks silhouettes by what made them, and how many are uncertain
   */
  public record Run(AnalysisSetup.SilhouetteMode mode, double seconds, double cpuSeconds,
      SilhouetteCounts masks) {}

  /** Both runs, classical first. */
  public record Result(Run classical, Run auto) {
    public double cpuRatio() {
      return auto.cpuSeconds() / classical.cpuSeconds();
    }

    public double wallRatio() {
      return auto.seconds() / classical.seconds();
    }
  }

  private SilhouetteCost() {}

  public static Result run(Path folder, Path work) throws IOException {
    return new Result(index(folder, work.resolve("classical"), AnalysisSetup.SilhouetteMode.CLASSICAL),
        index(folder, work.resolve("auto"), AnalysisSetup.SilhouetteMode.AUTO));
  }

  private static Run index(Path folder, Path catalog, AnalysisSetup.SilhouetteMode mode) throws IOException {
    AnalysisSetup setup = AnalysisSetup.defaults().withSilhouettes(mode)
        .withModels(ModelFolder.resolve(Optional.empty()));
    try (Library library = Library.open(catalog)) {
      long cpu = CpuClock.processNanos();
      long start = System.nanoTime();
      new LibraryIndexer(library, setup, IndexOptions.defaults())
          .index(List.of(folder), ProgressListener.NONE, CancellationToken.none());
      return new Run(mode, (System.nanoTime() - start) / 1e9, (CpuClock.processNanos() - cpu) / 1e9,
          library.features().silhouetteCounts());
    }
  }
}
