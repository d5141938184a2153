package org.morphscout.indexer.pairing;

import java.util.List;

/**
 * The outcome of a pair search.
 *
 * @param pairs the best pairs, best first, at most topN, all at or above minScore
 * @param duplicates near-duplicate pairs found among the candidates (excluded from {@code pairs}), ordered by id
 * @param scored how many candidate pairs were scored
 * @param failures candidate pairs that could not be scored (an analysis failed to load), with the message
 * @param notes how the answer was reached when that matters to the user (for example: scored live because the
 *     catalog's stored pairs are not up to date), one line each
 */
public record PairSearchResult(
    List<ScoredPair> pairs, List<DuplicatePair> duplicates, int scored, List<String> failures, List<String> notes) {

  public PairSearchResult {
    pairs = List.copyOf(pairs);
    duplicates = List.copyOf(duplicates);
    failures = List.copyOf(failures);
    notes = List.copyOf(notes);
  }

  public PairSearchResult(List<ScoredPair> pairs, List<DuplicatePair> duplicates, int scored, List<String> failures) {
    this(pairs, duplicates, scored, failures, List.of());
  }

  /** The same result with a note added. */
  public PairSearchResult withNote(String note) {
    List<String> more = new java.util.ArrayList<>(notes);
    more.add(note);
    return new PairSearchResult(pairs, duplicates, scored, failures, more);
  }

  /** Two catalog images judged to be the same picture ({@code a < b}). */
  public record DuplicatePair(long a, long b) {}
}
