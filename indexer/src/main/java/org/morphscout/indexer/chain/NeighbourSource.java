package org.morphscout.indexer.chain;

import java.util.List;

/**
 * Answers "which images are closest to this one?" for {@link NeighbourGraphBuilder}; in the application it is
 * backed by the HNSW vector index (candidates) and the catalog (step components).
 *
 * <p>Contract: candidates come closest first by {@link StepCost#mixedCost()}, never include {@code id} itself, and
 * reflect the current set of images (an image is visible before it is added to the builder and gone before it is
 * removed from it). Returning fewer than {@code k} is allowed.
 */
@FunctionalInterface
public interface NeighbourSource {

  /** Up to {@code k} nearest candidates of {@code id}. */
  List<Candidate> nearest(long id, int k);

  /** One neighbour candidate and the measured components of the step to it. */
  record Candidate(long id, StepCost components) {
    public Candidate {
      if (components == null) {
        throw new IllegalArgumentException("components must not be null");
      }
    }
  }
}
