package org.morphscout.indexer.library;

import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.pairing.PairMeasurer;

/**
 * The state of a catalog's stored pairs, for {@code status}.
 *
 * @param waiting ready images whose candidates are not chosen yet (the next {@code index} pairs them)
 * @param pairs stored pairs of every kind
 * @param bounded stored without a warp: their cheap measures bound the score below the warn score
 * @param duplicates near-duplicate pairs
 * @param stale measured by an earlier version of the measuring code (the next {@code index} measures them again)
 * @param unmeasured chosen pairs not measured yet
 * @param complete whether pair queries are answered from the store (otherwise they are scored live)
 */
public record StoredPairCounts(
    long waiting, long pairs, long bounded, long duplicates, long stale, long unmeasured, boolean complete) {

  public static StoredPairCounts of(Library library) {
    PairStore.Counts c = library.pairs().counts(PairMeasurer.VERSION);
    long ready = LibrarySettings.activeModel(library.features())
        .map(m -> library.features().readyIds(m).size()).orElse(0);
    boolean complete = library.features().setting(LibrarySettings.STORED_PAIRS_COMPLETE)
        .filter(v -> v.startsWith(PairMeasurer.VERSION + ":")).isPresent();
    return new StoredPairCounts(Math.max(0, ready - c.choosers()), c.pairs(), c.bounded(), c.duplicates(), c.stale(),
        c.unmeasured(), complete);
  }
}
