package org.morphscout.app.gui.service;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
import org.jgrapht.GraphPath;
import org.jgrapht.alg.shortestpath.YenShortestPathIterator;
import org.jgrapht.graph.DefaultWeightedEdge;
import org.jgrapht.graph.SimpleWeightedGraph;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.FeatureStore;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Interim chain search until the chain service lands: a k-nearest-neighbour graph over the stored vectors, edges
 * weighted by the squared step size (squaring favours several even steps over one long jump), and loopless paths in
 * order of total weight (Yen 1971, JGraphT's {@link YenShortestPathIterator}). Paths outside the request's step bounds
 * or missing a required image are skipped; at most {@link #OVERDRAW} times the wanted number are examined.
 */
public final class GraphChains implements ChainsBackend {
  static final int BRUTE_FORCE_LIMIT = 4000;
  private static final int NEIGHBOURS = 8;
  /** How many more paths than wanted to draw, so that filtering by bounds and requirements leaves enough. */
  static final int OVERDRAW = 40;

  private final Supplier<StoredVectors> vectors;

  public GraphChains(Supplier<StoredVectors> vectors) {
    this.vectors = vectors;
  }

  @Override
  public List<ChainCandidate> find(long start, long end, ChainRequest request, CancellationToken token) {
    if (start == end) {
      throw new MorphscoutException("start and end are the same image; choose two different images");
    }
    StoredVectors all = vectors.get();
    for (long id : new long[] {start, end}) {
      if (all.get(id).isEmpty()) {
        throw new MorphscoutException("image " + id + " has not been analysed yet; it cannot start or end a chain");
      }
      if (request.avoid().contains(id)) {
        throw new MorphscoutException("image " + id + " is an endpoint and cannot be avoided");
      }
    }
    if (all.size() > BRUTE_FORCE_LIMIT) {
      throw new MorphscoutException("chains over " + all.size() + " images need the chain service of a newer build");
    }
    SimpleWeightedGraph<Long, DefaultWeightedEdge> graph = graph(all, request, token);
    YenShortestPathIterator<Long, DefaultWeightedEdge> paths = new YenShortestPathIterator<>(graph, start, end);
    List<ChainCandidate> result = new ArrayList<>();
    int examined = 0;
    while (paths.hasNext() && examined++ < request.alternatives() * OVERDRAW) {
      token.throwIfCancelled();
      GraphPath<Long, DefaultWeightedEdge> p = paths.next();
      List<Long> ids = p.getVertexList();
      int steps = ids.size() - 1;
      if (steps < request.minSteps() || steps > request.maxSteps() || !ids.containsAll(request.require())) {
        continue;
      }
      result.add(candidate(ids, all, request.shapeWeight()));
      if (result.size() == request.alternatives()) {
        break;
      }
    }
    return result;
  }

  private static SimpleWeightedGraph<Long, DefaultWeightedEdge> graph(StoredVectors all, ChainRequest request,
      CancellationToken token) {
    SimpleWeightedGraph<Long, DefaultWeightedEdge> g = new SimpleWeightedGraph<>(DefaultWeightedEdge.class);
    List<Long> ids = new ArrayList<>();
    for (FeatureStore.Vectors v : all.all()) {
      if (!request.avoid().contains(v.imageId())) {
        ids.add(v.imageId());
        g.addVertex(v.imageId());
      }
    }
    Set<Long> required = new HashSet<>(request.require());
    for (long a : ids) {
      token.throwIfCancelled();
      // the k nearest by the request's weighting; required images get a few extra links so they stay reachable
      int k = required.contains(a) ? NEIGHBOURS * 2 : NEIGHBOURS;
      List<double[]> near = new ArrayList<>();
      for (long b : ids) {
        if (a != b) {
          near.add(new double[] {b, all.distance(a, b, request.shapeWeight())});
        }
      }
      near.sort((x, y) -> Double.compare(x[1], y[1]));
      for (int i = 0; i < Math.min(k, near.size()); i++) {
        long b = (long) near.get(i)[0];
        if (!g.containsEdge(a, b)) {
          DefaultWeightedEdge e = g.addEdge(a, b);
          double d = near.get(i)[1];
          g.setEdgeWeight(e, d * d + 1e-6);
        }
      }
    }
    return g;
  }

  static ChainCandidate candidate(List<Long> ids, StoredVectors all, double shapeWeight) {
    List<ChainStep> steps = new ArrayList<>();
    for (int i = 0; i + 1 < ids.size(); i++) {
      double[] d = all.distances(ids.get(i), ids.get(i + 1));
      Map<String, Double> c = new LinkedHashMap<>();
      c.put("appearance", d[0]);
      c.put("shape", d[1]);
      steps.add(new ChainStep(ids.get(i), ids.get(i + 1), (1 - shapeWeight) * d[0] + shapeWeight * d[1], c));
    }
    return ChainCandidate.of(ids, steps);
  }
}
