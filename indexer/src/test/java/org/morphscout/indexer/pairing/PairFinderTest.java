package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.warp.TestMasks;
import org.morphscout.indexer.warp.WarpEstimator;

class PairFinderTest {
  private static final long SEED = 4242L;
  private final PairScorer scorer =
      new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
  private final NearDuplicates dups = new NearDuplicates(NearDuplicateConfig.DEFAULTS, Ciede2000::difference);

  /** A library with two planted compatible pairs (1,2) and (3,4), a duplicate (5,6) and unrelated images. */
  private static Map<Long, ImageAnalysis> library() {
    Map<Long, ImageAnalysis> lib = new HashMap<>();
    float[] vaseLook = Analyses.look(100);
    lib.put(1L, Analyses.builder(1).object(TestMasks.vase(0.1)).appearance(vaseLook).build());
    lib.put(2L, Analyses.builder(2).object(TestMasks.vase(0.2)).foreground(52, 11, 19)
        .appearance(Analyses.perturbed(vaseLook, 0.1, SEED)).build());
    float[] eggLook = Analyses.look(200);
    lib.put(3L, Analyses.builder(3).object(new Ellipse2D.Double(-20, -35, 40, 70)).foreground(70, -10, 40)
        .appearance(eggLook).build());
    lib.put(4L, Analyses.builder(4).object(new Ellipse2D.Double(-19, -34, 38, 70)).foreground(68, -12, 42)
        .shift(0.05, 0).appearance(Analyses.perturbed(eggLook, 0.1, SEED + 1)).build());
    lib.put(5L, Analyses.builder(5).object(new Rectangle2D.Double(-30, -10, 60, 20)).foreground(30, 40, 10)
        .appearance(Analyses.look(300)).hash("same-file").build());
    lib.put(6L, Analyses.builder(6).object(new Rectangle2D.Double(-30, -10, 60, 20)).foreground(30, 40, 10)
        .appearance(Analyses.look(300)).hash("same-file").build());
    lib.put(7L, Analyses.builder(7).object(new Rectangle2D.Double(-5, -40, 10, 80)).foreground(20, 0, -30)
        .size(1080, 1920).appearance(Analyses.look(400)).build());
    lib.put(8L, Analyses.builder(8).object(TestMasks.boot()).foreground(85, 5, 5).cutOff()
        .appearance(Analyses.look(500)).build());
    lib.put(9L, Analyses.builder(9).object(new Ellipse2D.Double(-40, -10, 80, 20)).foreground(40, 60, 40)
        .components(3).appearance(Analyses.look(600)).build());
    return lib;
  }

  /** Candidates in shuffled order, unrelated to quality, so the ranking must come from the exact scores. */
  private static CandidateSource everyone(Set<Long> ids) {
    return (id, k) -> {
      List<Long> others = new ArrayList<>(ids);
      others.remove(id);
      Collections.shuffle(others, new Random(SEED + id));
      return others.subList(0, Math.min(k, others.size()));
    };
  }

  @Test
  void plantedPairsRankFirstAndDuplicatesAreListedApart() {
    Map<Long, ImageAnalysis> lib = library();
    PairFinder finder = new PairFinder(scorer, dups, everyone(lib.keySet()), lib::get, 2);
    List<String> phases = new CopyOnWriteArrayList<>();
    ProgressListener listener = new ProgressListener() {
      @Override
      public void phase(String name, long total) {
        phases.add(name + ":" + total);
      }
    };
    PairSearchResult r = finder.findPairs(lib.keySet(), new PairQuery(10, 5, 0), listener,
        CancellationToken.none());
    assertThat(r.pairs()).as("seed %s", SEED).hasSizeGreaterThanOrEqualTo(2);
    assertThat(Set.of(key(r.pairs().get(0)), key(r.pairs().get(1)))).as("seed %s", SEED)
        .containsExactlyInAnyOrder("1-2", "3-4");
    assertThat(r.duplicates()).containsExactly(new PairSearchResult.DuplicatePair(5, 6));
    assertThat(r.pairs()).noneMatch(p -> key(p).equals("5-6"));
    // 9 images, all unordered pairs: 36, each scored once.
    assertThat(r.scored()).isEqualTo(36);
    assertThat(phases).containsExactly("finding candidates:9", "scoring pairs:36");
    for (int i = 1; i < r.pairs().size(); i++) {
      assertThat(r.pairs().get(i).score().score()).isLessThanOrEqualTo(r.pairs().get(i - 1).score().score());
    }
  }

  @Test
  void bestPartnersOfOneImage() {
    Map<Long, ImageAnalysis> lib = library();
    PairFinder finder = new PairFinder(scorer, dups, everyone(Set.of(1L, 3L, 4L, 7L, 9L)), lib::get, 2);
    PairSearchResult r = finder.findPartners(3, new PairQuery(20, 3, 0), ProgressListener.NONE,
        CancellationToken.none());
    assertThat(r.pairs()).hasSize(3);
    assertThat(r.pairs().get(0).a()).isEqualTo(3);
    assertThat(r.pairs().get(0).b()).isEqualTo(4);
  }

  @Test
  void minScoreAndTopNLimitTheList() {
    Map<Long, ImageAnalysis> lib = library();
    Set<Long> some = Set.of(1L, 2L, 3L, 7L);
    PairFinder finder = new PairFinder(scorer, dups, everyone(some), lib::get, 1);
    PairSearchResult r = finder.findPairs(some, new PairQuery(10, 50, 60), ProgressListener.NONE,
        CancellationToken.none());
    assertThat(r.scored()).isEqualTo(6);
    assertThat(r.pairs()).isNotEmpty().hasSizeLessThan(6)
        .allSatisfy(p -> assertThat(p.score().score()).isGreaterThanOrEqualTo(60));
    PairSearchResult one = finder.findPairs(some, new PairQuery(10, 1, 0), ProgressListener.NONE,
        CancellationToken.none());
    assertThat(one.pairs()).hasSize(1);
  }

  @Test
  void loaderFailuresAreReportedNotThrown() {
    Map<Long, ImageAnalysis> lib = library();
    PairFinder finder = new PairFinder(scorer, dups, (id, k) -> List.of(id == 1 ? 2L : 1L, 99L), id -> {
      if (id == 99) {
        throw new MorphscoutException("cannot read /photos/img99.jpg: file is missing");
      }
      return lib.get(id);
    }, 2);
    PairSearchResult r = finder.findPairs(List.of(1L, 2L), PairQuery.DEFAULTS, ProgressListener.NONE,
        CancellationToken.none());
    assertThat(r.pairs()).extracting(PairFinderTest::key).containsExactly("1-2");
    assertThat(r.failures()).isNotEmpty().allMatch(f -> f.contains("img99.jpg"));
  }

  @Test
  void cancellationStopsTheSearch() {
    Map<Long, ImageAnalysis> lib = library();
    PairFinder finder = new PairFinder(scorer, dups, everyone(lib.keySet()), lib::get, 2);
    CancellationToken token = new CancellationToken();
    token.cancel();
    assertThatThrownBy(() -> finder.findPairs(lib.keySet(), PairQuery.DEFAULTS, ProgressListener.NONE, token))
        .isInstanceOf(CancellationToken.CancelledException.class);
  }

  private static String key(ScoredPair p) {
    return Math.min(p.a(), p.b()) + "-" + Math.max(p.a(), p.b());
  }
}
