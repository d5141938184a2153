package org.morphscout.indexer.chain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * An immutable, undirected {@link StepGraph} held in memory as adjacency slices of primitive arrays (about 36 bytes
 * per directed step, so 100,000 images with ~40 steps each take ~150 MB). Built with {@link #builder()}.
 * Thread-safe once built.
 */
public final class InMemoryStepGraph implements StepGraph {
  private final IndexedGraph graph;
  private final Set<Long> nodes;

  private InMemoryStepGraph(IndexedGraph graph) {
    this.graph = graph;
    Set<Long> n = new LinkedHashSet<>(graph.ids.length * 2);
    for (long id : graph.ids) {
      n.add(id);
    }
    this.nodes = Collections.unmodifiableSet(n);
  }

  public static Builder builder() {
    return new Builder();
  }

  @Override
  public List<Edge> neighbours(long id) {
    int u = graph.index(id);
    if (u < 0) {
      return List.of();
    }
    List<Edge> out = new ArrayList<>(graph.offsets[u + 1] - graph.offsets[u]);
    for (int e = graph.offsets[u]; e < graph.offsets[u + 1]; e++) {
      out.add(new Edge(id, graph.ids[graph.targets[e]], graph.mixed[e], graph.components(e)));
    }
    return out;
  }

  @Override
  public Set<Long> nodes() {
    return nodes;
  }

  /** Number of undirected edges. */
  public int edgeCount() {
    return graph.targets.length / 2;
  }

  IndexedGraph indexed() {
    return graph;
  }

  /**
   * Collects nodes and undirected edges. Adding the same pair twice keeps the later components. Self-loops are
   * rejected. Not thread-safe.
   */
  public static final class Builder {
    private final Map<Long, Integer> index = new HashMap<>();
    private long[] ids = new long[16];
    private int nodeCount;
    private int[] from = new int[16];
    private int[] to = new int[16];
    private double[] app = new double[16];
    private double[] shape = new double[16];
    private double[] colour = new double[16];
    private double[] mixed = new double[16];
    private int edgeCount;

    private Builder() {}

    /** Adds a node (also done implicitly by {@link #addEdge}); isolated nodes are kept. */
    public Builder addNode(long id) {
      node(id);
      return this;
    }

    /** Adds the undirected step a–b with the given components (cost = their mixed cost). */
    public Builder addEdge(long a, long b, StepCost components) {
      if (a == b) {
        throw new IllegalArgumentException("a step must join two different images, got " + a + " twice");
      }
      if (components == null) {
        throw new IllegalArgumentException("components must not be null");
      }
      int u = node(a);
      int v = node(b);
      if (edgeCount == from.length) {
        int n = from.length * 2;
        from = Arrays.copyOf(from, n);
        to = Arrays.copyOf(to, n);
        app = Arrays.copyOf(app, n);
        shape = Arrays.copyOf(shape, n);
        colour = Arrays.copyOf(colour, n);
        mixed = Arrays.copyOf(mixed, n);
      }
      from[edgeCount] = u;
      to[edgeCount] = v;
      app[edgeCount] = components.appearanceDistance();
      shape[edgeCount] = components.shapeIncompatibility();
      colour[edgeCount] = components.colourGap();
      mixed[edgeCount] = components.mixedCost();
      edgeCount++;
      return this;
    }

    private int node(long id) {
      Integer i = index.get(id);
      if (i != null) {
        return i;
      }
      if (nodeCount == ids.length) {
        ids = Arrays.copyOf(ids, nodeCount * 2);
      }
      ids[nodeCount] = id;
      index.put(id, nodeCount);
      return nodeCount++;
    }

    public InMemoryStepGraph build() {
      // Renumber nodes by ascending id so the result does not depend on insertion order.
      long[] sorted = Arrays.copyOf(ids, nodeCount);
      Arrays.sort(sorted);
      int[] rank = new int[nodeCount];
      for (int r = 0; r < nodeCount; r++) {
        rank[index.get(sorted[r])] = r;
      }
      // Counting sort of both directions by source node; each slot packs (target << 32 | edge number) so that a
      // per-node sort groups duplicates with the latest addition last.
      int[] degree = new int[nodeCount + 1];
      for (int e = 0; e < edgeCount; e++) {
        degree[rank[from[e]] + 1]++;
        degree[rank[to[e]] + 1]++;
      }
      for (int i = 0; i < nodeCount; i++) {
        degree[i + 1] += degree[i];
      }
      long[] slots = new long[2 * edgeCount];
      int[] fill = Arrays.copyOf(degree, nodeCount);
      for (int e = 0; e < edgeCount; e++) {
        int u = rank[from[e]];
        int v = rank[to[e]];
        slots[fill[u]++] = ((long) v << 32) | e;
        slots[fill[v]++] = ((long) u << 32) | e;
      }
      int[] offsets = new int[nodeCount + 1];
      int m = 0;
      for (int i = 0; i < nodeCount; i++) {
        Arrays.sort(slots, degree[i], degree[i + 1]);
        for (int k = degree[i]; k < degree[i + 1]; k++) {
          boolean lastOfTarget = k + 1 == degree[i + 1] || (slots[k + 1] >>> 32) != (slots[k] >>> 32);
          if (lastOfTarget) {
            slots[m++] = slots[k]; // compacting in place: m <= k always
          }
        }
        offsets[i + 1] = m;
      }
      int[] t = new int[m];
      double[] a = new double[m];
      double[] s = new double[m];
      double[] c = new double[m];
      double[] x = new double[m];
      for (int k = 0; k < m; k++) {
        int e = (int) slots[k];
        t[k] = (int) (slots[k] >>> 32);
        a[k] = app[e];
        s[k] = shape[e];
        c[k] = colour[e];
        x[k] = mixed[e];
      }
      return new InMemoryStepGraph(new IndexedGraph(sorted, offsets, t, a, s, c, x, true));
    }
  }
}
