package org.morphscout.indexer.chain;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A compressed-sparse-row snapshot of a {@link StepGraph}: nodes numbered 0..n-1, each node's steps in one slice of
 * flat primitive arrays. Searches run on this form so a query touches no boxed values. Immutable; safe to share.
 */
final class IndexedGraph {
  final long[] ids; // index -> image id, ascending
  final int[] offsets; // node i's steps are offsets[i] .. offsets[i+1]-1
  final int[] targets;
  final double[] appearance;
  final double[] shape;
  final double[] colour;
  final double[] mixed;
  /** Whether every step u->v has a step v->u with the same components (needed for backward bounds). */
  final boolean symmetric;
  private final Map<Long, Integer> indexOf;

  IndexedGraph(long[] ids, int[] offsets, int[] targets, double[] appearance, double[] shape, double[] colour,
      double[] mixed, boolean symmetric) {
    this.symmetric = symmetric;
    this.ids = ids;
    this.offsets = offsets;
    this.targets = targets;
    this.appearance = appearance;
    this.shape = shape;
    this.colour = colour;
    this.mixed = mixed;
    this.indexOf = new HashMap<>(ids.length * 2);
    for (int i = 0; i < ids.length; i++) {
      indexOf.put(ids[i], i);
    }
  }

  /** Copies any graph into the indexed form (free for {@link InMemoryStepGraph}, which already is one). */
  static IndexedGraph of(StepGraph graph) {
    if (graph instanceof InMemoryStepGraph g) {
      return g.indexed();
    }
    long[] ids = graph.nodes().stream().mapToLong(Long::longValue).sorted().toArray();
    Map<Long, Integer> index = new HashMap<>(ids.length * 2);
    for (int i = 0; i < ids.length; i++) {
      index.put(ids[i], i);
    }
    int[] offsets = new int[ids.length + 1];
    List<List<Edge>> lists = new java.util.ArrayList<>(ids.length);
    for (int i = 0; i < ids.length; i++) {
      List<Edge> out = graph.neighbours(ids[i]).stream().filter(e -> index.containsKey(e.to())).toList();
      lists.add(out);
      offsets[i + 1] = offsets[i] + out.size();
    }
    int m = offsets[ids.length];
    int[] targets = new int[m];
    double[] a = new double[m];
    double[] s = new double[m];
    double[] c = new double[m];
    double[] x = new double[m];
    int k = 0;
    for (List<Edge> out : lists) {
      for (Edge e : out) {
        targets[k] = index.get(e.to());
        a[k] = e.components().appearanceDistance();
        s[k] = e.components().shapeIncompatibility();
        c[k] = e.components().colourGap();
        x[k] = e.cost();
        k++;
      }
    }
    return new IndexedGraph(ids, offsets, targets, a, s, c, x, isSymmetric(offsets, targets, a, s, c));
  }

  private static boolean isSymmetric(int[] offsets, int[] targets, double[] a, double[] s, double[] c) {
    Map<Long, Integer> slot = new HashMap<>(targets.length * 2);
    for (int u = 0; u + 1 < offsets.length; u++) {
      for (int e = offsets[u]; e < offsets[u + 1]; e++) {
        slot.put(((long) u << 32) | targets[e], e);
      }
    }
    for (int u = 0; u + 1 < offsets.length; u++) {
      for (int e = offsets[u]; e < offsets[u + 1]; e++) {
        Integer back = slot.get(((long) targets[e] << 32) | u);
        if (back == null || a[back] != a[e] || s[back] != s[e] || c[back] != c[e]) {
          return false;
        }
      }
    }
    return true;
  }

  int size() {
    return ids.length;
  }

  /** The node index of {@code id}, or -1 when absent. */
  int index(long id) {
    Integer i = indexOf.get(id);
    return i == null ? -1 : i;
  }

  StepCost components(int edge) {
    return new StepCost(appearance[edge], shape[edge], colour[edge], mixed[edge]);
  }
}
