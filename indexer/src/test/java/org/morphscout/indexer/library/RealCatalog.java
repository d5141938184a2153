package org.morphscout.indexer.library;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * A catalog indexed from files on disk with the real pipeline (decoding, silhouettes, the built-in ONNX descriptor,
 * the neighbour graph), opened for queries. Close it when done.
 */
final class RealCatalog implements AutoCloseable {
  final Library library;
  final QueryContext context;
  final PairService pairs;
  final IndexReport report;

  private RealCatalog(Library library, IndexReport report) {
    this.library = library;
    this.report = report;
    this.context = new QueryContext(library, AnalysisSetup.defaults());
    this.pairs = new PairService(context, ScoreConfig.DEFAULTS);
  }

  /** Indexes {@code root} into a new catalog in {@code catalogDir}, keeping {@code neighbours} per image. */
  static RealCatalog index(Path catalogDir, Path root, int neighbours) throws IOException {
    Library library = Library.open(catalogDir);
    IndexReport report = new LibraryIndexer(library, AnalysisSetup.defaults(),
        IndexOptions.defaults().withThreads(2).withNeighbours(neighbours))
        .index(List.of(root), ProgressListener.NONE, CancellationToken.none());
    if (report.failed() > 0) {
      library.close();
      throw new IllegalStateException("test pictures failed to index: " + report.failures());
    }
    return new RealCatalog(library, report);
  }

  /** The stored analysis of an indexed file. */
  ImageAnalysis analysis(Path file) {
    return context.resolve(file.toString());
  }

  static Path png(Path file, BufferedImage image) {
    try {
      Files.createDirectories(file.getParent());
      ImageIO.write(image, "png", file.toFile());
      return file.toAbsolutePath().normalize();
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  @Override
  public void close() throws IOException {
    context.close();
    library.close();
  }
}
