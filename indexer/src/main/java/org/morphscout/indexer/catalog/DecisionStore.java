package org.morphscout.indexer.catalog;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.morphscout.indexer.MorphscoutException;

/** The user's verdicts on pairs. A pair is unordered; it is stored with the smaller id first. */
public final class DecisionStore {
  private final Catalog catalog;

  public DecisionStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /** What the user decided about a pair. */
  public enum Verdict {
    APPROVED,
    REJECTED;

    public String word() {
      return name().toLowerCase(Locale.ROOT);
    }

    /** Accepts the stored words and the command words ("approve", "reject"). */
    public static Verdict parse(String word) {
      return switch (word.toLowerCase(Locale.ROOT)) {
        case "approve", "approved" -> APPROVED;
        case "reject", "rejected" -> REJECTED;
        default -> throw new MorphscoutException("unknown verdict '" + word + "': use approve or reject");
      };
    }
  }

  /** One decision, with both images' current paths. */
  public record Decision(long imageA, String pathA, long imageB, String pathB, Verdict verdict, String note,
      String decidedAt) {}

  /** Records (or replaces) the decision on a pair. */
  public void decide(long a, long b, Verdict verdict, String note) {
    if (a == b) {
      throw new MorphscoutException("a pair needs two different images");
    }
    long lo = Math.min(a, b);
    long hi = Math.max(a, b);
    catalog.inTransaction(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT INTO decisions(image_a, image_b, verdict, note, decided_at) "
          + "VALUES (?, ?, ?, ?, ?) ON CONFLICT(image_a, image_b) DO UPDATE SET verdict = excluded.verdict, "
          + "note = excluded.note, decided_at = excluded.decided_at")) {
        ImageStore.bind(s, lo, hi, verdict.word(), note, ImageStore.now());
        return s.executeUpdate();
      }
    });
  }

  /** Removes the decision on a pair; returns whether there was one. */
  public boolean forget(long a, long b) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("DELETE FROM decisions WHERE image_a = ? AND image_b = ?")) {
        ImageStore.bind(s, Math.min(a, b), Math.max(a, b));
        return s.executeUpdate() > 0;
      }
    });
  }

  public Optional<Decision> find(long a, long b) {
    return query(" WHERE d.image_a = " + Math.min(a, b) + " AND d.image_b = " + Math.max(a, b)).stream().findFirst();
  }

  /** Every decision, newest first. */
  public List<Decision> all() {
    return query("");
  }

  private List<Decision> query(String where) {
    return catalog.read(c -> {
      List<Decision> result = new ArrayList<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT d.image_a, a.path, d.image_b, b.path, d.verdict, d.note, d.decided_at "
              + "FROM decisions d JOIN images a ON a.id = d.image_a JOIN images b ON b.id = d.image_b" + where
              + " ORDER BY d.decided_at DESC, d.image_a, d.image_b")) {
        while (rs.next()) {
          result.add(new Decision(rs.getLong(1), rs.getString(2), rs.getLong(3), rs.getString(4),
              Verdict.parse(rs.getString(5)), rs.getString(6), rs.getString(7)));
        }
      }
      return result;
    });
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
