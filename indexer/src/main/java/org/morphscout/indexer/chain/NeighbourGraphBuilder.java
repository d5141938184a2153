package org.morphscout.indexer.chain;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.morphscout.indexer.chain.NeighbourSource.Candidate;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Keeps each image's k nearest neighbours (a k-NN graph) up to date and turns them into a symmetric
 * {@link StepGraph}: if b is among a's k nearest, the step a–b exists in both directions (the union of the two
 * k-NN relations), so a chain can always walk back the way it came.
 *
 * <p>Incremental: {@link #add} queries the new image's neighbours and re-queries only the images the newcomer may
 * displace (see {@link NeighbourGraphConfig#reverseScan()}); {@link #remove} drops the image and re-queries only
 * the images that listed it. With an exact, symmetric source and a large enough reverse scan the result equals a
 * rebuild from scratch.
 *
 * <p>Neighbour lists are ordered by ({@link StepCost#mixedCost()}, id) so ties break the same way every time.
 * Not thread-safe: one writer at a time.
 */
public final class NeighbourGraphBuilder {
  private static final Comparator<Candidate> ORDER =
      Comparator.comparingDouble((Candidate c) -> c.components().mixedCost()).thenComparingLong(Candidate::id);

  private final NeighbourSource source;
  private final NeighbourGraphConfig config;
  private final Map<Long, List<Candidate>> nearest = new HashMap<>();
  private final Map<Long, Set<Long>> listedBy = new HashMap<>();

  public NeighbourGraphBuilder(NeighbourSource source, NeighbourGraphConfig config) {
    if (source == null || config == null) {
      throw new IllegalArgumentException("source and config must not be null");
    }
    this.source = source;
    this.config = config;
  }

  /**
   * Builds the lists of all {@code ids} from scratch (one source query each), replacing any earlier state. On
   * cancellation the lists built so far stay (every image is known; unqueried ones have empty lists until
   * {@link #add} refreshes them).
   */
  public void buildAll(Collection<Long> ids, ProgressListener progress, CancellationToken cancel) {
    nearest.clear();
    listedBy.clear();
    for (long id : ids) {
      nearest.put(id, List.of());
    }
    progress.phase("neighbour graph", ids.size());
    try {
      long done = 0;
      for (long id : ids) {
        cancel.throwIfCancelled();
        setList(id, query(id));
        progress.progressed(++done, Long.toString(id));
      }
    } finally {
      progress.finished();
    }
  }

  /** Adds (or refreshes) one image; the source must already know it. */
  public void add(long id) {
    nearest.putIfAbsent(id, List.of());
    setList(id, query(id));
    int k = config.neighbours();
    for (Candidate c : source.nearest(id, config.reverseScan())) {
      List<Candidate> theirs = nearest.get(c.id());
      if (c.id() == id || theirs == null) {
        continue;
      }
      boolean listed = theirs.stream().anyMatch(t -> t.id() == id);
      Candidate worst = theirs.isEmpty() ? null : theirs.get(theirs.size() - 1);
      boolean mayEnter = theirs.size() < k || ORDER.compare(new Candidate(id, c.components()), worst) < 0;
      if (!listed && mayEnter) {
        setList(c.id(), query(c.id()));
      }
    }
  }

  /** Removes one image; the source must already have forgotten it. Unknown ids are ignored. */
  public void remove(long id) {
    List<Candidate> own = nearest.remove(id);
    if (own == null) {
      return;
    }
    for (Candidate c : own) {
      Set<Long> s = listedBy.get(c.id());
      if (s != null) {
        s.remove(id);
      }
    }
    Set<Long> lost = listedBy.remove(id);
    if (lost != null) {
      for (long y : new TreeSet<>(lost)) {
        if (nearest.containsKey(y)) {
          setList(y, query(y));
        }
      }
    }
  }

  /** The current k nearest of {@code id}, closest first (empty when unknown). */
  public List<Candidate> nearestOf(long id) {
    return nearest.getOrDefault(id, List.of());
  }

  /** Number of images held. */
  public int size() {
    return nearest.size();
  }

  /** A snapshot of the symmetric step graph over the current images. */
  public InMemoryStepGraph graph() {
    InMemoryStepGraph.Builder b = InMemoryStepGraph.builder();
    List<Long> ids = new ArrayList<>(nearest.keySet());
    ids.sort(null);
    for (long a : ids) {
      b.addNode(a);
    }
    for (long a : ids) {
      for (Candidate c : nearest.get(a)) {
        // An edge listed from both ends is added twice; the builder keeps the later one, and the order is fixed
        // (ascending id), so a rebuild and an incremental update agree.
        b.addEdge(a, c.id(), c.components());
      }
    }
    return b.build();
  }

  private List<Candidate> query(long id) {
    List<Candidate> raw = source.nearest(id, config.neighbours());
    List<Candidate> kept = new ArrayList<>(raw.size());
    Set<Long> seen = new HashSet<>();
    for (Candidate c : raw) {
      if (c.id() != id && nearest.containsKey(c.id()) && seen.add(c.id())) {
        kept.add(c);
      }
    }
    kept.sort(ORDER);
    return List.copyOf(kept.subList(0, Math.min(kept.size(), config.neighbours())));
  }

  private void setList(long id, List<Candidate> list) {
    List<Candidate> old = nearest.put(id, list);
    if (old != null) {
      for (Candidate c : old) {
        Set<Long> s = listedBy.get(c.id());
        if (s != null) {
          s.remove(id);
        }
      }
    }
    for (Candidate c : list) {
      listedBy.computeIfAbsent(c.id(), x -> new HashSet<>()).add(id);
    }
  }
}
