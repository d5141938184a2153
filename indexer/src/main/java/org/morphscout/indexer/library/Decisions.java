package org.morphscout.indexer.library;

import java.util.List;
import java.util.Optional;
import org.morphscout.indexer.catalog.DecisionStore;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;

/**
 * The user's decisions on pairs, as the command line and the browser see them: approve or reject a pair, clear it,
 * list them. A decision follows the two pictures (by content), not their paths; see {@link DecisionStore}, which
 * keeps them. Thread-safe.
 */
public final class Decisions {
  private final DecisionStore store;

  Decisions(DecisionStore store) {
    this.store = store;
  }

  /** Records (or replaces) the decision on the pair of images {@code a} and {@code b} (catalog ids, any order). */
  public void decide(long a, long b, DecisionKind kind, String note) {
    store.decide(a, b, kind, note);
  }

  /** Clears the decision on a pair; false when there was none. */
  public boolean clear(long a, long b) {
    return store.clear(a, b);
  }

  /** The decision on a pair, when there is one. */
  public Optional<Decision> find(long a, long b) {
    return store.find(a, b);
  }

  /** Every decision, newest first. */
  public List<Decision> all() {
    return store.all();
  }

  /** How many decisions the catalog holds. */
  public int count() {
    return store.count();
  }
}
