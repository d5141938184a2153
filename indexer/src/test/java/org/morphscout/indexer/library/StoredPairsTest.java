package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.DemoImage;
import org.morphscout.demo.EncodedImage;
import org.morphscout.demo.NearDuplicateSet;
import org.morphscout.demo.PlantedPairs;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.catalog.PairStore;
import org.morphscout.indexer.pairing.PairMeasurer;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * The stored pairs against exhaustive live scoring on a seeded library (planted pairs, near-duplicates, distractors
 * and a picture without an object): the same pairs in the same order with the same scores, verdicts and reasons,
 * under the default and under changed settings, with every bound-skipped warp accounted for; and a changed file
 * re-measures only its own pairs.
 */
class StoredPairsTest {
  private static final long SEED = 20261204;

  @TempDir static Path tmp;
  static Path root;
  static RealCatalog catalog;

  @BeforeAll
  static void indexSeededLibrary() throws IOException {
    root = tmp.resolve("library");
    PlantedPairs pp = TestFamilies.plantedPairs(SEED);
    for (int i = 0; i < pp.images().size(); i++) {
      RealCatalog.png(root.resolve("planted/" + i + ".png"), pp.images().get(i).image());
    }
    List<DemoImage> others = TestFamilies.distractors(SEED, 14);
    for (int i = 0; i < others.size(); i++) {
      RealCatalog.png(root.resolve("others/" + i + ".png"), others.get(i).image());
    }
    NearDuplicateSet set = TestFamilies.nearDuplicates(SEED);
    write(root.resolve("dupes"), set.original());
    for (EncodedImage c : set.copies()) {
      write(root.resolve("dupes"), c);
    }
    RealCatalog.png(root.resolve("blank.png"), blank());
    catalog = RealCatalog.index(tmp.resolve("catalog"), root, 8);
  }

  @AfterAll
  static void close() throws IOException {
    catalog.close();
  }

  @Test
  void indexingStoresEveryChosenPairAndMarksTheStoreComplete() {
    PairStore.Counts counts = catalog.library.pairs().counts(PairMeasurer.VERSION);
    int ready = catalog.library.features().readyIds(catalog.context.modelId()).size();
    assertThat(counts.choosers()).isEqualTo(ready);
    assertThat(counts.pairs()).isGreaterThan(ready);
    assertThat(counts.duplicates()).as("the near-duplicate copies").isPositive();
    assertThat(counts.unmeasured()).isZero();
    assertThat(counts.stale()).isZero();
    PairSearchResult stored = catalog.pairs.bestPairs(PairQuery.DEFAULTS, ProgressListener.NONE,
        CancellationToken.none());
    assertThat(stored.notes()).as("answered from the store, no live-scoring note").isEmpty();
  }

  @Test
  void storedAnswersEqualExhaustiveLiveScoring() {
    List<ScoreConfig> configs = List.of(ScoreConfig.DEFAULTS,
        ScoreConfig.DEFAULTS.withOverrides(Map.of("silhouetteMatch.weight", "0.2", "appearance.weight", "4")),
        ScoreConfig.DEFAULTS.withOverrides(Map.of("colour.weight", "0", "warpEffort.weight", "5", "passScore", "80")));
    List<PairQuery> queries = List.of(new PairQuery(20, 5, 0), new PairQuery(20, 50, 45),
        new PairQuery(20, 10_000, 0));
    for (ScoreConfig config : configs) {
      PairService service = new PairService(catalog.context, config);
      for (PairQuery q : queries) {
        PairSearchResult stored = service.bestPairs(q, ProgressListener.NONE, CancellationToken.none());
        PairSearchResult live = service.bestPairsLive(q, ProgressListener.NONE, CancellationToken.none());
        assertThat(stored.notes()).isEmpty();
        assertThat(stored.scored()).isEqualTo(live.scored());
        assertThat(stored.duplicates()).isEqualTo(live.duplicates());
        assertThat(rows(stored)).as("config %s, query %s", config, q).isEqualTo(rows(live));
        assertThat(stored.pairs()).isNotEmpty();
      }
    }
  }

  @Test
  void boundSkippedPairsAreStillScoredWhenEveryPairIsAsked() {
    long bounded = catalog.library.pairs().counts(PairMeasurer.VERSION).bounded();
    PairSearchResult all = catalog.pairs.bestPairs(new PairQuery(20, 100_000, 0), ProgressListener.NONE,
        CancellationToken.none());
    // Every stored pair that is not a near-duplicate is listed, bound-skipped ones warped live.
    long listed = all.pairs().size();
    assertThat(listed + all.duplicates().size()).isEqualTo(all.scored());
    assertThat(bounded).as("the seeded library has pairs too poor to warp at indexing")
        .isPositive()
        .isLessThan(listed);
  }

  @Test
  void partnersOfACatalogImageEqualLiveScoring() {
    PairService service = new PairService(catalog.context, ScoreConfig.DEFAULTS);
    for (long id : catalog.library.features().readyIds(catalog.context.modelId()).subList(0, 6)) {
      var image = catalog.context.cache().get(id).orElseThrow();
      PairQuery q = new PairQuery(20, 8, 0);
      PairSearchResult stored = service.partners(image, q, ProgressListener.NONE, CancellationToken.none());
      PairSearchResult live = service.partnersLive(image, q, ProgressListener.NONE, CancellationToken.none());
      assertThat(stored.notes()).isEmpty();
      assertThat(rows(stored)).isEqualTo(rows(live));
    }
  }

  @Test
  void aChangedFileReMeasuresOnlyItsOwnPairs() throws IOException {
    Path work = tmp.resolve("changing");
    Path lib = work.resolve("library");
    List<Path> files = plantedLibrary(lib, SEED + 1);
    try (RealCatalog first = RealCatalog.index(work.resolve("catalog"), lib, 8)) {
      long changed = first.analysis(files.get(0)).id();
      Map<String, byte[]> before = storedRows(first.library);
      // Replace the picture with another (one of the other files), then index again in the same catalog.
      Files.copy(files.get(3), files.get(0), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
      new LibraryIndexer(first.library, AnalysisSetup.defaults(), IndexOptions.defaults().withThreads(2))
          .index(List.of(lib), ProgressListener.NONE, CancellationToken.none());
      Map<String, byte[]> after = storedRows(first.library);
      int kept = 0;
      for (Map.Entry<String, byte[]> e : before.entrySet()) {
        if (!e.getKey().contains("/" + changed + "/") && after.containsKey(e.getKey())) {
          assertThat(after.get(e.getKey())).as("pair %s untouched", e.getKey()).isEqualTo(e.getValue());
          kept++;
        }
      }
      assertThat(kept).as("pairs of other images kept as stored").isPositive();
      assertThat(first.library.features().setting(LibrarySettings.STORED_PAIRS_COMPLETE)).isPresent();
      assertThat(first.library.pairs().counts(PairMeasurer.VERSION).unmeasured()).isZero();
    }
  }

  @Test
  void pairsMeasuredByAnEarlierVersionAreStaleUntilIndexRefreshesThem() throws IOException {
    Path work = tmp.resolve("stale");
    Path lib = work.resolve("library");
    plantedLibrary(lib, SEED + 2);
    try (RealCatalog c = RealCatalog.index(work.resolve("catalog"), lib, 8)) {
      Map<String, byte[]> before = storedRows(c.library);
      String model = c.context.modelId();
      // What a new release that changed the measuring code finds: rows and the completeness mark of version 0.
      int staled = c.library.catalog().read(conn -> {
        try (var s = conn.createStatement()) {
          s.executeUpdate("UPDATE settings SET value = '0:20:" + model + "' WHERE key = 'stored_pairs_complete'");
          return s.executeUpdate("UPDATE pair_measures SET version = 0 WHERE first_id % 2 = 0");
        }
      });
      assertThat(staled).isPositive();
      assertThat(c.library.pairs().counts(PairMeasurer.VERSION).stale()).isEqualTo(staled);
      StoredPairCounts status = StoredPairCounts.of(c.library);
      assertThat(status.complete()).isFalse();
      assertThat(status.stale()).isEqualTo(staled);
      PairSearchResult live = c.pairs.bestPairs(PairQuery.DEFAULTS, ProgressListener.NONE, CancellationToken.none());
      assertThat(live.notes()).singleElement().asString().startsWith("scored live: ").contains("another version");

      new LibraryIndexer(c.library, AnalysisSetup.defaults(), IndexOptions.defaults().withThreads(2))
          .index(List.of(lib), ProgressListener.NONE, CancellationToken.none());
      assertThat(c.library.pairs().counts(PairMeasurer.VERSION).stale()).isZero();
      assertThat(StoredPairCounts.of(c.library).complete()).isTrue();
      Map<String, byte[]> after = storedRows(c.library);
      assertThat(after.keySet()).isEqualTo(before.keySet());
      before.forEach((k, v) -> assertThat(after.get(k)).as("re-measured %s", k).isEqualTo(v));
      assertThat(c.pairs.bestPairs(PairQuery.DEFAULTS, ProgressListener.NONE, CancellationToken.none()).notes())
          .isEmpty();
    }
  }

  @Test
  void anInterruptedUpgradeKeepsItsFinishedBatchesAndTheNextRunCompletesIt() throws IOException {
    Path work = tmp.resolve("upgrade");
    Path lib = work.resolve("library");
    plantedLibrary(lib, SEED + 3);
    try (RealCatalog c = RealCatalog.index(work.resolve("catalog"), lib, 8)) {
      long all = c.library.pairs().counts(PairMeasurer.VERSION).pairs();
      // A catalog from before stored pairs existed: none stored. Its next index run pairs it, in small batches.
      c.library.pairs().clear();
      String model = c.context.modelId();
      AnalysisCache cache = new AnalysisCache(c.library, 1000);
      CancellationToken cancel = new CancellationToken();
      ProgressListener stopMidway = new ProgressListener() {
        private String phase = "";

        @Override
        public void phase(String name, long total) {
          phase = name;
        }

        @Override
        public void progressed(long done, String item) {
          if (phase.equals("measuring pairs") && done >= 4) {
            cancel.cancel(); // what Ctrl-C does
          }
        }
      };
      try (var index = org.morphscout.indexer.vector.LuceneVectorIndex.open(c.library.catalog().vectorDir(),
          org.morphscout.indexer.vector.LuceneIndexOptions.defaults())) {
        assertThatThrownBy(() -> new PairStoreUpdater(c.library, index, cache, 2, 2).update(model, stopMidway, cancel))
            .isInstanceOf(CancellationToken.CancelledException.class);
        long kept = c.library.pairs().counts(PairMeasurer.VERSION).pairs();
        assertThat(kept).as("pairs of the finished batches").isPositive().isLessThan(all);
        assertThat(StoredPairCounts.of(c.library).complete()).isFalse();
        PairSearchResult meanwhile = c.pairs.bestPairs(PairQuery.DEFAULTS, ProgressListener.NONE,
            CancellationToken.none());
        assertThat(meanwhile.notes()).singleElement().asString().contains("not complete");

        PairStoreUpdater.Result rest = new PairStoreUpdater(c.library, index, cache, 2, 2)
            .update(model, ProgressListener.NONE, CancellationToken.none());
        assertThat(rest.chosen()).as("every image had chosen before the interruption").isZero();
        assertThat(rest.measured() + rest.bounded()).as("only the pairs not stored yet are measured")
            .isLessThanOrEqualTo((int) (all - kept));
      }
      assertThat(c.library.pairs().counts(PairMeasurer.VERSION).pairs()).isEqualTo(all);
      assertThat(StoredPairCounts.of(c.library).complete()).isTrue();
    }
  }

  /** Writes the planted-pairs pictures of {@code seed} into {@code folder} as PNGs; returns their paths. */
  private static List<Path> plantedLibrary(Path folder, long seed) {
    PlantedPairs pp = TestFamilies.plantedPairs(seed);
    List<Path> files = new ArrayList<>();
    for (int i = 0; i < pp.images().size(); i++) {
      files.add(RealCatalog.png(folder.resolve(i + ".png"), pp.images().get(i).image()));
    }
    return files;
  }

  /** Stored rows keyed "/first/second/", measures (or kind) as value. */
  private static Map<String, byte[]> storedRows(Library library) {
    Map<String, byte[]> out = new HashMap<>();
    library.pairs().forEach(r -> out.put("/" + r.first() + "/" + r.second() + "/",
        r.measures() == null ? new byte[] {(byte) r.kind().ordinal()} : r.measures()));
    return out;
  }

  private static List<String> rows(PairSearchResult r) {
    List<String> out = new ArrayList<>();
    for (ScoredPair p : r.pairs()) {
      out.add(p.a() + "-" + p.b() + " " + p.score().score() + " " + p.score().verdict() + " "
          + p.score().components() + " " + p.score().measures() + " " + p.score().reasons());
    }
    return out;
  }

  private static BufferedImage blank() {
    BufferedImage img = new BufferedImage(400, 300, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    g.setColor(new Color(128, 128, 128));
    g.fillRect(0, 0, 400, 300);
    g.dispose();
    return img;
  }

  private static Path write(Path dir, EncodedImage e) throws IOException {
    Files.createDirectories(dir);
    Path file = dir.resolve(e.label() + (e.format().equals("png") ? ".png" : ".jpg"));
    Files.write(file, e.bytes());
    return file;
  }
}
