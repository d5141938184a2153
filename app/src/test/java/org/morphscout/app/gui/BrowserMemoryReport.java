package org.morphscout.app.gui;

import java.time.Instant;
import java.util.List;
import java.util.Locale;
import org.morphscout.app.bench.MachineInfo;

/** The Markdown section {@link LibraryViewMemoryBenchmark} prints: machine, one table row per size, derived figures. */
final class BrowserMemoryReport {
  private BrowserMemoryReport() {}

  /**
   * The figures of one size; heaps in bytes, used heap after GC unless said otherwise.
   *
   * @param before the empty window shown, just before opening the catalog
   * @param loaded every row listed and the first screenful of thumbnails shown
   * @param afterJumps after jumping to the middle and the end of the grid
   * @param afterScroll after the long scroll (the thumbnail cache full)
   * @param poolPeaks sum of the heap pools' peaks since just before opening (upper bound)
   * @param sampledPeak highest used heap sampled since just before opening (lower bound)
   * @param loadMs from {@code MainViewModel.open} to the grid filled with its first thumbnails
   * @param tiles tile nodes when loaded; {@code maxTiles} the most seen while scrolling
   * @param jumpShown thumbnails shown (and so cached) by the load and the two jumps
   * @param thumbnailsShown thumbnails shown in all; {@code thumbnailsCached} of those still cached at the end
   * @param afterClose after the window was closed and the catalog with it
   */
  record Run(LargeCatalog.Built catalog, long before, long loaded, long afterJumps, long afterScroll, long poolPeaks,
      long sampledPeak, long loadMs, int tiles, int maxTiles, int columns, int jumpShown, int thumbnailsShown,
      int thumbnailsCached, long scrollMs, long afterClose) {
    Run closed(long heap) {
      return new Run(catalog, before, loaded, afterJumps, afterScroll, poolPeaks, sampledPeak, loadMs, tiles,
          maxTiles, columns, jumpShown, thumbnailsShown, thumbnailsCached, scrollMs, heap);
    }
  }

  static String markdown(List<Run> runs, String command, String window, int scrollStops) {
    MachineInfo m = MachineInfo.current();
    StringBuilder s = new StringBuilder();
    s.append("### Browser: library view heap\n\n");
    s.append("Run ").append(Instant.now()).append(" by `LibraryViewMemoryBenchmark` (app tests, tag `benchmark`): `")
        .append(command).append('`');
    String opts = System.getenv("_JAVA_OPTIONS");
    if (opts != null && !opts.isBlank()) {
      s.append(", with `_JAVA_OPTIONS=").append(opts.trim()).append('`');
    }
    s.append(".\n\n| machine | |\n|---|---|\n");
    s.append("| cores | ").append(m.cores()).append(" |\n");
    s.append("| JDK | ").append(m.jdk()).append(" |\n");
    s.append("| max heap | ").append(mib(m.maxHeapBytes())).append(" |\n");
    s.append("| CPU | ").append(m.cpuModel()).append(" |\n");
    s.append("| load average at the end | ").append(MachineInfo.currentLoadAverage()).append(" |\n");
    s.append("| window | ").append(window).append(" |\n");
    s.append(String.format(Locale.ROOT, "| thumbnail cache | %,d decoded at %.0f px (MorphscoutApp) |%n%n",
        MorphscoutApp.THUMB_CAPACITY, MorphscoutApp.THUMB_SIZE));
    // One baseline for every run: the heap with the empty window, in the first run (a fresh JVM). Observed: after a
    // window is closed, about its cache's worth of heap stays reachable until the next window draws thumbnails;
    // consistent with the software renderer holding drawn images' textures (Java arrays) until its texture pool is
    // next pruned. So a later run's own reading is not a clean baseline; it is printed in brackets.
    long base = runs.isEmpty() ? 0 : runs.get(0).before();
    s.append("| images | catalog.db | open to grid filled | empty window (own reading) | loaded (+ baseline) "
        + "| after jumps (+) | after long scroll (+) | peak since open: sampled / pools' sum | after closing "
        + "| thumbnails shown / cached | tile nodes (max) |\n");
    s.append("|---|---|---|---|---|---|---|---|---|---|---|\n");
    for (Run r : runs) {
      s.append(String.format(Locale.ROOT, "| %,d | %s | %,d ms | %s (%s) | %s (+%s) | %s (+%s) | %s (+%s) "
          + "| %s / %s | %s | %,d / %,d | %d (%d) |%n", r.catalog().images(), mib(r.catalog().databaseBytes()),
          r.loadMs(), mib(base), mib(r.before()), mib(r.loaded()), mib(r.loaded() - base), mib(r.afterJumps()),
          mib(r.afterJumps() - base), mib(r.afterScroll()), mib(r.afterScroll() - base), mib(r.sampledPeak()),
          mib(r.poolPeaks()), mib(r.afterClose()), r.thumbnailsShown(), r.thumbnailsCached(), r.tiles(),
          r.maxTiles()));
    }
    s.append('\n');
    if (runs.size() >= 2) {
      Run a = runs.get(0);
      Run b = runs.get(runs.size() - 1);
      double images = b.catalog().images() - a.catalog().images();
      double loadedSlope = (b.loaded() - a.loaded()) / images;
      double scrolledSlope = (b.afterScroll() - a.afterScroll()) / images;
      s.append(String.format(Locale.ROOT, "- Heap per image (slope between %,d and %,d images): %.0f bytes "
          + "loaded, %.0f bytes after the long scroll; projected to 1,000,000 images: %s of rows.%n",
          a.catalog().images(), b.catalog().images(), loadedSlope, scrolledSlope,
          mib((long) (loadedSlope * 1_000_000))));
      s.append(String.format(Locale.ROOT, "- Fixed part (loaded heap - baseline - slope x images, at %,d): %s; "
          + "the full thumbnail cache adds about %s (after long scroll - loaded).%n", b.catalog().images(),
          mib((long) ((b.loaded() - base) - loadedSlope * b.catalog().images())),
          mib(b.afterScroll() - b.loaded())));
    }
    for (Run r : runs) {
      s.append(String.format(Locale.ROOT, "- %,d images: one cached thumbnail holds about %.0f KiB of heap "
          + "((after long scroll - after jumps) / (%,d cached - %,d cached after the jumps)).%n",
          r.catalog().images(), (r.afterScroll() - r.afterJumps()) / 1024.0
              / Math.max(1, r.thumbnailsCached() - r.jumpShown()), r.thumbnailsCached(), r.jumpShown()));
    }
    for (Run r : runs) {
      LargeCatalog.Built c = r.catalog();
      s.append(String.format(Locale.ROOT, "- %,d images: %,d ready, %,d pending, %,d failed, %,d missing, %,d "
          + "flagged; %d columns; catalog written in %.1f s; long scroll of %d screenful jumps took %.1f s.%n",
          c.images(), c.ready(), c.pending(), c.failed(), c.missing(), c.flagged(), r.columns(),
          c.buildMs() / 1000.0, scrollStops, r.scrollMs() / 1000.0));
    }
    s.append("- Heaps are used heap after three requested full GCs (HeapMeter.usedAfterGc). The baseline is the "
        + "heap with the empty window shown, read in the first run. A later run's own reading (in brackets) and the "
        + "reading after closing still hold about a full cache's worth of the previous window's thumbnails, freed "
        + "once the next window draws thumbnails (consistent with the software renderer keeping drawn images' "
        + "textures until its texture pool is pruned; not traced further). The peak since opening is given twice: "
        + "the highest used heap sampled every " + HeapSampler.PERIOD_MS + " ms (a lower bound) and the sum of the "
        + "heap pools' peaks (an upper bound, which can exceed the heap limit because the pools peak at different "
        + "moments); both include garbage not yet collected, so they grow with the heap limit the collector is "
        + "given.\n");
    s.append("- Every size completed within the heap limit of ").append(mib(m.maxHeapBytes())).append(".\n");
    s.append("- Software rendering (Monocle's headless platform, prism.order=sw) makes textures Java arrays; the "
        + "desktop's hardware pipelines keep textures in video memory, so the per-thumbnail heap here is likely "
        + "an upper bound for the real window.\n");
    return s.toString();
  }

  static String mib(long bytes) {
    return String.format(Locale.ROOT, "%.1f MiB", bytes / (1024.0 * 1024.0));
  }
}
