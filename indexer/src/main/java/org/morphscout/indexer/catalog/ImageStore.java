package org.morphscout.indexer.catalog;

import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.values.Folder;
import org.morphscout.indexer.values.ImageFailure;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * Roots, images and per-file failures. Methods run on the catalog's connection; called inside
 * {@link Catalog#inTransaction} they join that transaction.
 */
public final class ImageStore {
  private static final String COLUMNS =
      "id, root_id, path, size, mtime_ms, content_hash, width, height, orientation, format, status";

  private final Catalog catalog;

  public ImageStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /** Registers a root (absolute, normalised) and returns its id; an existing root keeps its id. */
  public long ensureRoot(Path root) {
    return ensureRoot(root.toAbsolutePath().normalize().toString());
  }

  /**
   * Registers a root given as it is named (an absolute local path, or a URI of a file system this machine may not
   * reach, for analyses imported from a cluster) and returns its id.
   */
  public long ensureRoot(String p) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT OR IGNORE INTO roots(path, added_at) VALUES (?, ?)")) {
        s.setString(1, p);
        s.setString(2, now());
        s.executeUpdate();
      }
      try (PreparedStatement s = c.prepareStatement("SELECT id FROM roots WHERE path = ?")) {
        s.setString(1, p);
        try (ResultSet rs = s.executeQuery()) {
          rs.next();
          return rs.getLong(1);
        }
      }
    });
  }

  public List<Folder> roots() {
    return catalog.read(c -> {
      List<Folder> roots = new ArrayList<>();
      try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT id, path FROM roots ORDER BY path")) {
        while (rs.next()) {
          roots.add(new Folder(rs.getLong(1), rs.getString(2)));
        }
      }
      return roots;
    });
  }

  public Optional<ImageRow> byId(long id) {
    return one("SELECT " + COLUMNS + " FROM images WHERE id = ?", id);
  }

  public Optional<ImageRow> byPath(String path) {
    return one("SELECT " + COLUMNS + " FROM images WHERE path = ?", path);
  }

  public List<ImageRow> byHash(String hash) {
    return list("SELECT " + COLUMNS + " FROM images WHERE content_hash = ? ORDER BY id", hash);
  }

  public List<ImageRow> underRoot(long rootId) {
    return list("SELECT " + COLUMNS + " FROM images WHERE root_id = ? ORDER BY path", rootId);
  }

  public List<ImageRow> withStatus(ImageStatus status) {
    return list("SELECT " + COLUMNS + " FROM images WHERE status = ? ORDER BY path", status.word());
  }

  public List<ImageRow> all() {
    return list("SELECT " + COLUMNS + " FROM images ORDER BY path");
  }

  /** Number of images in each status (every status present, zero when none). */
  public Map<ImageStatus, Integer> countsByStatus() {
    return catalog.read(c -> {
      Map<ImageStatus, Integer> counts = new EnumMap<>(ImageStatus.class);
      for (ImageStatus s : ImageStatus.values()) {
        counts.put(s, 0);
      }
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT status, COUNT(*) FROM images GROUP BY status")) {
        while (rs.next()) {
          counts.put(ImageStatus.fromWord(rs.getString(1)), rs.getInt(2));
        }
      }
      return counts;
    });
  }

  /** Adds a newly found file as pending; returns its id. */
  public long insertPending(long rootId, String path, long size, long mtimeMs, String contentHash) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT INTO images(root_id, path, size, mtime_ms, content_hash, "
          + "status, first_seen, updated_at) VALUES (?, ?, ?, ?, ?, 'pending', ?, ?)", Statement.RETURN_GENERATED_KEYS)) {
        s.setLong(1, rootId);
        s.setString(2, path);
        s.setLong(3, size);
        s.setLong(4, mtimeMs);
        s.setString(5, contentHash);
        String now = now();
        s.setString(6, now);
        s.setString(7, now);
        s.executeUpdate();
        try (ResultSet keys = s.getGeneratedKeys()) {
          keys.next();
          return keys.getLong(1);
        }
      }
    });
  }

  /**
   * Records what is now on disk for an image (a changed, moved or returning file) and sets its status; the id and
   * everything attached to it (decisions) stay.
   */
  public void updateFile(long id, long rootId, String path, long size, long mtimeMs, String contentHash,
      ImageStatus status) {
    update("UPDATE images SET root_id = ?, path = ?, size = ?, mtime_ms = ?, content_hash = ?, status = ?, "
        + "updated_at = ? WHERE id = ?", rootId, path, size, mtimeMs, contentHash, status.word(), now(), id);
  }

  /** Marks an image analysed, with its decoded facts, and clears any earlier failure. */
  public void markReady(long id, int width, int height, int orientation, String format) {
    update("UPDATE images SET width = ?, height = ?, orientation = ?, format = ?, status = 'ready', updated_at = ? "
        + "WHERE id = ?", width, height, orientation, format, now(), id);
    update("DELETE FROM failures WHERE image_id = ?", id);
  }

  /**
   * Marks an image failed with a plain-language reason (without the path), the failure's kind as a value and, for a
   * file refused as too large, the pixel count it declared (0 otherwise); replaces an earlier failure.
   */
  public void markFailed(long id, String reason, String kind, long declaredPixels) {
    update("UPDATE images SET status = 'failed', updated_at = ? WHERE id = ?", now(), id);
    update("INSERT INTO failures(image_id, reason, failed_at, kind, declared_pixels) VALUES (?, ?, ?, ?, ?) "
        + "ON CONFLICT(image_id) DO UPDATE SET reason = excluded.reason, failed_at = excluded.failed_at, "
        + "kind = excluded.kind, declared_pixels = excluded.declared_pixels", id, reason, now(), kind,
        declaredPixels > 0 ? declaredPixels : null);
  }

  /**
   * A stored failure: the reason people read, and the kind and declared pixels as values (both null for failures
   * recorded before layout step 08).
   */
  public record StoredFailure(String reason, String kind, Long declaredPixels) {}

  /** The stored failure of an image, if it failed. */
  public Optional<StoredFailure> failureOf(long id) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement(
          "SELECT reason, kind, declared_pixels FROM failures WHERE image_id = ?")) {
        s.setLong(1, id);
        try (ResultSet rs = s.executeQuery()) {
          if (!rs.next()) {
            return Optional.empty();
          }
          long pixels = rs.getLong(3);
          return Optional.of(new StoredFailure(rs.getString(1), rs.getString(2), rs.wasNull() ? null : pixels));
        }
      }
    });
  }

  public void setStatus(long id, ImageStatus status) {
    update("UPDATE images SET status = ?, updated_at = ? WHERE id = ?", status.word(), now(), id);
  }

  /** Failures with their reasons, by path. */
  public List<ImageFailure> failures() {
    return catalog.read(c -> {
      List<ImageFailure> result = new ArrayList<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT f.image_id, i.path, f.reason, f.failed_at FROM failures f "
              + "JOIN images i ON i.id = f.image_id WHERE i.status = 'failed' ORDER BY i.path")) {
        while (rs.next()) {
          result.add(new ImageFailure(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4)));
        }
      }
      return result;
    });
  }

  /** The failure reason of one image, when it failed. */
  public Optional<String> failureReason(long id) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("SELECT reason FROM failures WHERE image_id = ?")) {
        s.setLong(1, id);
        try (ResultSet rs = s.executeQuery()) {
          return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
        }
      }
    });
  }

  private Optional<ImageRow> one(String sql, Object arg) {
    List<ImageRow> rows = list(sql, arg);
    return rows.isEmpty() ? Optional.empty() : Optional.of(rows.get(0));
  }

  private List<ImageRow> list(String sql, Object... args) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement(sql)) {
        bind(s, args);
        List<ImageRow> rows = new ArrayList<>();
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            rows.add(new ImageRow(rs.getLong(1), rs.getLong(2), rs.getString(3), rs.getLong(4), rs.getLong(5),
                rs.getString(6), rs.getInt(7), rs.getInt(8), rs.getInt(9), rs.getString(10),
                ImageStatus.fromWord(rs.getString(11))));
          }
        }
        return rows;
      }
    });
  }

  private void update(String sql, Object... args) {
    catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement(sql)) {
        bind(s, args);
        return s.executeUpdate();
      }
    });
  }

  static void bind(PreparedStatement s, Object... args) throws SQLException {
    for (int i = 0; i < args.length; i++) {
      s.setObject(i + 1, args[i]);
    }
  }

  static String now() {
    return Instant.now().toString();
  }

}
