package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.EncodedImage;
import org.morphscout.demo.NearDuplicateSet;
import org.morphscout.demo.PlantedPairs;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoredPair;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * Pair discovery end to end on real analyses (issue text: "Pair discovery on a generated library finds the pairs
 * planted as most compatible; near-duplicates are excluded"), over {@link TestFamilies#plantedPairs} and
 * {@link TestFamilies#nearDuplicates} written as files and indexed.
 */
class PairDiscoveryOnRealImagesTest {
  private static final long SEED = 8502;

  @TempDir static Path tmp;
  static RealCatalog catalog;
  static final Set<Set<Long>> planted = new HashSet<>();
  static final Set<Long> duplicateGroup = new HashSet<>();
  static PairSearchResult result;

  @BeforeAll
  static void indexPlantedPairsAndDuplicates() throws IOException {
    Path root = tmp.resolve("library");
    PlantedPairs pp = TestFamilies.plantedPairs(SEED);
    List<Path> files = new ArrayList<>();
    for (int i = 0; i < pp.images().size(); i++) {
      files.add(RealCatalog.png(root.resolve("planted/" + i + "-" + pp.images().get(i).label() + ".png"),
          pp.images().get(i).image()));
    }
    NearDuplicateSet set = TestFamilies.nearDuplicates(SEED);
    List<Path> group = new ArrayList<>();
    group.add(write(root.resolve("dupes"), set.original()));
    for (EncodedImage c : set.copies()) {
      group.add(write(root.resolve("dupes"), c));
    }
    for (EncodedImage u : set.unrelated()) {
      write(root.resolve("dupes"), u);
    }
    catalog = RealCatalog.index(tmp.resolve("catalog"), root, 8);
    for (PlantedPairs.Pair p : pp.pairs()) {
      planted.add(Set.of(catalog.analysis(files.get(p.first())).id(), catalog.analysis(files.get(p.second())).id()));
    }
    group.forEach(p -> duplicateGroup.add(catalog.analysis(p).id()));
    result = catalog.pairs.bestPairs(new PairQuery(10, 200, 0), ProgressListener.NONE, CancellationToken.none());
  }

  private static Path write(Path dir, EncodedImage e) throws IOException {
    Files.createDirectories(dir);
    Path file = dir.resolve(e.label() + (e.format().equals("png") ? ".png" : ".jpg"));
    Files.write(file, e.bytes());
    return file.toAbsolutePath().normalize();
  }

  private static Set<Long> ends(ScoredPair p) {
    return Set.of(p.a(), p.b());
  }

  @Test
  void plantedPairsRankAtTheTop() {
    // Ground truth of TestFamilies.plantedPairs: four pairs planted as the most compatible of the library (same
    // archetype within 2 %, same backdrop and light, glaze shifted slightly). Pairs inside the near-duplicate group
    // are never proposed, so the four best pairs found are exactly the planted ones.
    List<ScoredPair> pairs = result.pairs();
    assertThat(pairs).hasSizeGreaterThanOrEqualTo(planted.size());
    Set<Set<Long>> top = new HashSet<>();
    for (int i = 0; i < planted.size(); i++) {
      top.add(ends(pairs.get(i)));
    }
    assertThat(top).as("seed %d; best pairs %s", SEED, pairs.subList(0, Math.min(8, pairs.size())))
        .isEqualTo(planted);
    for (int i = 1; i < pairs.size(); i++) {
      assertThat(pairs.get(i).score().score()).isLessThanOrEqualTo(pairs.get(i - 1).score().score());
    }
  }

  @Test
  void nearDuplicatesAreListedApartAndNeverPaired() {
    Set<Long> seen = new HashSet<>();
    result.duplicates().forEach(d -> {
      if (duplicateGroup.contains(d.a()) && duplicateGroup.contains(d.b())) {
        seen.add(d.a());
        seen.add(d.b());
      }
    });
    // TestFamilies.nearDuplicates: the original and each of its five edited copies are the same picture.
    assertThat(seen).as("seed %d", SEED).isEqualTo(duplicateGroup);
    assertThat(result.pairs()).as("pairs to check against the near-duplicate group").isNotEmpty();
    for (ScoredPair p : result.pairs()) {
      assertThat(duplicateGroup.containsAll(ends(p))).as("duplicates proposed as a pair: %s", p).isFalse();
    }
    // No planted pair (two different vessels) is mistaken for a duplicate.
    result.duplicates().forEach(d -> assertThat(planted).doesNotContain(Set.of(d.a(), d.b())));
  }

  @Test
  void partnersOfAPlantedImageStartWithItsTwin() {
    for (Set<Long> pair : planted) {
      List<Long> ab = new ArrayList<>(pair);
      PairSearchResult partners = catalog.pairs.partners(catalog.context.cache().get(ab.get(0)).orElseThrow(),
          new PairQuery(20, 5, 0), ProgressListener.NONE, CancellationToken.none());
      assertThat(partners.pairs()).isNotEmpty();
      assertThat(ends(partners.pairs().get(0))).as("seed %d", SEED).isEqualTo(pair);
    }
  }
}
