package org.morphscout.indexer.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Arrays;
import java.util.concurrent.locks.ReentrantLock;
import org.morphscout.indexer.DiskSpace;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.schema.SchemaException;
import org.morphscout.schema.SchemaMigrator;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.sqlite.SQLiteConfig;

/**
 * An open catalog folder: {@code catalog.db} (SQLite, WAL mode), {@code vectors/} (Lucene) and {@code thumbnails/}.
 *
 * <p>Thread-safe: one JDBC connection, used under a lock, so statements and transactions of several threads never
 * interleave. Other processes may read at the same time (WAL); see {@link WriterLock} for writers.
 */
public final class Catalog implements AutoCloseable {
  private static final Logger LOG = LoggerFactory.getLogger(Catalog.class);
  private static final byte[] SQLITE_MAGIC = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);
  private static final String DB_FILE = "catalog.db";

  /**
   * Tables checked with {@code PRAGMA quick_check(table)} when a catalog is opened for reading: the small ones whose
   * rows a user would miss without an error (decisions, images, roots). The large feature and neighbour tables are
   * left to the full check ({@link #requireIntact}), which writers run and {@code status --check} offers.
   */
  private static final String[] CHECKED_AT_OPEN = {"catalog_layout", "roots", "images", "failures", "decisions",
    "settings"};

  private final Path dir;
  private final Connection connection;
  private final boolean readOnly;
  private final boolean readOnlyMedia;
  private final ReentrantLock lock = new ReentrantLock();

  private Catalog(Path dir, Connection connection, boolean readOnly, boolean readOnlyMedia) {
    this.dir = dir;
    this.connection = connection;
    this.readOnly = readOnly;
    this.readOnlyMedia = readOnlyMedia;
  }

  /**
   * Opens the catalog in {@code dir}, creating it when absent and migrating its schema when older.
   *
   * @throws MorphscoutException when the folder holds a damaged database, one that is not a catalog, or one written by
   *     a newer Morphscout; the files are left untouched in each case
   */
  public static Catalog open(Path dir) throws IOException {
    Path folder = dir.toAbsolutePath().normalize();
    if (Files.exists(folder) && !Files.isDirectory(folder)) {
      throw new MorphscoutException("catalog path " + folder + " is a file, not a folder");
    }
    Path db = folder.resolve(DB_FILE);
    if (Files.exists(db)) {
      checkHeader(db);
    }
    Files.createDirectories(folder.resolve("thumbnails"));
    Connection c = null;
    try {
      requireTempFolder();
      c = DriverManager.getConnection("jdbc:sqlite:" + db);
      nativeLoaded = true;
      SchemaMigrator migrator = SchemaMigrator.bundled();
      migrator.checkNotNewer(c);
      try (Statement s = c.createStatement()) {
        s.execute("PRAGMA busy_timeout = 15000");
        s.execute("PRAGMA journal_mode = WAL");
        s.execute("PRAGMA synchronous = NORMAL");
        s.execute("PRAGMA foreign_keys = ON");
      }
      migrator.migrate(c);
      return new Catalog(folder, c, false, false);
    } catch (SchemaException | SQLException e) {
      closeQuietly(c);
      throw refused(e, folder, db);
    }
  }

  /**
   * Opens an existing catalog for reading only: nothing in the folder is created or changed, so it works on read-only
   * media (there SQLite is told the file is immutable, as it cannot take locks). A catalog of an older layout is
   * upgraded first when its folder is writable, else refused. The small tables are checked for damage on the way in.
   *
   * @throws MorphscoutException when the database is missing, empty, damaged, not a catalog, or from a newer version
   */
  public static Catalog openForReading(Path dir) throws IOException {
    return openForReading(dir, !Files.isWritable(dir.toAbsolutePath().normalize())
        || !Files.isWritable(dir.toAbsolutePath().normalize().resolve(DB_FILE)));
  }

  /** As {@link #openForReading(Path)}, saying whether the catalog's media is read-only (tests force it). */
  static Catalog openForReading(Path dir, boolean readOnlyMedia) throws IOException {
    Path folder = dir.toAbsolutePath().normalize();
    Path db = folder.resolve(DB_FILE);
    if (!Files.isRegularFile(db)) {
      throw new MorphscoutException("no catalog in " + folder + ": index a folder first (morphscout index <folder>) "
          + "or name the catalog with --catalog");
    }
    checkHeader(db);
    SQLiteConfig config = new SQLiteConfig();
    config.setReadOnly(true);
    config.setBusyTimeout(15_000);
    String url = readOnlyMedia ? "jdbc:sqlite:file:" + db.toUri().getRawPath() + "?immutable=1" : "jdbc:sqlite:" + db;
    Connection c = null;
    try {
      requireTempFolder();
      c = DriverManager.getConnection(url, config.toProperties());
      nativeLoaded = true;
      SchemaMigrator migrator = SchemaMigrator.bundled();
      migrator.checkNotNewer(c);
      if (migrator.needsUpgrade(c)) {
        closeQuietly(c);
        if (readOnlyMedia) {
          throw new MorphscoutException("the catalog " + folder + " was made by an older Morphscout and needs an "
              + "upgrade, but it cannot be written here (read-only). Copy the folder to a writable place and run "
              + "morphscout status there once.");
        }
        return open(dir);
      }
      Catalog catalog = new Catalog(folder, c, true, readOnlyMedia);
      catalog.checkTables(CHECKED_AT_OPEN);
      return catalog;
    } catch (SchemaException | SQLException e) {
      closeQuietly(c);
      throw refused(e, folder, db);
    } catch (RuntimeException e) {
      closeQuietly(c);
      throw e;
    }
  }

  /** Whether this catalog was opened for reading only ({@link #openForReading}). */
  public boolean isReadOnly() {
    return readOnly;
  }

  /** Whether the catalog folder cannot be written at all (read-only media): nothing derived can be repaired there. */
  public boolean onReadOnlyMedia() {
    return readOnlyMedia;
  }

  /** Set once SQLite's native library is loaded: from then on the temporary folder no longer matters to it. */
  private static volatile boolean nativeLoaded;

  /**
   * SQLite's driver unpacks its native library into the temporary folder on first use; when that folder is missing or
   * not writable it fails deep inside its loader. Say so in one line first.
   */
  private static void requireTempFolder() {
    if (!nativeLoaded) {
      requireTempFolder(Path.of(System.getProperty("org.sqlite.tmpdir", System.getProperty("java.io.tmpdir"))));
    }
  }

  static void requireTempFolder(Path folder) {
    if (!Files.isDirectory(folder) || !Files.isWritable(folder)) {
      throw new MorphscoutException("the temporary folder " + folder + " is missing or not writable (the database "
          + "library unpacks itself there): set TMPDIR to a writable folder");
    }
  }

  private static void checkHeader(Path db) throws IOException {
    if (Files.size(db) == 0) {
      // SQLite would take an empty file for a new database and write a schema into it; a catalog is never empty once
      // made, so this is a file that lost its content (or a place-holder): leave it to the user.
      throw new MorphscoutException("cannot open catalog database " + db + ": the file is empty (0 bytes), so it is "
          + "not a catalog. It was left untouched; restore it from a backup, or delete it to start a new catalog.");
    }
    byte[] head = new byte[SQLITE_MAGIC.length];
    int n;
    try (InputStream in = Files.newInputStream(db)) {
      n = in.readNBytes(head, 0, head.length);
    }
    if (n < head.length || !Arrays.equals(head, SQLITE_MAGIC)) {
      throw new MorphscoutException("cannot open catalog database " + db + ": the file is damaged or is not a "
          + "SQLite database. It was left untouched; restore it from a backup or choose another catalog folder.");
    }
  }

  private static String describe(SQLException e, Path folder) {
    String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    // After a write fails for lack of space SQLite ends the transaction itself, so the commit that follows reports
    // "no transaction is active": both mean the disk is full.
    if (DiskSpace.isFull(e) || (m.contains("no transaction is active") && DiskSpace.nearlyFull(folder))) {
      return DiskSpace.full(folder);
    }
    if (m.contains("SQLITE_CORRUPT") || m.contains("SQLITE_NOTADB") || m.contains("malformed")) {
      return "the database file is damaged (" + m + ")";
    }
    return m;
  }

  /** The user-facing refusal of a catalog that could not be opened: not a catalog, newer, or damaged. */
  private static MorphscoutException refused(Exception e, Path folder, Path db) {
    if (e instanceof SchemaException) {
      return new MorphscoutException("cannot open catalog " + folder + ": " + e.getMessage(), e);
    }
    return new MorphscoutException("cannot open catalog database " + db + ": " + describe((SQLException) e, folder)
        + ". The file was left untouched; restore it from a backup or choose another catalog folder.", e);
  }

  private static void closeQuietly(Connection c) {
    if (c != null) {
      try {
        c.close();
      } catch (SQLException e) {
        LOG.debug("closing after a failed open", e);
      }
    }
  }

  /** The catalog folder (absolute). */
  public Path dir() {
    return dir;
  }

  /** The folder of the Lucene vector index. */
  public Path vectorDir() {
    return dir.resolve("vectors");
  }

  /** The folder of cached thumbnails. */
  public Path thumbnailDir() {
    return dir.resolve("thumbnails");
  }

  /**
   * Where the thumbnail of an image goes, without extension ({@code .jpg} for opaque images, {@code .png} when they
   * carry alpha): {@code thumbnails/<last two hex digits of the id>/<id>}, so no folder grows past a few thousand files.
   */
  public Path thumbnailBase(long id) {
    return thumbnailDir().resolve(String.format("%02x", id & 0xff)).resolve(Long.toString(id));
  }

  /** The stored thumbnail of an image, when there is one. */
  public java.util.Optional<Path> thumbnail(long id) {
    Path base = thumbnailBase(id);
    for (String ext : new String[] {".jpg", ".png"}) {
      Path p = base.resolveSibling(base.getFileName() + ext);
      if (Files.isRegularFile(p)) {
        return java.util.Optional.of(p);
      }
    }
    return java.util.Optional.empty();
  }

  /** The folder of stored model files (the generated descriptor, optional learned silhouettes). */
  public Path modelDir() {
    return dir.resolve("models");
  }

  /** Work on the connection, under the lock, in auto-commit mode (for reads and single statements). */
  public <T> T read(SqlWork<T> work) {
    lock.lock();
    try {
      return work.run(connection);
    } catch (SQLException e) {
      throw new MorphscoutException("catalog " + dir + ": " + describe(e, dir), e);
    } finally {
      lock.unlock();
    }
  }

  /** Work inside one transaction: committed when {@code work} returns, rolled back when it throws. */
  public <T> T inTransaction(SqlWork<T> work) {
    lock.lock();
    try {
      connection.setAutoCommit(false);
      try {
        T result = work.run(connection);
        connection.commit();
        return result;
      } catch (SQLException | RuntimeException e) {
        try {
          connection.rollback();
        } catch (SQLException rollback) {
          // SQLite may have ended the transaction itself (a full disk): keep the first error, which says why.
          e.addSuppressed(rollback);
        }
        throw e;
      } finally {
        connection.setAutoCommit(true);
      }
    } catch (SQLException e) {
      throw new MorphscoutException("catalog " + dir + ": " + describe(e, dir), e);
    } finally {
      lock.unlock();
    }
  }

  /**
   * Reads every page of the database to find damage that opening does not see (opening checks the header, the size
   * and the schema version only, to stay fast). Takes about a second per few hundred MB; writers call it before their
   * first write so they never build on a damaged file.
   *
   * @throws MorphscoutException when SQLite's {@code PRAGMA quick_check} finds a problem; nothing was written
   */
  public void requireIntact() {
    String verdict = quickCheck("PRAGMA quick_check(1)");
    if (!"ok".equals(verdict)) {
      throw damaged(verdict);
    }
  }

  /** Runs {@code PRAGMA quick_check} on each named table and its indexes (SQLite 3.33 or newer). */
  private void checkTables(String... tables) {
    java.util.Set<String> present = read(c -> {
      java.util.Set<String> names = new java.util.HashSet<>();
      try (Statement s = c.createStatement();
          java.sql.ResultSet rs = s.executeQuery("SELECT name FROM sqlite_master WHERE type = 'table'")) {
        while (rs.next()) {
          names.add(rs.getString(1));
        }
      }
      return names;
    });
    for (String table : tables) {
      if (!present.contains(table)) {
        continue;
      }
      String verdict = quickCheck("PRAGMA quick_check(" + table + ")");
      if (!"ok".equals(verdict)) {
        throw damaged(verdict);
      }
    }
  }

  private String quickCheck(String pragma) {
    lock.lock();
    try (Statement s = connection.createStatement(); java.sql.ResultSet rs = s.executeQuery(pragma)) {
      return rs.next() ? rs.getString(1) : "no answer";
    } catch (SQLException e) {
      return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    } finally {
      lock.unlock();
    }
  }

  private MorphscoutException damaged(String verdict) {
    return new MorphscoutException("cannot use catalog database " + dir.resolve(DB_FILE) + ": the database file is "
        + "damaged (" + verdict + "). It was left untouched; restore it from a backup or choose another catalog "
        + "folder.");
  }

  /** Size of the database files on disk, in bytes. */
  public long databaseBytes() throws IOException {
    long total = 0;
    for (String name : new String[] {DB_FILE, DB_FILE + "-wal", DB_FILE + "-shm"}) {
      Path p = dir.resolve(name);
      if (Files.exists(p)) {
        total += Files.size(p);
      }
    }
    return total;
  }

  @Override
  public void close() {
    lock.lock();
    try {
      connection.close();
    } catch (SQLException e) {
      LOG.warn("closing catalog {}: {}", dir, e.getMessage());
    } finally {
      lock.unlock();
    }
  }

  /** A unit of work on the catalog's connection. */
  @FunctionalInterface
  public interface SqlWork<T> {
    T run(Connection connection) throws SQLException;
  }
}
