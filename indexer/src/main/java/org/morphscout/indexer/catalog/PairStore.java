package org.morphscout.indexer.catalog;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

/**
 * The stored pairs (layout step 06): which candidates each ready image chose, the measures of every chosen pair and
 * each image's own facts. Blobs are opaque here; the library encodes them. Rows of an image whose features change, or
 * that stops being ready, are voided by triggers in the catalog itself, so no writer can forget to.
 */
public final class PairStore {
  /** A stored pair's kind (the {@code kind} column). */
  public enum Kind {
    /** Fully measured, the warp included. */
    MEASURED,
    /** Cheap measures only: they bound the score too low to be worth a warp when it was stored. */
    BOUNDED,
    /** The same picture twice (resized, recompressed or lightly edited): listed apart, never scored. */
    DUPLICATE,
    /** One of the pictures has no object: scores 0. */
    NO_OBJECT;

    static Kind of(int code) {
      return values()[code];
    }
  }

  /** One stored pair, {@code first < second}; {@code measures} is null for duplicates and pairs without object. */
  public record Row(long first, long second, Kind kind, int version, byte[] measures) {}

  /** One chosen candidate pair, as the chooser saw it. */
  public record Choice(long chooser, long other) {}

  /**
   * Counts for {@code status}.
   *
   * @param choosers images whose candidates are stored
   * @param pairs stored pairs of any kind
   * @param bounded pairs whose warp was skipped because their cheap measures bound the score too low
   * @param duplicates near-duplicate pairs
   * @param stale pairs measured by another version of the measuring code
   * @param unmeasured chosen pairs with no stored measures yet
   */
  public record Counts(long choosers, long pairs, long bounded, long duplicates, long stale, long unmeasured) {}

  private static final String UNMEASURED = "SELECT DISTINCT MIN(c.chooser, c.other), MAX(c.chooser, c.other) "
      + "FROM pair_choices c WHERE NOT EXISTS (SELECT 1 FROM pair_measures m WHERE m.first_id = MIN(c.chooser, "
      + "c.other) AND m.second_id = MAX(c.chooser, c.other) AND m.version = ?)";

  private final Catalog catalog;

  public PairStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /** The candidates asked per image of every image whose choice is stored. */
  public Map<Long, Integer> choosers() {
    return catalog.read(c -> {
      Map<Long, Integer> out = new HashMap<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT image_id, candidates FROM pair_choosers")) {
        while (rs.next()) {
          out.put(rs.getLong(1), rs.getInt(2));
        }
      }
      return out;
    });
  }

  /** Every chooser's stored picture facts, by image id. */
  public Map<Long, byte[]> pictureFacts() {
    return catalog.read(c -> {
      Map<Long, byte[]> out = new HashMap<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT image_id, facts FROM pair_choosers")) {
        while (rs.next()) {
          out.put(rs.getLong(1), rs.getBytes(2));
        }
      }
      return out;
    });
  }

  /**
   * Stores an image's choice (replacing an earlier one), in the caller's transaction if any. Measures of pairs that
   * neither side chooses any more are dropped.
   */
  public void putChoice(long chooser, int candidates, byte[] facts, Collection<Long> others) {
    catalog.read(c -> {
      List<Long> before = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT other FROM pair_choices WHERE chooser = ?")) {
        s.setLong(1, chooser);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            before.add(rs.getLong(1));
          }
        }
      }
      try (PreparedStatement d = c.prepareStatement("DELETE FROM pair_choices WHERE chooser = ?")) {
        d.setLong(1, chooser);
        d.executeUpdate();
      }
      try (PreparedStatement s = c.prepareStatement(
          "INSERT OR IGNORE INTO pair_choices(chooser, other) VALUES (?, ?)")) {
        for (long o : others) {
          ImageStore.bind(s, chooser, o);
          s.addBatch();
        }
        s.executeBatch();
      }
      try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO pair_choosers(image_id, candidates, "
          + "facts, chosen_at) VALUES (?, ?, ?, ?)")) {
        ImageStore.bind(s, chooser, candidates, facts, ImageStore.now());
        s.executeUpdate();
      }
      try (PreparedStatement d = c.prepareStatement("DELETE FROM pair_measures WHERE first_id = ? AND second_id = ? "
          + "AND NOT EXISTS (SELECT 1 FROM pair_choices WHERE (chooser = ? AND other = ?) OR (chooser = ? AND other = ?))")) {
        for (long o : before) {
          long lo = Math.min(chooser, o);
          long hi = Math.max(chooser, o);
          ImageStore.bind(d, lo, hi, lo, hi, hi, lo);
          d.addBatch();
        }
        d.executeBatch();
      }
      return null;
    });
  }

  /**
   * The pairs chosen by the given images that have no measures of the given version, each once, as
   * {@code Choice(first, second)} with {@code first < second}, in order.
   */
  public List<Choice> unmeasuredOf(Collection<Long> choosers, int version) {
    return catalog.read(c -> {
      java.util.TreeSet<Choice> out = new java.util.TreeSet<>(
          java.util.Comparator.comparingLong(Choice::chooser).thenComparingLong(Choice::other));
      try (PreparedStatement s = c.prepareStatement("SELECT c.chooser, c.other FROM pair_choices c WHERE c.chooser = ? "
          + "AND NOT EXISTS (SELECT 1 FROM pair_measures m WHERE m.first_id = MIN(c.chooser, c.other) "
          + "AND m.second_id = MAX(c.chooser, c.other) AND m.version = ?)")) {
        for (long chooser : choosers) {
          ImageStore.bind(s, chooser, version);
          try (ResultSet rs = s.executeQuery()) {
            while (rs.next()) {
              long a = rs.getLong(1);
              long b = rs.getLong(2);
              out.add(new Choice(Math.min(a, b), Math.max(a, b)));
            }
          }
        }
      }
      return new ArrayList<>(out);
    });
  }

  /** Stores measured pairs (replacing earlier rows of the same pairs), in the caller's transaction if any. */
  public void putMeasures(Collection<Row> rows) {
    catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO pair_measures(first_id, second_id, kind, "
          + "version, measures) VALUES (?, ?, ?, ?, ?)")) {
        for (Row r : rows) {
          if (r.first() >= r.second()) {
            throw new IllegalArgumentException("a stored pair needs first < second, got " + r.first() + ", "
                + r.second());
          }
          ImageStore.bind(s, r.first(), r.second(), r.kind().ordinal(), r.version(), r.measures());
          s.addBatch();
        }
        s.executeBatch();
      }
      return null;
    });
  }

  /**
   * Streams every stored pair to {@code sink} in one pass, holding only one row at a time. The sink runs under the
   * catalog's lock: keep it quick and do not call back into the catalog.
   */
  public void forEach(Consumer<Row> sink) {
    catalog.read(c -> {
      try (Statement s = c.createStatement()) {
        s.setFetchSize(4096);
        try (ResultSet rs = s.executeQuery("SELECT first_id, second_id, kind, version, measures FROM pair_measures")) {
          while (rs.next()) {
            sink.accept(new Row(rs.getLong(1), rs.getLong(2), Kind.of(rs.getInt(3)), rs.getInt(4), rs.getBytes(5)));
          }
        }
      }
      return null;
    });
  }

  /** The stored pairs of the choices of one image, each as stored ({@code first < second}). */
  public List<Row> chosenBy(long chooser) {
    return catalog.read(c -> {
      List<Row> out = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT m.first_id, m.second_id, m.kind, m.version, m.measures "
          + "FROM pair_choices c JOIN pair_measures m ON m.first_id = MIN(c.chooser, c.other) "
          + "AND m.second_id = MAX(c.chooser, c.other) WHERE c.chooser = ? ORDER BY c.other")) {
        s.setLong(1, chooser);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            out.add(new Row(rs.getLong(1), rs.getLong(2), Kind.of(rs.getInt(3)), rs.getInt(4), rs.getBytes(5)));
          }
        }
      }
      return out;
    });
  }

  /** The ids one image chose, in id order. */
  public List<Long> choicesOf(long chooser) {
    return catalog.read(c -> {
      List<Long> out = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement(
          "SELECT other FROM pair_choices WHERE chooser = ? ORDER BY other")) {
        s.setLong(1, chooser);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            out.add(rs.getLong(1));
          }
        }
      }
      return out;
    });
  }

  /** Counts for status; {@code version} is the current measuring code's. */
  public Counts counts(int version) {
    return catalog.read(c -> {
      long[] n = new long[6];
      try (PreparedStatement s = c.prepareStatement("SELECT (SELECT COUNT(*) FROM pair_choosers), COUNT(*), "
          + "COALESCE(SUM(kind = 1), 0), COALESCE(SUM(kind = 2), 0), COALESCE(SUM(version <> ?), 0), "
          + "(SELECT COUNT(*) FROM (" + UNMEASURED.replace("m.version = ?", "1") + ")) FROM pair_measures")) {
        s.setInt(1, version);
        try (ResultSet rs = s.executeQuery()) {
          rs.next();
          for (int i = 0; i < n.length; i++) {
            n[i] = rs.getLong(i + 1);
          }
        }
      }
      return new Counts(n[0], n[1], n[2], n[3], n[4], n[5]);
    });
  }

  /** Drops measures of pairs that no image chooses any more; returns how many. */
  public int dropUnchosen() {
    return catalog.read(c -> {
      try (Statement s = c.createStatement()) {
        return s.executeUpdate("DELETE FROM pair_measures WHERE NOT EXISTS (SELECT 1 FROM pair_choices c WHERE "
            + "c.chooser = first_id AND c.other = second_id) AND NOT EXISTS (SELECT 1 FROM pair_choices c WHERE "
            + "c.chooser = second_id AND c.other = first_id)");
      }
    });
  }

  /** Forgets every stored choice and pair (the analysis setup changed). */
  public void clear() {
    catalog.read(c -> {
      try (Statement s = c.createStatement()) {
        s.executeUpdate("DELETE FROM pair_measures");
        s.executeUpdate("DELETE FROM pair_choices");
        s.executeUpdate("DELETE FROM pair_choosers");
        s.executeUpdate("DELETE FROM settings WHERE key = 'stored_pairs_complete'");
      }
      return null;
    });
  }
}
