package org.morphscout.demo;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Writes the demo library of the invented studio "Quernhollow Ceramics" into a folder:
 * <pre>
 *   vases/ jugs/ bottles/ bowls/ cups/ jars/   product pictures (JPEG mostly, some PNG, a few with alpha)
 *                                             and near-duplicates named *-web.jpg, *-small.jpg, *-edit.jpg
 *   problems/                                 cut-off, two-objects, very-dark, panoramic, tiny, corrupt
 *   shelves/                                  walkthrough views, shuffled names, true order in the manifest
 *   manifest.csv                              ground truth per file ({@link ManifestRow})
 *   README.txt                                provenance and licence
 * </pre>
 *
 * <p>Planning (every random choice) happens first on the calling thread; drawing and encoding then run as
 * independent jobs on a small named pool, each writing only its own files. The output therefore does not depend on
 * thread count or scheduling: same seed, same bytes. Existing files with the same names are overwritten; other
 * files in the folder are left alone.
 */
public final class DemoLibrary {
  private static final Logger LOG = LoggerFactory.getLogger(DemoLibrary.class);

  private DemoLibrary() {}

  /** Generates the default library ({@link DemoOptions#defaults()}) into {@code dir}. */
  public static LibrarySummary generate(Path dir) throws IOException {
    return generate(dir, DemoOptions.defaults());
  }

  /** Generates the library into {@code dir} (created if missing). */
  public static LibrarySummary generate(Path dir, DemoOptions options) throws IOException {
    Objects.requireNonNull(dir, "dir");
    Objects.requireNonNull(options, "options");
    long start = System.nanoTime();
    Files.createDirectories(dir);
    List<LibraryJob> products = new ProductPlanner(options).plan();
    List<LibraryJob> problems = options.includeProblems() ? new ProblemPlanner(options).plan() : List.of();
    List<LibraryJob> jobs = new ArrayList<>(products);
    jobs.addAll(problems);
    if (options.shelfViews() > 0) {
      // First in the queue: it is the longest single job.
      jobs.add(0, new ShelfWalkthrough(options).plan());
    }
    run(dir, jobs, options.threads());

    List<ManifestRow> rows = new ArrayList<>();
    for (LibraryJob j : jobs) {
      rows.addAll(j.rows());
    }
    StringBuilder csv = new StringBuilder(ManifestRow.HEADER).append('\n');
    SortedMap<String, Integer> perFolder = new TreeMap<>();
    int productCount = 0;
    int duplicates = 0;
    int problemCount = 0;
    int shelf = 0;
    for (ManifestRow r : rows) {
      csv.append(r.toCsv()).append('\n');
      perFolder.merge(r.file().substring(0, r.file().indexOf('/')), 1, Integer::sum);
      if (!r.problem().isEmpty()) {
        problemCount++;
      } else if (!r.duplicateOf().isEmpty()) {
        duplicates++;
      } else if (r.shelfOrder() >= 0) {
        shelf++;
      } else {
        productCount++;
      }
    }
    Path manifest = dir.resolve("manifest.csv");
    Files.writeString(manifest, csv, StandardCharsets.UTF_8);
    Path readme = dir.resolve("README.txt");
    Files.writeString(readme, LibraryReadme.text(options, productCount, duplicates, problemCount, shelf),
        StandardCharsets.UTF_8);
    long millis = (System.nanoTime() - start) / 1_000_000;
    LibrarySummary summary = new LibrarySummary(dir, manifest, readme, productCount, duplicates, problemCount,
        shelf, perFolder, millis);
    LOG.info("Demo library written to {}: {} products, {} near-duplicates, {} problems, {} shelf views in {} ms",
        dir, productCount, duplicates, problemCount, shelf, millis);
    return summary;
  }

  private static void run(Path dir, List<LibraryJob> jobs, int threads) throws IOException {
    ExecutorService pool = Executors.newFixedThreadPool(threads, new DemoThreads());
    try {
      List<Future<?>> futures = new ArrayList<>();
      for (LibraryJob job : jobs) {
        futures.add(pool.submit(() -> {
          try {
            write(dir, job);
          } catch (IOException e) {
            throw new UncheckedIOException(e);
          }
        }));
      }
      for (Future<?> f : futures) {
        try {
          f.get();
        } catch (ExecutionException e) {
          Throwable cause = e.getCause();
          if (cause instanceof UncheckedIOException u) {
            throw u.getCause();
          }
          if (cause instanceof RuntimeException r) {
            throw r;
          }
          if (cause instanceof Error err) {
            throw err;
          }
          throw new IOException("demo library job failed", cause);
        } catch (InterruptedException e) {
          Thread.currentThread().interrupt();
          throw new IOException("interrupted while writing the demo library into " + dir, e);
        }
      }
    } finally {
      pool.shutdownNow();
    }
  }

  private static void write(Path dir, LibraryJob job) throws IOException {
    List<byte[]> files = job.producer().produce();
    if (files.size() != job.rows().size()) {
      throw new IllegalStateException("job produced " + files.size() + " files for " + job.rows().size() + " rows");
    }
    for (int i = 0; i < files.size(); i++) {
      Path target = dir.resolve(job.rows().get(i).file());
      Files.createDirectories(target.getParent());
      Files.write(target, files.get(i));
      LOG.debug("wrote {}", target);
    }
  }
}
