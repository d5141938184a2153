package org.morphscout.indexer.catalog;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.DecisionKind;
import org.morphscout.indexer.values.ImageRow;

/**
 * The user's decisions on pairs (approve or reject). A decision belongs to the two pictures judged, named by their
 * content hashes (SHA-256; {@code id:<n>} for an image not hashed yet, and for both sides of a byte-identical pair),
 * not to their paths or rows: a picture moved or renamed keeps its decisions, and a different picture found at an old
 * path starts with none. A pair is unordered; it is stored with the smaller name first. The paths at decision time are
 * kept to show a decision whose pictures are no longer in the catalog.
 */
public final class DecisionStore {
  private final Catalog catalog;

  public DecisionStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /** The stored names of a pair's two pictures, smaller first, with the paths in the same order. */
  private record Pictures(String a, String b, String pathA, String pathB) {}

  private Pictures pictures(long a, long b) {
    if (a == b) {
      throw new MorphscoutException("a pair needs two different images");
    }
    ImageStore images = new ImageStore(catalog);
    ImageRow ra = images.byId(a).orElseThrow(() -> new MorphscoutException("no image #" + a + " in the catalog"));
    ImageRow rb = images.byId(b).orElseThrow(() -> new MorphscoutException("no image #" + b + " in the catalog"));
    boolean identical = ra.contentHash() != null && ra.contentHash().equals(rb.contentHash());
    String ka = ra.contentHash() == null || identical ? "id:" + a : ra.contentHash();
    String kb = rb.contentHash() == null || identical ? "id:" + b : rb.contentHash();
    return ka.compareTo(kb) < 0 ? new Pictures(ka, kb, ra.path(), rb.path())
        : new Pictures(kb, ka, rb.path(), ra.path());
  }

  /** Records (or replaces) the decision on a pair. */
  public void decide(long a, long b, DecisionKind kind, String note) {
    Pictures p = pictures(a, b);
    catalog.inTransaction(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT INTO decisions(picture_a, picture_b, path_a, path_b, "
          + "verdict, note, decided_at) VALUES (?, ?, ?, ?, ?, ?, ?) ON CONFLICT(picture_a, picture_b) DO UPDATE SET "
          + "path_a = excluded.path_a, path_b = excluded.path_b, verdict = excluded.verdict, note = excluded.note, "
          + "decided_at = excluded.decided_at")) {
        ImageStore.bind(s, p.a(), p.b(), p.pathA(), p.pathB(), kind.word(), note, ImageStore.now());
        return s.executeUpdate();
      }
    });
  }

  /**
   * Clears the decision on a pair (either order), as {@code decide FIRST SECOND --clear} and the browser's Clear decision do;
   * returns whether there was one.
   */
  public boolean clear(long a, long b) {
    Pictures p = pictures(a, b);
    return catalog.inTransaction(c -> {
      try (PreparedStatement s = c.prepareStatement("DELETE FROM decisions WHERE picture_a = ? AND picture_b = ?")) {
        ImageStore.bind(s, p.a(), p.b());
        return s.executeUpdate() > 0;
      }
    });
  }

  /** The decision on the pictures images {@code a} and {@code b} hold now, if any. */
  public Optional<Decision> find(long a, long b) {
    if (a < 0 || b < 0 || a == b) {
      return Optional.empty();
    }
    Pictures p = pictures(a, b);
    return query(" WHERE picture_a = ? AND picture_b = ?", p.a(), p.b()).stream().findFirst();
  }

  /** Every decision, newest first. */
  public List<Decision> all() {
    return query("");
  }

  private List<Decision> query(String where, Object... args) {
    return catalog.read(c -> {
      List<Decision> result = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT picture_a, path_a, picture_b, path_b, verdict, note, "
          + "decided_at FROM decisions" + where + " ORDER BY decided_at DESC, picture_a, picture_b");
          PreparedStatement holder = c.prepareStatement("SELECT id, path FROM images WHERE content_hash = ? "
              + "ORDER BY status = 'missing', id LIMIT 1");
          PreparedStatement byId = c.prepareStatement("SELECT id, path FROM images WHERE id = ?")) {
        ImageStore.bind(s, args);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            Holder a = holder(holder, byId, rs.getString(1), rs.getString(2));
            Holder b = holder(holder, byId, rs.getString(3), rs.getString(4));
            result.add(new Decision(a.id(), a.path(), b.id(), b.path(), DecisionKind.parse(rs.getString(5)),
                rs.getString(6), rs.getString(7)));
          }
        }
      }
      return result;
    });
  }

  private record Holder(long id, String path) {}

  /** The image holding a picture now, or (-1, the path at decision time). */
  private static Holder holder(PreparedStatement byHash, PreparedStatement byId, String picture, String pathThen)
      throws java.sql.SQLException {
    PreparedStatement s;
    if (picture.startsWith("id:")) {
      s = byId;
      s.setLong(1, Long.parseLong(picture.substring(3)));
    } else {
      s = byHash;
      s.setString(1, picture);
    }
    try (ResultSet rs = s.executeQuery()) {
      return rs.next() ? new Holder(rs.getLong(1), rs.getString(2)) : new Holder(-1, pathThen);
    }
  }

  /** Number of decisions (used by consistency checks). */
  public int count() {
    return catalog.read(c -> {
      try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM decisions")) {
        rs.next();
        return rs.getInt(1);
      }
    });
  }
}
