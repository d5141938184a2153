package org.morphscout.indexer.pairing;

import java.util.List;

/**
 * Proposes likely partners of an image, nearest first (backed by the vector index in production). Implementations
 * must be thread-safe.
 */
@FunctionalInterface
public interface CandidateSource {
  /**
   * @param id the image's catalog id
   * @param k how many candidates at most
   * @return candidate ids, not containing {@code id}; never null
   */
  List<Long> candidates(long id, int k);
}
