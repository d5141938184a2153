package org.morphscout.schema;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
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
  void freshDatabaseReachesLatestVersionWithAllTables() throws Exception {
    try (Connection c = open(dir.resolve("c.db"))) {
      int applied = SchemaMigrator.bundled().migrate(c);
      assertThat(applied).isEqualTo(BundledMigrations.all().size());
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(BundledMigrations.latestVersion());
      assertThat(tables(c)).contains("roots", "images", "failures", "decisions", "features", "feature_models",
          "neighbours", "settings", "schema_version");
      assertThat(SchemaMigrator.bundled().migrate(c)).as("second run applies nothing").isZero();
    }
  }

  @Test
  void catalogMadeByTheFirstMigrationUpgradesAndKeepsItsData() throws Exception {
    Path db = dir.resolve("old.db");
    try (Connection c = open(db)) {
      SchemaMigrator.bundled().migrateTo(c, 1);
      try (Statement s = c.createStatement()) {
        s.execute("INSERT INTO roots(id, path, added_at) VALUES (1, '/lib', 't')");
        s.execute("INSERT INTO images(id, root_id, path, size, mtime_ms, status, first_seen, updated_at) VALUES "
            + "(1, 1, '/lib/a.jpg', 10, 5, 'ready', 't', 't'), (2, 1, '/lib/b.jpg', 11, 6, 'ready', 't', 't')");
        s.execute("INSERT INTO decisions(image_a, image_b, verdict, note, decided_at) VALUES "
            + "(1, 2, 'approved', 'keep', 't')");
      }
    }
    try (Connection c = open(db)) {
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(1);
      assertThat(SchemaMigrator.bundled().migrate(c)).isEqualTo(BundledMigrations.all().size() - 1);
      // Since migration 7 a decision names its pictures; images never hashed are named by id.
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
  }

  @Test
  void newerCatalogIsRefusedAndLeftByteForByteUntouched() throws Exception {
    Path db = dir.resolve("newer.db");
    try (Connection c = open(db)) {
      SchemaMigrator.bundled().migrate(c);
      try (Statement s = c.createStatement()) {
        s.execute("INSERT INTO schema_version(version, name, applied_at) VALUES (999, 'V999__future.sql', 't')");
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
  void failingMigrationRollsBackToTheLastWholeVersion() throws Exception {
    List<Migration> migrations = new ArrayList<>(BundledMigrations.all());
    migrations.add(new Migration(BundledMigrations.latestVersion() + 1, "V999__broken.sql",
        "CREATE TABLE half_done (id INTEGER);\nTHIS IS NOT SQL;"));
    try (Connection c = open(dir.resolve("broken.db"))) {
      assertThatThrownBy(() -> new SchemaMigrator(migrations).migrate(c))
          .isInstanceOf(SchemaException.class)
          .hasMessageContaining("V999__broken.sql");
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(BundledMigrations.latestVersion());
      assertThat(tables(c)).doesNotContain("half_done");
    }
  }

  @Test
  void aLowerNumberShippedLaterIsAppliedAfterHigherOnes() throws Exception {
    // Numbers are reserved for work in progress: a catalog may have 7 before 5 exists.
    List<Migration> early = List.of(new Migration(1, "V001__a.sql", "CREATE TABLE a (x INT)"),
        new Migration(7, "V007__g.sql", "CREATE TABLE g (x INT)"));
    List<Migration> later = List.of(early.get(0), new Migration(5, "V005__e.sql", "CREATE TABLE e (x INT)"),
        early.get(1));
    try (Connection c = open(dir.resolve("gaps.db"))) {
      assertThat(new SchemaMigrator(early).migrate(c)).isEqualTo(2);
      assertThat(SchemaMigrator.currentVersion(c)).isEqualTo(7);
      assertThat(new SchemaMigrator(later).hasPending(c)).isTrue();
      assertThat(new SchemaMigrator(later).migrate(c)).isEqualTo(1);
      assertThat(tables(c)).contains("a", "e", "g");
      assertThat(new SchemaMigrator(later).hasPending(c)).isFalse();
    }
  }

  @Test
  void statementSplitterDropsCommentsAndBlankParts() {
    Migration m = new Migration(1, "V001__x.sql", "-- a comment; with a semicolon\nCREATE TABLE a (x INT); -- tail\n\n"
        + "CREATE TABLE b (y INT);\n");
    assertThat(m.statements()).containsExactly("CREATE TABLE a (x INT)", "CREATE TABLE b (y INT)");
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
