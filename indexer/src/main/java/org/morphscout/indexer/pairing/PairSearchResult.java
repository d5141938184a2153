package org.morphscout.indexer.pairing;

import java.util.List;

/**
 * The outcome of a pair search.
 *
 * @param pairs the best pairs, best first, at most topN, all at or above minScore
 * @param duplicates near-duplicate pairs found among the candidates (excluded from {@code pairs}), ordered by id
 * @param scored how many candidate pairs were scored
 * @param failures candidate pairs that could not be scored (an analysis failed to load), with the message
 */
public record PairSearchResult(
    List<ScoredPair> pairs, List<DuplicatePair> duplicates, int scored, List<String> failures) {

  public PairSearchResult {
    pairs = List.copyOf(pairs);
    duplicates = List.copyOf(duplicates);
    failures = List.copyOf(failures);
  }

  /** Two catalog images judged to be the same picture ({@code a < b}). */
  public record DuplicatePair(long a, long b) {}
}
