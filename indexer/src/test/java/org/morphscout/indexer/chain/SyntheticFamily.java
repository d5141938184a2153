package org.morphscout.indexer.chain;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

/**
 * Invented test data: a "family" of images ordered by a hidden parameter t in [0, 1] (think of a pose turning
 * from left to right), plus distractors that look unlike the family. Step components grow with |Δt| plus seeded
 * noise. Image 0 has t = 0 and image 1 has t = 1.
 */
final class SyntheticFamily {
  final Map<Long, Double> t = new HashMap<>();
  final Map<Long, Boolean> distractor = new HashMap<>();
  private final Map<Long, Double> noise = new HashMap<>();
  private final long seed;

  SyntheticFamily(long seed, int familySize, int distractors) {
    this.seed = seed;
    Random r = new Random(seed);
    t.put(0L, 0.0);
    t.put(1L, 1.0);
    for (long id = 2; id < familySize; id++) {
      t.put(id, r.nextDouble());
    }
    for (long id = familySize; id < familySize + distractors; id++) {
      t.put(id, r.nextDouble());
      distractor.put(id, true);
    }
    for (long id : t.keySet()) {
      distractor.putIfAbsent(id, false);
      noise.put(id, r.nextDouble());
    }
  }

  List<Long> ids() {
    List<Long> ids = new ArrayList<>(t.keySet());
    ids.sort(null);
    return ids;
  }

  /** Symmetric components of the step a–b: |Δt| plus a small pair-specific jitter, distractors far off. */
  StepCost components(long a, long b) {
    double dt = Math.abs(t.get(a) - t.get(b));
    long lo = Math.min(a, b);
    long hi = Math.max(a, b);
    double jitter = 0.03 * new Random(seed * 31 + lo * 1_000_003L + hi).nextDouble();
    double off = (distractor.get(a) ? 0.4 : 0) + (distractor.get(b) ? 0.4 : 0);
    double app = Math.min(2, dt + jitter + off + 0.02 * (noise.get(a) + noise.get(b)));
    double shape = Math.min(1, 0.8 * dt + jitter + off / 2);
    return StepCostModel.DEFAULT.mix(app, shape, 10 * dt);
  }

  /** Exact k-NN by the mixed cost over the images currently in {@code present}. */
  NeighbourSource source(java.util.Set<Long> present) {
    return (id, k) -> present.stream()
        .filter(o -> o != id)
        .map(o -> new NeighbourSource.Candidate(o, components(id, o)))
        .sorted(java.util.Comparator.comparingDouble((NeighbourSource.Candidate c) -> c.components().mixedCost())
            .thenComparingLong(NeighbourSource.Candidate::id))
        .limit(k)
        .toList();
  }

  /** The k-NN graph of all images. */
  InMemoryStepGraph knnGraph(int k) {
    NeighbourGraphBuilder b = new NeighbourGraphBuilder(source(new java.util.HashSet<>(ids())),
        NeighbourGraphConfig.of(k));
    b.buildAll(ids(), org.morphscout.indexer.progress.ProgressListener.NONE,
        org.morphscout.indexer.progress.CancellationToken.none());
    return b.graph();
  }
}
