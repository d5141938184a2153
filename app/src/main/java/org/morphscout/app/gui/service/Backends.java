package org.morphscout.app.gui.service;

import java.util.Objects;
import org.morphscout.indexer.library.Library;

/**
 * The jobs the browser asks of the library, gathered so one place decides which implementation serves each.
 *
 * @param resources what to close when the backends are dropped (an open vector index, a model)
 */
public record Backends(SimilarityBackend similarity, PairsBackend pairs, ChainsBackend chains, WalkBackend walk,
    PreviewBackend preview, IndexingBackend indexing, AutoCloseable resources) implements AutoCloseable {
  private static final org.slf4j.Logger LOG = org.slf4j.LoggerFactory.getLogger(Backends.class);

  /** Backends holding nothing to close. */
  public Backends(SimilarityBackend similarity, PairsBackend pairs, ChainsBackend chains, WalkBackend walk,
      PreviewBackend preview, IndexingBackend indexing) {
    this(similarity, pairs, chains, walk, preview, indexing, () -> { });
  }

  public Backends {
    Objects.requireNonNull(resources);
    Objects.requireNonNull(similarity);
    Objects.requireNonNull(pairs);
    Objects.requireNonNull(chains);
    Objects.requireNonNull(walk);
    Objects.requireNonNull(preview);
    Objects.requireNonNull(indexing);
  }

  /** Releases what the backends hold; a failure is logged, not thrown (nothing useful can follow it). */
  @Override
  public void close() {
    try {
      resources.close();
    } catch (Exception e) {
      LOG.warn("closing the library services: {}", e.getMessage());
    }
  }

  /** Builds the backends for an open library. */
  @FunctionalInterface
  public interface Factory {
    Backends create(Library library);
  }
}
