package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.IndexReport;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * What storing pairs adds to indexing: indexes a folder into a new catalog, all cores, and splits the wall time and the
 * process CPU time into the stored-pairs phases (choosing candidates, measuring pairs) and everything else, from the
 * indexer's own phase reports. On a shared machine the CPU split is the steadier figure: waiting for a core inflates
 * the wall time of whichever phase runs while other jobs do.
 */
public final class PairStoreCost {
  /**
   * @param images images indexed
   * @param totalSeconds wall time of the whole indexing run
   * @param pairSeconds wall time of its stored-pairs phases
   * @param totalCpuSeconds process CPU time of the whole indexing run (all threads)
   * @param pairCpuSeconds process CPU time of its stored-pairs phases
   * @param measureCpuSeconds of which measuring the pairs (the rest is choosing candidates)
   * @param pairs stored pairs
   * @param bounded pairs stored without a warp (cheap bound below the warn score)
   * @param threads indexing threads
   */
  public record Result(int images, double totalSeconds, double pairSeconds, double totalCpuSeconds,
      double pairCpuSeconds, double measureCpuSeconds, long pairs, long bounded, int threads) {
    /** Extra indexing time the stored pairs cost, as a fraction of indexing without them (wall time). */
    public double added() {
      double without = totalSeconds - pairSeconds;
      return without > 0 ? pairSeconds / without : Double.NaN;
    }

    /** The same fraction in CPU time. */
    public double addedCpu() {
      double without = totalCpuSeconds - pairCpuSeconds;
      return without > 0 ? pairCpuSeconds / without : Double.NaN;
    }
  }

  private PairStoreCost() {}

  public static Result run(Path folder, Path catalogDir, AnalysisSetup setup) throws IOException {
    PhaseClock clock = new PhaseClock();
    IndexOptions options = IndexOptions.defaults();
    try (Library library = Library.open(catalogDir)) {
      long start = System.nanoTime();
      long cpuStart = CpuClock.processNanos();
      IndexReport report = new LibraryIndexer(library, setup, options)
          .index(List.of(folder), clock, CancellationToken.none());
      clock.phase("end", 0);
      double total = (System.nanoTime() - start) / 1e9;
      double totalCpu = (CpuClock.processNanos() - cpuStart) / 1e9;
      var counts = library.pairs().counts(PairMeasurer.VERSION);
      return new Result(report.indexed(), total, clock.pairNanos / 1e9, totalCpu,
          (clock.chooseCpuNanos + clock.measureCpuNanos) / 1e9, clock.measureCpuNanos / 1e9, counts.pairs(),
          counts.bounded(), options.threads());
    }
  }

  /** Adds up the wall and CPU time of the stored-pairs phases. */
  private static final class PhaseClock implements ProgressListener {
    private String current = "";
    private long since = System.nanoTime();
    private long cpuSince = CpuClock.processNanos();
    long pairNanos;
    long chooseCpuNanos;
    long measureCpuNanos;

    @Override
    public synchronized void phase(String name, long total) {
      long now = System.nanoTime();
      long cpu = CpuClock.processNanos();
      if (current.equals("choosing pair candidates")) {
        pairNanos += now - since;
        chooseCpuNanos += cpu - cpuSince;
      } else if (current.equals("measuring pairs")) {
        pairNanos += now - since;
        measureCpuNanos += cpu - cpuSince;
      }
      current = name;
      since = now;
      cpuSince = cpu;
    }
  }
}
