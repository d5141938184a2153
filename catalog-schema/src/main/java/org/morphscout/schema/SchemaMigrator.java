package org.morphscout.schema;

import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Brings a catalog database up to the newest bundled schema. Each migration runs in its own transaction together with
 * its {@code schema_version} row, so a crash leaves the database at a whole version. Not thread-safe: call once per
 * database, before other writers use it.
 */
public final class SchemaMigrator {
  private static final Logger LOG = LoggerFactory.getLogger(SchemaMigrator.class);

  private final List<Migration> migrations;

  public SchemaMigrator(List<Migration> migrations) {
    this.migrations = List.copyOf(migrations);
  }

  /** A migrator for the migrations shipped with this build. */
  public static SchemaMigrator bundled() {
    return new SchemaMigrator(BundledMigrations.all());
  }

  /** The highest version this build knows (numbers may have gaps, see {@link BundledMigrations#all}). */
  public int latestVersion() {
    return migrations.isEmpty() ? 0 : migrations.get(migrations.size() - 1).version();
  }

  /** Whether some known migration is not applied yet (also one below the database's highest version). */
  public boolean hasPending(Connection connection) throws SQLException, SchemaException {
    if (currentVersion(connection) == 0) {
      return !migrations.isEmpty();
    }
    java.util.Set<Integer> applied = appliedVersions(connection);
    return migrations.stream().anyMatch(m -> !applied.contains(m.version()));
  }

  private static java.util.Set<Integer> appliedVersions(Connection connection) throws SQLException {
    java.util.Set<Integer> applied = new java.util.HashSet<>();
    try (Statement s = connection.createStatement();
        ResultSet rs = s.executeQuery("SELECT version FROM schema_version")) {
      while (rs.next()) {
        applied.add(rs.getInt(1));
      }
    }
    return applied;
  }

  /**
   * The schema version of the database, read without writing anything: 0 for a new, empty database.
   *
   * @throws SchemaException when the database holds tables but no version (not a Morphscout catalog)
   */
  public static int currentVersion(Connection connection) throws SQLException, SchemaException {
    DatabaseMetaData meta = connection.getMetaData();
    try (ResultSet tables = meta.getTables(null, null, "schema_version", null)) {
      if (!tables.next()) {
        try (ResultSet any = meta.getTables(null, null, "%", new String[] {"TABLE"})) {
          if (any.next()) {
            throw new SchemaException("the database holds tables but no schema version: it is not a Morphscout "
                + "catalog");
          }
        }
        return 0;
      }
    }
    try (Statement s = connection.createStatement();
        ResultSet rs = s.executeQuery("SELECT COALESCE(MAX(version), 0) FROM schema_version")) {
      return rs.next() ? rs.getInt(1) : 0;
    }
  }

  /**
   * Refuses a database written by a newer build, before anything is written to it.
   *
   * @throws SchemaException naming both versions
   */
  public void checkNotNewer(Connection connection) throws SQLException, SchemaException {
    int current = currentVersion(connection);
    if (current > latestVersion()) {
      throw new SchemaException("the catalog was written by a newer Morphscout (schema version " + current
          + "; this version knows up to " + latestVersion() + "). It was left untouched: use a newer Morphscout.");
    }
  }

  /** Applies every pending migration; returns the number applied. */
  public int migrate(Connection connection) throws SQLException, SchemaException {
    return migrateTo(connection, latestVersion());
  }

  /** Applies pending migrations up to and including {@code target}; returns the number applied. */
  public int migrateTo(Connection connection, int target) throws SQLException, SchemaException {
    if (target < 0 || target > latestVersion()) {
      throw new IllegalArgumentException("target version " + target + " outside 0.." + latestVersion());
    }
    checkNotNewer(connection);
    boolean autoCommit = connection.getAutoCommit();
    connection.setAutoCommit(false);
    int applied = 0;
    try {
      try (Statement s = connection.createStatement()) {
        s.execute("CREATE TABLE IF NOT EXISTS schema_version (version INTEGER PRIMARY KEY, name TEXT NOT NULL, "
            + "applied_at TEXT NOT NULL)");
      }
      connection.commit();
      java.util.Set<Integer> done = appliedVersions(connection);
      for (Migration m : migrations) {
        if (m.version() <= target && !done.contains(m.version())) {
          apply(connection, m);
          applied++;
        }
      }
    } finally {
      connection.setAutoCommit(autoCommit);
    }
    return applied;
  }

  private static void apply(Connection connection, Migration migration) throws SQLException, SchemaException {
    try (Statement s = connection.createStatement()) {
      for (String sql : migration.statements()) {
        s.execute(sql);
      }
      try (PreparedStatement p =
          connection.prepareStatement("INSERT INTO schema_version(version, name, applied_at) VALUES (?, ?, ?)")) {
        p.setInt(1, migration.version());
        p.setString(2, migration.name());
        p.setString(3, Instant.now().toString());
        p.executeUpdate();
      }
      connection.commit();
      LOG.info("catalog schema migrated to version {} ({})", migration.version(), migration.name());
    } catch (SQLException e) {
      connection.rollback();
      throw new SchemaException("could not apply catalog migration " + migration.name() + ": " + e.getMessage(), e);
    }
  }
}
