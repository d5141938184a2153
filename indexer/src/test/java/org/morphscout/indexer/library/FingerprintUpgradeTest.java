package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.PixelFingerprint;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;

/**
 * A catalog made before pixel fingerprints existed (schema version 3: no {@code features.fingerprint} column) is
 * upgraded on open and filled in by the next index run, keeping image ids and the user's decisions.
 */
class FingerprintUpgradeTest {
  private static final long SEED = 5150;

  @TempDir Path tmp;

  private IndexReport index(Library library, Path root) throws IOException {
    return new LibraryIndexer(library, AnalysisSetup.defaults(), IndexOptions.defaults().withThreads(2)
        .withNeighbours(3)).index(List.of(root), ProgressListener.NONE, CancellationToken.none());
  }

  @Test
  void oldCatalogGetsFingerprintsOnTheNextIndexRunAndKeepsIdsAndDecisions() throws Exception {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 4, Archetype.VASE, Archetype.BOTTLE);
    FamilyFolders.writePngs(family, root, "member-");
    Path catalogDir = tmp.resolve("catalog");
    Map<String, Long> idsBefore = new TreeMap<>();
    try (Library library = Library.open(catalogDir)) {
      index(library, root);
      library.images().all().forEach(r -> idsBefore.put(r.path(), r.id()));
      List<Long> ids = List.copyOf(idsBefore.values());
      library.decisions().decide(ids.get(0), ids.get(1), DecisionKind.APPROVED, "keep this one");
    }
    assertThat(idsBefore).as("seed %d", SEED).hasSize(4);

    // Turn it into a catalog without layout step 4: no fingerprint column, no record of it (later ones stay).
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + catalogDir.resolve("catalog.db"));
        Statement s = c.createStatement()) {
      s.execute("ALTER TABLE features DROP COLUMN fingerprint");
      s.execute("DELETE FROM catalog_layout WHERE step = 4");
      assertThat(columns(c)).doesNotContain("fingerprint");
    }

    try (Library library = Library.open(catalogDir)) {
      // Opening migrated it; the features are there, the fingerprints unknown.
      assertThat(library.features().readyIdsWithoutFingerprint())
          .containsExactlyInAnyOrderElementsOf(idsBefore.values());
      ImageRow first = library.images().byId(idsBefore.values().iterator().next()).orElseThrow();
      assertThat(library.features().load(first).orElseThrow().fingerprint()).isNull();

      IndexReport report = index(library, root);
      assertThat(report.indexed()).as("every image analysed again").isEqualTo(4);
      assertThat(library.features().readyIdsWithoutFingerprint()).isEmpty();
      Map<String, Long> idsAfter = new TreeMap<>();
      library.images().all().forEach(r -> idsAfter.put(r.path(), r.id()));
      assertThat(idsAfter).isEqualTo(idsBefore);
      for (ImageRow row : library.images().all()) {
        ImageAnalysis a = library.features().load(row).orElseThrow();
        assertThat(a.fingerprint()).hasSize(PixelFingerprint.LENGTH);
      }
      List<Long> ids = List.copyOf(idsBefore.values());
      Decision kept = library.decisions().find(ids.get(0), ids.get(1)).orElseThrow();
      assertThat(kept.kind()).isEqualTo(DecisionKind.APPROVED);
      assertThat(kept.note()).isEqualTo("keep this one");

      IndexReport again = index(library, root);
      assertThat(again.indexed()).as("nothing left to fill in").isZero();
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + catalogDir.resolve("catalog.db"))) {
      assertThat(columns(c)).contains("fingerprint");
    }
  }

  private static List<String> columns(Connection c) throws SQLException {
    List<String> names = new java.util.ArrayList<>();
    try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA table_info(features)")) {
      while (rs.next()) {
        names.add(rs.getString("name"));
      }
    }
    return names;
  }
}
