package org.morphscout.indexer.chain;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.junit.jupiter.api.Test;

class NeighbourGraphBuilderTest {

  @Test
  void incrementalAddAndRemoveEqualARebuildFromScratch() {
    long seed = 20261201L;
    SyntheticFamily f = new SyntheticFamily(seed, 70, 20);
    List<Long> all = f.ids();
    Set<Long> present = new HashSet<>(all.subList(0, 40));
    NeighbourGraphConfig config = new NeighbourGraphConfig(6, all.size()); // exact reverse scan
    NeighbourGraphBuilder incremental = new NeighbourGraphBuilder(f.source(present), config);
    incremental.buildAll(new ArrayList<>(present), ProgressListener.NONE, CancellationToken.none());

    for (long id : all.subList(40, all.size())) {
      present.add(id);
      incremental.add(id);
    }
    Random r = new Random(seed);
    List<Long> shuffled = new ArrayList<>(all);
    java.util.Collections.shuffle(shuffled, r);
    for (long id : shuffled.subList(0, 25)) {
      present.remove(id);
      incremental.remove(id);
    }

    NeighbourGraphBuilder fresh = new NeighbourGraphBuilder(f.source(present), config);
    fresh.buildAll(new ArrayList<>(present), ProgressListener.NONE, CancellationToken.none());
    for (long id : present) {
      assertThat(incremental.nearestOf(id)).as("k-NN list of %d (seed %d)", id, seed)
          .isEqualTo(fresh.nearestOf(id));
    }
    InMemoryStepGraph a = incremental.graph();
    InMemoryStepGraph b = fresh.graph();
    assertThat(a.nodes()).isEqualTo(b.nodes()).isEqualTo(present);
    for (long id : present) {
      assertThat(a.neighbours(id)).as("adjacency of %d (seed %d)", id, seed).isEqualTo(b.neighbours(id));
    }
  }

  @Test
  void graphIsTheSymmetrisedKnnRelation() {
    SyntheticFamily f = new SyntheticFamily(7, 30, 10);
    Set<Long> present = new HashSet<>(f.ids());
    NeighbourGraphBuilder b = new NeighbourGraphBuilder(f.source(present), NeighbourGraphConfig.of(4));
    b.buildAll(f.ids(), ProgressListener.NONE, CancellationToken.none());
    InMemoryStepGraph g = b.graph();
    int directed = 0;
    for (long a : present) {
      Set<Long> expected = new HashSet<>();
      b.nearestOf(a).forEach(c -> expected.add(c.id()));
      for (long o : present) {
        if (b.nearestOf(o).stream().anyMatch(c -> c.id() == a)) {
          expected.add(o);
        }
      }
      Set<Long> actual = new HashSet<>();
      g.neighbours(a).forEach(e -> actual.add(e.to()));
      assertThat(actual).as("neighbours of %d", a).isEqualTo(expected);
      assertThat(b.nearestOf(a)).hasSize(4);
      directed += actual.size();
    }
    assertThat(g.edgeCount() * 2).isEqualTo(directed);
  }

  @Test
  void removeRequeriesOnlyTheImagesThatListedTheRemovedOne() {
    SyntheticFamily f = new SyntheticFamily(11, 40, 0);
    Set<Long> present = new HashSet<>(f.ids());
    AtomicInteger queries = new AtomicInteger();
    NeighbourSource exact = f.source(present);
    NeighbourSource counting = (id, k) -> {
      queries.incrementAndGet();
      return exact.nearest(id, k);
    };
    NeighbourGraphBuilder b = new NeighbourGraphBuilder(counting, NeighbourGraphConfig.of(5));
    b.buildAll(f.ids(), ProgressListener.NONE, CancellationToken.none());
    long victim = 17;
    long listers = present.stream().filter(o -> b.nearestOf(o).stream().anyMatch(c -> c.id() == victim)).count();
    assertThat(listers).as("images listing %d among their nearest (family seed 11)", victim).isPositive();
    queries.set(0);
    present.remove(victim);
    b.remove(victim);
    assertThat(queries.get()).isEqualTo((int) listers);
    assertThat(b.size()).isEqualTo(39);
    for (long o : present) {
      assertThat(b.nearestOf(o)).noneMatch(c -> c.id() == victim);
    }
  }
}
