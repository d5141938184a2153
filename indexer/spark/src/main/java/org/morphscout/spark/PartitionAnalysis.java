package org.morphscout.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Timestamp;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import org.apache.spark.api.java.function.MapPartitionsFunction;
import org.apache.spark.sql.Row;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.PreparedImage;
import org.morphscout.indexer.ingest.ContentHash;
import org.morphscout.indexer.ingest.DecodedImage;
import org.morphscout.indexer.ingest.ScanOptions;
import org.morphscout.indexer.library.FailureKind;
import org.morphscout.indexer.library.OutsideAnalysis;
import org.morphscout.indexer.library.VectorSync;

/**
 * Analyses one partition of Spark's binary-file rows ({@code path}, {@code modificationTime}, {@code length},
 * {@code content}) into output rows, in batches for the appearance model. Files whose extension is not an image's are
 * skipped, as {@code index} skips them; a file that cannot be analysed becomes a row with its failure's kind and reason.
 */
final class PartitionAnalysis implements MapPartitionsFunction<Row, Row> {
  private static final long serialVersionUID = 1L;
  private static final int BATCH = 16;
  private static final ScanOptions IMAGES = ScanOptions.defaults();

  private final JobSettings settings;
  private final String folder;

  PartitionAnalysis(JobSettings settings, String folder) {
    this.settings = settings;
    this.folder = folder;
  }

  @Override
  public Iterator<Row> call(Iterator<Row> files) {
    WorkerAnalyzer worker = WorkerAnalyzer.get(settings);
    return new Iterator<>() {
      private final Deque<Row> ready = new ArrayDeque<>();

      @Override
      public boolean hasNext() {
        while (ready.isEmpty() && files.hasNext()) {
          ready.addAll(analyseBatch(worker, files));
        }
        return !ready.isEmpty();
      }

      @Override
      public Row next() {
        if (!hasNext()) {
          throw new NoSuchElementException();
        }
        return ready.poll();
      }
    };
  }

  private List<Row> analyseBatch(WorkerAnalyzer worker, Iterator<Row> files) {
    List<Row> out = new ArrayList<>();
    List<PreparedImage> prepared = new ArrayList<>();
    List<FileFacts> facts = new ArrayList<>();
    while (files.hasNext() && prepared.size() < BATCH) {
      Row file = files.next();
      FileFacts f = FileFacts.of(file, folder);
      if (!IMAGES.countsAsImage(f.name())) {
        continue;
      }
      byte[] content = file.getAs("content");
      String hash = ContentHash.sha256Hex(content);
      f = f.withHash(hash);
      try {
        prepared.add(prepare(worker, f, content));
        facts.add(f);
      } catch (Exception | OutOfMemoryError e) {
        out.add(OutputRows.failed(f, folder, settings, FailureKind.of(e)));
      }
    }
    if (prepared.isEmpty()) {
      return out;
    }
    List<ImageAnalysis> analyses;
    try {
      analyses = worker.finish(prepared);
    } catch (RuntimeException e) {
      for (FileFacts f : facts) {
        out.add(OutputRows.failed(f, folder, settings, new FailureKind.Failure(FailureKind.MODEL_FAILED,
            "appearance model failed: " + e.getMessage())));
      }
      return out;
    }
    for (int i = 0; i < analyses.size(); i++) {
      ImageAnalysis a = analyses.get(i);
      PreparedImage p = prepared.get(i);
      if (!VectorSync.finite(a.appearance()) || !VectorSync.finite(a.shape().shapeVector())) {
        out.add(OutputRows.failed(facts.get(i), folder, settings, new FailureKind.Failure(FailureKind.INVALID_VECTOR,
            "analysis produced an invalid vector (NaN); please report this file")));
        continue;
      }
      out.add(OutputRows.analysed(facts.get(i), folder, settings, a, p.decoded().orientation(), thumbnail(worker, p)));
    }
    return out;
  }

  /** Decodes the bytes from a private copy (the decoders read files) and computes everything but the vector. */
  private static PreparedImage prepare(WorkerAnalyzer worker, FileFacts f, byte[] content) throws IOException {
    String suffix = f.name().contains(".") ? f.name().substring(f.name().lastIndexOf('.')) : "";
    Path copy = Files.createTempFile(worker.workDir, "file-", suffix);
    try {
      Files.write(copy, content);
      DecodedImage decoded = worker.analyzer.decoder().decode(copy);
      return worker.analyzer.prepare(copy, f.contentHash(), decoded);
    } finally {
      Files.deleteIfExists(copy);
    }
  }

  private static OutputRows.Thumbnail thumbnail(WorkerAnalyzer worker, PreparedImage p) {
    try {
      Path written = worker.thumbnails.write(p.decoded().analysis(), worker.workDir,
          "thumb-" + Thread.currentThread().threadId() + "-" + System.nanoTime());
      try {
        String name = written.getFileName().toString();
        return new OutputRows.Thumbnail(Files.readAllBytes(written), name.substring(name.lastIndexOf('.') + 1));
      } finally {
        Files.deleteIfExists(written);
      }
    } catch (IOException e) {
      return null; // as in index: an image without a thumbnail is still analysed
    }
  }

  /** What the binary-file source tells about one file. */
  record FileFacts(String path, String name, long size, long mtimeMs, String contentHash) {
    static FileFacts of(Row file, String folder) {
      String uri = file.getAs("path");
      String path = OutsideAnalysis.catalogName(uri);
      String name = path.substring(path.lastIndexOf('/') + 1);
      Timestamp mtime = file.getAs("modificationTime");
      long length = file.getAs("length");
      return new FileFacts(path, name, length, mtime.getTime(), "");
    }

    FileFacts withHash(String hash) {
      return new FileFacts(path, name, size, mtimeMs, hash);
    }
  }

}
