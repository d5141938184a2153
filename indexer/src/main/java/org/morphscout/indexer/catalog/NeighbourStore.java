package org.morphscout.indexer.catalog;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

/** The stored neighbour graph: each image's nearest neighbours with the step's components. */
public final class NeighbourStore {
  private final Catalog catalog;

  public NeighbourStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /**
   * One stored link.
   *
   * @param appearance 1 - cosine of the appearance vectors, in [0, 2]
   * @param shape 1 - cosine of the shape vectors, in [0, 2]
   * @param colour CIEDE2000 between the foreground means
   */
  public record Link(long from, long to, double appearance, double shape, double colour) {}

  /** Replaces the neighbour list of {@code from} (in the caller's transaction, if any). */
  public void replace(long from, Collection<Link> links) {
    catalog.read(c -> {
      try (PreparedStatement d = c.prepareStatement("DELETE FROM neighbours WHERE image_id = ?")) {
        d.setLong(1, from);
        d.executeUpdate();
      }
      try (PreparedStatement s = c.prepareStatement(
          "INSERT OR REPLACE INTO neighbours(image_id, neighbour_id, appearance, shape, colour) VALUES (?, ?, ?, ?, ?)")) {
        for (Link l : links) {
          ImageStore.bind(s, from, l.to(), l.appearance(), l.shape(), l.colour());
          s.addBatch();
        }
        s.executeBatch();
      }
      return null;
    });
  }

  /** Removes every link from or to {@code id}; returns the ids that pointed at it. */
  public List<Long> removeNode(long id) {
    return catalog.read(c -> {
      List<Long> pointing = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT image_id FROM neighbours WHERE neighbour_id = ?")) {
        s.setLong(1, id);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            pointing.add(rs.getLong(1));
          }
        }
      }
      try (PreparedStatement s = c.prepareStatement("DELETE FROM neighbours WHERE image_id = ? OR neighbour_id = ?")) {
        ImageStore.bind(s, id, id);
        s.executeUpdate();
      }
      return pointing;
    });
  }

  /** Ids of the images that have a stored neighbour list. */
  public java.util.Set<Long> idsWithLinks() {
    return catalog.read(c -> {
      java.util.Set<Long> ids = new java.util.HashSet<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT DISTINCT image_id FROM neighbours")) {
        while (rs.next()) {
          ids.add(rs.getLong(1));
        }
      }
      return ids;
    });
  }

  /** Every stored link (each as stored, one direction). */
  public List<Link> all() {
    return catalog.read(c -> {
      List<Link> result = new ArrayList<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT image_id, neighbour_id, appearance, shape, colour FROM neighbours")) {
        while (rs.next()) {
          result.add(new Link(rs.getLong(1), rs.getLong(2), rs.getDouble(3), rs.getDouble(4), rs.getDouble(5)));
        }
      }
      return result;
    });
  }

  public void clear() {
    catalog.read(c -> {
      try (Statement s = c.createStatement()) {
        return s.executeUpdate("DELETE FROM neighbours");
      }
    });
  }
}
