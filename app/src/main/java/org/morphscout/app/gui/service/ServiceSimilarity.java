package org.morphscout.app.gui.service;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.SimilarityService;
import org.morphscout.indexer.progress.CancellationToken;

/** Similarity through the library's {@link SimilarityService} (the HNSW vector index), as the command line does. */
public final class ServiceSimilarity implements SimilarityBackend {
  private final QueryContext context;

  public ServiceSimilarity(QueryContext context) {
    this.context = context;
  }

  @Override
  public List<Match> similar(long id, SimilarityMode mode, int limit, CancellationToken token) {
    ImageAnalysis query = context.cache().get(id).orElseThrow(() -> new MorphscoutException(
        "image " + id + " has not been analysed yet, so it has no " + mode.label() + " to compare"));
    return search(query, mode, limit);
  }

  @Override
  public List<Match> similarToFile(java.nio.file.Path file, SimilarityMode mode, int limit, CancellationToken token) {
    // the stored analysis when the file is a catalog image, else analysed now with the catalog's model
    ImageAnalysis query = context.resolve(file.toString());
    token.throwIfCancelled();
    return search(query, mode, limit);
  }

  private List<Match> search(ImageAnalysis query, SimilarityMode mode, int limit) {
    SimilarityService.By by = mode == SimilarityMode.SHAPE ? SimilarityService.By.SHAPE
        : SimilarityService.By.APPEARANCE;
    try {
      return new SimilarityService(context).similar(query, limit, by).stream()
          .map(h -> new Match(h.id(), h.distance())).toList();
    } catch (IOException e) {
      throw new UncheckedIOException("cannot search the vector index", e);
    }
  }
}
