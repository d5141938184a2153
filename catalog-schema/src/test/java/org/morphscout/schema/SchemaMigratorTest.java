package org.morphscout.schema;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SchemaMigratorTest {

  @TempDir Path dir;

  private Connection open(Path db) throws SQLException {
    return DriverManager.getConnection("jdbc:sqlite:" + db);
  }

  @Test
  void freshDatabaseReachesLatestStepWithAllTablesAndRecordsEachStep() throws Exception {
    try (Connection c = open(dir.resolve("c.db"))) {
      int applied = SchemaMigrator.bundled().migrate(c);
      assertThat(applied).isEqualTo(BundledMigrations.all().size());
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(BundledMigrations.latestVersion());
      assertThat(tables(c)).contains("roots", "images", "failures", "decisions", "features", "feature_models",
          "neighbours", "settings", "catalog_layout").doesNotContain("schema_version");
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT step, name, sha256 FROM catalog_layout ORDER BY step")) {
        for (Migration m : BundledMigrations.all()) {
          assertThat(rs.next()).isTrue();
          assertThat(rs.getInt(1)).isEqualTo(m.version());
          assertThat(rs.getString(2)).isEqualTo(m.name()).startsWith("step-");
          assertThat(rs.getString(3)).isEqualTo(m.sha256()).hasSize(64);
        }
      }
      assertThat(SchemaMigrator.bundled().migrate(c)).as("second run applies nothing").isZero();
      assertThat(SchemaMigrator.bundled().needsUpgrade(c)).isFalse();
    }
  }

  @Test
  void sha256OfAStepIsTheStandardDigestOfItsText() {
    // FIPS 180-4 test vector "abc" (SHA-256 of the three ASCII bytes; also printed by sha256sum for printf abc).
    assertThat(new Migration(1, "step-01-x.sql", "abc").sha256())
        .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  }

  @Test
  void catalogMadeByTheFirstStepUpgradesAndKeepsItsData() throws Exception {
    Path db = dir.resolve("old.db");
    try (Connection c = open(db)) {
      SchemaMigrator.bundled().migrateTo(c, 1);
      insertLibraryRows(c);
    }
    try (Connection c = open(db)) {
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(1);
      assertThat(SchemaMigrator.bundled().needsUpgrade(c)).isTrue();
      assertThat(SchemaMigrator.bundled().migrate(c)).isEqualTo(BundledMigrations.all().size() - 1);
      assertDecisionKept(c);
    }
  }

  @Test
  void catalogWithTheEarlierBookkeepingIsConvertedInPlaceAndKeepsItsData() throws Exception {
    // A catalog as the previous release wrote it: the same four steps, recorded in a schema_version table under the
    // earlier file names.
    Path db = dir.resolve("earlier.db");
    String[] earlierNames = {"V001__library.sql", "V002__features.sql", "V003__neighbours.sql", "V004__fingerprints.sql"};
    try (Connection c = open(db); Statement s = c.createStatement()) {
      for (Migration m : BundledMigrations.all().subList(0, 4)) {
        for (String sql : m.statements()) {
          s.execute(sql);
        }
      }
      s.execute("CREATE TABLE schema_version (version INTEGER PRIMARY KEY, name TEXT NOT NULL, applied_at TEXT NOT NULL)");
      try (PreparedStatement p = c.prepareStatement("INSERT INTO schema_version VALUES (?, ?, ?)")) {
        for (int v = 1; v <= 4; v++) {
          p.setInt(1, v);
          p.setString(2, earlierNames[v - 1]);
          p.setString(3, "2026-11-0" + v + "T00:00:00Z");
          p.executeUpdate();
        }
      }
      insertLibraryRows(c);
    }
    try (Connection c = open(db)) {
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(4);
      assertThat(SchemaMigrator.bundled().needsUpgrade(c)).isTrue();
      assertThat(SchemaMigrator.bundled().migrate(c)).isEqualTo(BundledMigrations.all().size() - 4);
      assertThat(tables(c)).contains("catalog_layout").doesNotContain("schema_version");
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT name, applied_at FROM catalog_layout WHERE step = 2")) {
        assertThat(rs.next()).isTrue();
        assertThat(rs.getString(1)).isEqualTo("step-02-features.sql");
        assertThat(rs.getString(2)).as("the original time is kept").isEqualTo("2026-11-02T00:00:00Z");
      }
      assertDecisionKept(c);
      assertThat(SchemaMigrator.bundled().needsUpgrade(c)).isFalse();
    }
  }

  @Test
  void aMissingLowerStepIsAppliedLaterInOrder() throws Exception {
    // Two lines of work may land in either order: a catalog that got step 3 before step 2 existed gets step 2 later.
    List<Migration> all = BundledMigrations.all();
    Migration extraLow = new Migration(all.getLast().version() + 1, "step-90-low.sql", "CREATE TABLE low_one (x INT);");
    Migration extraHigh = new Migration(all.getLast().version() + 2, "step-91-high.sql",
        "CREATE TABLE high_one (x INT);");
    List<Migration> withoutLow = new ArrayList<>(all);
    withoutLow.add(extraHigh);
    List<Migration> both = new ArrayList<>(all);
    both.add(extraLow);
    both.add(extraHigh);
    try (Connection c = open(dir.resolve("gap.db"))) {
      new SchemaMigrator(withoutLow).migrate(c);
      assertThat(tables(c)).contains("high_one").doesNotContain("low_one");
      SchemaMigrator later = new SchemaMigrator(both);
      assertThat(later.needsUpgrade(c)).isTrue();
      assertThat(later.migrate(c)).isEqualTo(1);
      assertThat(tables(c)).contains("low_one", "high_one");
      assertThat(SchemaMigrator.appliedSteps(c)).contains(extraLow.version(), extraHigh.version());
    }
  }

  @Test
  void newerCatalogIsRefusedAndLeftByteForByteUntouched() throws Exception {
    Path db = dir.resolve("newer.db");
    try (Connection c = open(db)) {
      SchemaMigrator.bundled().migrate(c);
      try (Statement s = c.createStatement()) {
        s.execute("INSERT INTO catalog_layout(step, name, sha256, applied_at) "
            + "VALUES (999, 'step-999-future.sql', '0', 't')");
      }
    }
    byte[] before = Files.readAllBytes(db);
    try (Connection c = open(db)) {
      assertThatThrownBy(() -> SchemaMigrator.bundled().migrate(c))
          .isInstanceOf(SchemaException.class)
          .hasMessageContaining("newer Morphscout")
          .hasMessageContaining("999");
    }
    assertThat(Files.readAllBytes(db)).isEqualTo(before);
  }

  @Test
  void foreignDatabaseIsRefused() throws Exception {
    try (Connection c = open(dir.resolve("other.db"))) {
      try (Statement s = c.createStatement()) {
        s.execute("CREATE TABLE invoices (id INTEGER)");
      }
      assertThatThrownBy(() -> SchemaMigrator.bundled().migrate(c))
          .isInstanceOf(SchemaException.class)
          .hasMessageContaining("not a Morphscout catalog");
    }
  }

  @Test
  void failingStepRollsBackToTheLastWholeStep() throws Exception {
    List<Migration> migrations = new ArrayList<>(BundledMigrations.all());
    migrations.add(new Migration(BundledMigrations.latestVersion() + 1, "step-99-broken.sql",
        "CREATE TABLE half_done (id INTEGER);\nTHIS IS NOT SQL;"));
    try (Connection c = open(dir.resolve("broken.db"))) {
      assertThatThrownBy(() -> new SchemaMigrator(migrations).migrate(c))
          .isInstanceOf(SchemaException.class)
          .hasMessageContaining("step-99-broken.sql");
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(BundledMigrations.latestVersion());
      assertThat(tables(c)).doesNotContain("half_done");
    }
  }

  @Test
  void statementSplitterDropsCommentsAndBlankParts() {
    Migration m = new Migration(1, "step-01-x.sql", "-- a comment; with a semicolon\nCREATE TABLE a (x INT); -- tail\n\n"
        + "CREATE TABLE b (y INT);\n");
    assertThat(m.statements()).containsExactly("CREATE TABLE a (x INT)", "CREATE TABLE b (y INT)");
  }

  @Test
  void triggerBodiesStayOneStatementAndWork() throws Exception {
    Migration m = new Migration(1, "step-01-x.sql", "CREATE TABLE a (x INT);\nCREATE TABLE log (x INT);\n"
        + "CREATE TRIGGER a_logged AFTER INSERT ON a\nBEGIN\n  INSERT INTO log VALUES (NEW.x);\n"
        + "  INSERT INTO log VALUES (NEW.x + 1);\nEND;\nCREATE TABLE b (y INT);\n");
    assertThat(m.statements()).hasSize(4);
    assertThat(m.statements().get(2)).startsWith("CREATE TRIGGER").endsWith("END");
    try (Connection c = open(dir.resolve("trigger.db")); Statement s = c.createStatement()) {
      new SchemaMigrator(List.of(m)).migrate(c);
      s.execute("INSERT INTO a VALUES (5)");
      try (ResultSet rs = s.executeQuery("SELECT COUNT(*), SUM(x) FROM log")) {
        assertThat(rs.next()).isTrue();
        assertThat(rs.getInt(1)).isEqualTo(2);
        assertThat(rs.getInt(2)).isEqualTo(11);
      }
    }
  }

  private static void insertLibraryRows(Connection c) throws SQLException {
    try (Statement s = c.createStatement()) {
      s.execute("INSERT INTO roots(id, path, added_at) VALUES (1, '/lib', 't')");
      s.execute("INSERT INTO images(id, root_id, path, size, mtime_ms, status, first_seen, updated_at) VALUES "
          + "(1, 1, '/lib/a.jpg', 10, 5, 'ready', 't', 't'), (2, 1, '/lib/b.jpg', 11, 6, 'ready', 't', 't')");
      s.execute("INSERT INTO decisions(image_a, image_b, verdict, note, decided_at) VALUES "
          + "(1, 2, 'approved', 'keep', 't')");
    }
  }

  private static void assertDecisionKept(Connection c) throws SQLException {
    // Since layout step 7 a decision names its pictures; images never hashed are named by id.
    try (Statement s = c.createStatement();
        ResultSet rs = s.executeQuery("SELECT verdict, note, path_a, path_b FROM decisions "
            + "WHERE picture_a = 'id:1' AND picture_b = 'id:2'")) {
      assertThat(rs.next()).isTrue();
      assertThat(rs.getString(1)).isEqualTo("approved");
      assertThat(rs.getString(2)).isEqualTo("keep");
      assertThat(rs.getString(3)).isEqualTo("/lib/a.jpg");
      assertThat(rs.getString(4)).isEqualTo("/lib/b.jpg");
    }
  }

  private static List<String> tables(Connection c) throws SQLException {
    List<String> names = new ArrayList<>();
    try (ResultSet rs = c.getMetaData().getTables(null, null, "%", new String[] {"TABLE"})) {
      while (rs.next()) {
        names.add(rs.getString("TABLE_NAME"));
      }
    }
    return names;
  }
}
