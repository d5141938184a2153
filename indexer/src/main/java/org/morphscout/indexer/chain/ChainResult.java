package org.morphscout.indexer.chain;

import java.util.List;
import java.util.OptionalLong;

/**
 * The answer of {@link ChainFinder}: the chains found, best first, or none with the reason and, when possible, the
 * reachable image closest to the target (a useful next endpoint to try).
 *
 * @param chains the chains, best first; empty when none exists
 * @param closestReachable when {@code chains} is empty: the image reachable from the start (within the step limit,
 *     around avoided images) that is closest to the target; empty otherwise or when nothing is reachable
 * @param reason why there is no chain, written for the user; empty when chains were found
 */
public record ChainResult(List<Chain> chains, OptionalLong closestReachable, String reason) {

  public ChainResult {
    chains = List.copyOf(chains);
    if (closestReachable == null || reason == null) {
      throw new IllegalArgumentException("closestReachable and reason must not be null");
    }
  }

  static ChainResult found(List<Chain> chains) {
    return new ChainResult(chains, OptionalLong.empty(), "");
  }

  static ChainResult none(String reason, OptionalLong closest) {
    return new ChainResult(List.of(), closest, reason);
  }

  public boolean isEmpty() {
    return chains.isEmpty();
  }

  /** The best chain; throws when there is none (check {@link #isEmpty()} first). */
  public Chain best() {
    if (chains.isEmpty()) {
      throw new IllegalStateException("no chain: " + reason);
    }
    return chains.get(0);
  }
}
