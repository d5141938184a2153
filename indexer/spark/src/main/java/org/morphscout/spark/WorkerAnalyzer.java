package org.morphscout.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import org.apache.spark.SparkFiles;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.analysis.PreparedImage;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.AnalyzerFactory;
import org.morphscout.indexer.ingest.Thumbnails;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;

/**
 * The analyser of one worker JVM: built once per job settings (models loaded once per executor), shared by the tasks
 * that run there. Preparing images is thread-safe; the appearance model runs one batch at a time.
 */
final class WorkerAnalyzer {
  private static final Map<JobSettings, WorkerAnalyzer> BY_SETTINGS = new ConcurrentHashMap<>();

  final ImageAnalyzer analyzer;
  final Thumbnails thumbnails;
  final Path workDir;

  private WorkerAnalyzer(ImageAnalyzer analyzer, Thumbnails thumbnails, Path workDir) {
    this.analyzer = analyzer;
    this.thumbnails = thumbnails;
    this.workDir = workDir;
  }

  /** This JVM's analyser for {@code settings}. */
  static WorkerAnalyzer get(JobSettings settings) {
    return BY_SETTINGS.computeIfAbsent(settings, s -> {
      try {
        return create(s);
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
    });
  }

  private static WorkerAnalyzer create(JobSettings settings) throws IOException {
    Path workDir = Files.createTempDirectory("morphscout-job-");
    Optional<Path> learned = Optional.empty();
    if (settings.learnedModelFile() != null) {
      Path shipped = Path.of(SparkFiles.get(settings.learnedModelFile()));
      // Checked again here: a worker must not analyse with another file than the one the driver verified.
      learned = new SalientModelStore().findIn(new ModelFolder(shipped.getParent()));
      if (learned.isEmpty()) {
        throw new MorphscoutException("the learned silhouette model shipped with the job is missing on this worker: "
            + shipped);
      }
    }
    AnalysisSetup setup = AnalysisSetup.defaults().withSilhouettes(settings.mode());
    ImageAnalyzer analyzer = AnalyzerFactory.create(setup, workDir.resolve("models"), learned);
    String effective = AnalyzerFactory.effectiveSilhouettes(setup, learned);
    if (!effective.equals(settings.silhouettes())) {
      throw new MorphscoutException("this worker would analyse with " + effective + " silhouettes, the job asked for "
          + settings.silhouettes());
    }
    return new WorkerAnalyzer(analyzer, new Thumbnails(setup.decode()), workDir);
  }

  /** Runs the appearance model on a batch (one batch at a time per JVM, as {@code index} does). */
  List<ImageAnalysis> finish(List<PreparedImage> batch) {
    synchronized (analyzer) {
      return analyzer.finish(batch, batch.stream().map(p -> -1L).toList());
    }
  }
}
