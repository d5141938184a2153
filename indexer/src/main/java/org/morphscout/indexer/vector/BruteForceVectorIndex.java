package org.morphscout.indexer.vector;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.PriorityQueue;
import java.util.Set;

/**
 * Exact nearest-neighbour search by scanning every vector: the reference that the HNSW index is checked against in
 * tests and benchmarks, and a fine choice for small in-memory sets (a scan of 10,000 vectors of 512 dimensions takes
 * a few milliseconds). Nothing is written to disk.
 *
 * <p>Same contract as {@link LuceneVectorIndex}: changes are staged and become visible at {@link #commit()}; {@link
 * #close()} discards uncommitted changes; an upsert with both vectors null removes the image; {@link #clear()} also
 * forgets the vector dimensions.
 *
 * <p>Thread-safety: writes and commits are synchronised; searches read an immutable committed snapshot without
 * locking.
 */
public final class BruteForceVectorIndex implements VectorIndex {

  /** One image's unit vectors; either may be null. */
  private record Entry(float[] appearance, float[] shape) {
    float[] get(Field field) {
      return field == Field.APPEARANCE ? appearance : shape;
    }
  }

  /** An immutable committed state: the entries and the dimension of each field (0 = none yet). */
  private record Snapshot(Map<Long, Entry> entries, int[] dims) {}

  private final Map<Long, Entry> pending = new HashMap<>();
  private final FieldDimensions dimensions = new FieldDimensions();
  private volatile Snapshot committed = new Snapshot(Map.of(), new int[Field.values().length]);

  @Override
  public synchronized void upsert(long id, float[] appearance, float[] shape) {
    if (appearance == null && shape == null) {
      delete(id);
      return;
    }
    float[] a = appearance == null ? null : VectorMath.unitCopy(appearance, "Image " + id + ": appearance vector");
    float[] s = shape == null ? null : VectorMath.unitCopy(shape, "Image " + id + ": shape vector");
    dimensions.admit(id, a, s);
    pending.put(id, new Entry(a, s));
  }

  @Override
  public synchronized void delete(long id) {
    pending.remove(id);
  }

  @Override
  public synchronized void commit() {
    // Copying on commit keeps searches lock-free; entries are never mutated, so a shallow copy suffices.
    committed = new Snapshot(Map.copyOf(pending), dimensions.snapshot());
  }

  @Override
  public synchronized void clear() {
    pending.clear();
    dimensions.reset();
  }

  @Override
  public List<Hit> search(Field field, float[] query, int k, Set<Long> exclude) {
    Objects.requireNonNull(field, "field");
    if (k < 1) {
      throw new IllegalArgumentException("k must be at least 1: " + k);
    }
    Snapshot snapshot = committed;
    int indexed = snapshot.dims()[field.ordinal()];
    if (indexed == 0) {
      return List.of();
    }
    if (indexed != query.length) {
      throw FieldDimensions.queryMismatch(field, indexed, query.length);
    }
    float[] unitQuery = VectorMath.unitCopy(query, "The " + FieldDimensions.label(field) + " query vector");
    // Min-heap of the best k so far: its head is the worst kept hit, evicted when a better one arrives.
    PriorityQueue<Hit> best = new PriorityQueue<>(k + 1, ExactRescorer.BEST_FIRST.reversed());
    for (Map.Entry<Long, Entry> e : snapshot.entries().entrySet()) {
      float[] v = e.getValue().get(field);
      if (v == null || (exclude != null && exclude.contains(e.getKey()))) {
        continue;
      }
      best.add(new Hit(e.getKey(), VectorMath.clampCosine(VectorMath.dot(unitQuery, v))));
      if (best.size() > k) {
        best.poll();
      }
    }
    List<Hit> hits = new ArrayList<>(best);
    hits.sort(ExactRescorer.BEST_FIRST);
    return List.copyOf(hits);
  }

  @Override
  public Set<Long> ids() {
    return Set.copyOf(committed.entries().keySet());
  }

  /** Number of images in the committed state. */
  public int count() {
    return committed.entries().size();
  }

  /** Discards uncommitted changes; the committed state stays searchable (nothing to release). */
  @Override
  public synchronized void close() {
    pending.clear();
    pending.putAll(committed.entries());
  }
}
