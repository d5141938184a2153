package org.morphscout.app.gui.service;

import java.util.Objects;
import org.morphscout.indexer.library.Library;

/** The jobs the browser asks of the library, gathered so one place decides which implementation serves each. */
public record Backends(SimilarityBackend similarity, PairsBackend pairs, ChainsBackend chains, WalkBackend walk,
    PreviewBackend preview, IndexingBackend indexing) {
  public Backends {
    Objects.requireNonNull(similarity);
    Objects.requireNonNull(pairs);
    Objects.requireNonNull(chains);
    Objects.requireNonNull(walk);
    Objects.requireNonNull(preview);
    Objects.requireNonNull(indexing);
  }

  /** Builds the backends for an open library. */
  @FunctionalInterface
  public interface Factory {
    Backends create(Library library);
  }
}
