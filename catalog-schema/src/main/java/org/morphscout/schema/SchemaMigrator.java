package org.morphscout.schema;

import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Brings a catalog database up to the newest bundled layout. Each step runs in its own transaction together with its
 * {@code catalog_layout} row, so a crash leaves the database at whole steps. Steps are applied in number order; a step
 * missing below one already applied (two lines of work that landed in either order) is applied later, still in
 * order. Not thread-safe: call once per database, before other writers use it.
 */
public final class SchemaMigrator {
  private static final Logger LOG = LoggerFactory.getLogger(SchemaMigrator.class);
  /** The bookkeeping table. */
  public static final String LAYOUT_TABLE = "catalog_layout";
  /** The bookkeeping table of catalogs written before {@code catalog_layout}; converted on the first write. */
  static final String LEGACY_TABLE = "schema_version";

  private final List<Migration> migrations;
  private final Map<Integer, Migration> byNumber = new TreeMap<>();

  public SchemaMigrator(List<Migration> migrations) {
    this.migrations = List.copyOf(migrations);
    for (Migration m : this.migrations) {
      if (byNumber.put(m.version(), m) != null) {
        throw new IllegalArgumentException("two layout steps numbered " + m.version());
      }
    }
  }

  /** A migrator for the steps shipped with this build. */
  public static SchemaMigrator bundled() {
    return new SchemaMigrator(BundledMigrations.all());
  }

  /** The highest step number this migrator knows. */
  public int latestVersion() {
    return migrations.isEmpty() ? 0 : migrations.getLast().version();
  }

  /**
   * The highest layout step applied to the database, read without writing anything: 0 for a new, empty database.
   *
   * @throws SchemaException when the database holds tables but no layout record (not a Morphscout catalog)
   */
  public static int currentVersion(Connection connection) throws SQLException, SchemaException {
    Set<Integer> applied = appliedSteps(connection);
    return applied.stream().mapToInt(Integer::intValue).max().orElse(0);
  }

  /**
   * The numbers of the layout steps applied to the database, read without writing anything; empty for a new database.
   *
   * @throws SchemaException when the database holds tables but no layout record (not a Morphscout catalog)
   */
  public static Set<Integer> appliedSteps(Connection connection) throws SQLException, SchemaException {
    Set<Integer> result = new TreeSet<>();
    String table = bookkeeping(connection);
    if (table == null) {
      return result;
    }
    String column = table.equals(LAYOUT_TABLE) ? "step" : "version";
    try (Statement s = connection.createStatement();
        ResultSet rs = s.executeQuery("SELECT " + column + " FROM " + table)) {
      while (rs.next()) {
        result.add(rs.getInt(1));
      }
    }
    return result;
  }

  /** True when some bundled step is not yet applied to the database (read only). */
  public boolean needsUpgrade(Connection connection) throws SQLException, SchemaException {
    return !pending(connection).isEmpty() || LEGACY_TABLE.equals(bookkeeping(connection));
  }

  /**
   * Refuses a database written by a newer build (it holds a step this build does not know), before anything is
   * written to it.
   *
   * @throws SchemaException naming the unknown step
   */
  public void checkNotNewer(Connection connection) throws SQLException, SchemaException {
    for (int step : appliedSteps(connection)) {
      if (!byNumber.containsKey(step)) {
        throw new SchemaException("the catalog was written by a newer Morphscout (it has layout step " + step
            + "; this version knows steps up to " + latestVersion() + "). It was left untouched: use a newer "
            + "Morphscout.");
      }
    }
  }

  /** Applies every pending step; returns the number applied. */
  public int migrate(Connection connection) throws SQLException, SchemaException {
    return migrateTo(connection, latestVersion());
  }

  /** Applies pending steps numbered up to and including {@code target}; returns the number applied. */
  public int migrateTo(Connection connection, int target) throws SQLException, SchemaException {
    if (target < 0 || target > latestVersion()) {
      throw new IllegalArgumentException("target step " + target + " outside 0.." + latestVersion());
    }
    checkNotNewer(connection);
    boolean autoCommit = connection.getAutoCommit();
    connection.setAutoCommit(false);
    int applied = 0;
    try {
      if (LEGACY_TABLE.equals(bookkeeping(connection))) {
        convertLegacy(connection);
      } else {
        try (Statement s = connection.createStatement()) {
          s.execute("CREATE TABLE IF NOT EXISTS " + LAYOUT_TABLE + " (step INTEGER PRIMARY KEY, name TEXT NOT NULL, "
              + "sha256 TEXT NOT NULL, applied_at TEXT NOT NULL)");
        }
        connection.commit();
      }
      for (Migration m : pending(connection)) {
        if (m.version() <= target) {
          apply(connection, m);
          applied++;
        }
      }
    } finally {
      connection.setAutoCommit(autoCommit);
    }
    return applied;
  }

  private List<Migration> pending(Connection connection) throws SQLException, SchemaException {
    Set<Integer> done = appliedSteps(connection);
    List<Migration> result = new ArrayList<>();
    for (Migration m : migrations) {
      if (!done.contains(m.version())) {
        result.add(m);
      }
    }
    return result;
  }

  /** The bookkeeping table the database has: {@code catalog_layout}, the legacy one, or null for an empty database. */
  private static String bookkeeping(Connection connection) throws SQLException, SchemaException {
    DatabaseMetaData meta = connection.getMetaData();
    for (String table : new String[] {LAYOUT_TABLE, LEGACY_TABLE}) {
      try (ResultSet tables = meta.getTables(null, null, table, null)) {
        if (tables.next()) {
          return table;
        }
      }
    }
    try (ResultSet any = meta.getTables(null, null, "%", new String[] {"TABLE"})) {
      if (any.next()) {
        throw new SchemaException("the database holds tables but no layout record: it is not a Morphscout catalog");
      }
    }
    return null;
  }

  /** Rewrites the legacy bookkeeping as {@code catalog_layout} rows, in one transaction; the tables are untouched. */
  private void convertLegacy(Connection connection) throws SQLException, SchemaException {
    try (Statement s = connection.createStatement()) {
      s.execute("CREATE TABLE " + LAYOUT_TABLE + " (step INTEGER PRIMARY KEY, name TEXT NOT NULL, "
          + "sha256 TEXT NOT NULL, applied_at TEXT NOT NULL)");
      try (PreparedStatement p = connection.prepareStatement("INSERT INTO " + LAYOUT_TABLE
              + "(step, name, sha256, applied_at) VALUES (?, ?, ?, ?)");
          ResultSet rs = s.executeQuery("SELECT version, applied_at FROM " + LEGACY_TABLE + " ORDER BY version")) {
        while (rs.next()) {
          Migration m = byNumber.get(rs.getInt(1));
          p.setInt(1, m.version());
          p.setString(2, m.name());
          p.setString(3, m.sha256());
          p.setString(4, rs.getString(2));
          p.executeUpdate();
        }
      }
      s.execute("DROP TABLE " + LEGACY_TABLE);
      connection.commit();
      LOG.info("catalog layout record converted to {}", LAYOUT_TABLE);
    } catch (SQLException e) {
      connection.rollback();
      throw new SchemaException("could not convert the catalog's layout record: " + e.getMessage(), e);
    }
  }

  private static void apply(Connection connection, Migration migration) throws SQLException, SchemaException {
    try (Statement s = connection.createStatement()) {
      for (String sql : migration.statements()) {
        s.execute(sql);
      }
      try (PreparedStatement p = connection.prepareStatement(
          "INSERT INTO " + LAYOUT_TABLE + "(step, name, sha256, applied_at) VALUES (?, ?, ?, ?)")) {
        p.setInt(1, migration.version());
        p.setString(2, migration.name());
        p.setString(3, migration.sha256());
        p.setString(4, Instant.now().toString());
        p.executeUpdate();
      }
      connection.commit();
      LOG.info("catalog layout step {} applied ({})", migration.version(), migration.name());
    } catch (SQLException e) {
      connection.rollback();
      throw new SchemaException("could not apply catalog layout step " + migration.name() + ": " + e.getMessage(),
          e);
    }
  }
}
