package org.morphscout.indexer.catalog;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.SilhouetteCounts;
import org.morphscout.indexer.values.SilhouetteTraits;

/**
 * Per-image features. The silhouette mask is stored shrunk to {@link #MASK_LONG_SIDE} px (enough for warp estimation,
 * which works on a 64-128 px grid), as packed bits.
 */
public final class FeatureStore {
  /** Long side of stored masks, in pixels: {@link ImageAnalysis#MASK_LONG_SIDE}. */
  public static final int MASK_LONG_SIDE = ImageAnalysis.MASK_LONG_SIDE;
  private static final ObjectMapper JSON = new ObjectMapper();

  private final Catalog catalog;

  public FeatureStore(Catalog catalog) {
    this.catalog = catalog;
  }

  /** Registers an appearance model the first time it is used. */
  public void registerModel(String modelId, int dimension, String description) {
    catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT OR IGNORE INTO feature_models(id, dimension, description, "
          + "created_at) VALUES (?, ?, ?, ?)")) {
        ImageStore.bind(s, modelId, dimension, description, ImageStore.now());
        return s.executeUpdate();
      }
    });
  }

  /** Stores (or replaces) the features of one image (in the caller's transaction, if any). */
  public void put(long imageId, ImageAnalysis a) {
    Mask small = a.silhouette().mask().shrunk(MASK_LONG_SIDE);
    String descriptors = json(new Descriptors(a.shape().hu(), a.shape().bboxX(), a.shape().bboxY(), a.shape().bboxW(),
        a.shape().bboxH(), a.shape().aspect(), a.shape().areaFraction(), a.shape().centroidX(), a.shape().centroidY(),
        a.shape().orientation()));
    catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO features(image_id, model_id, appearance, "
          + "shape, silhouette_source, mask_width, mask_height, mask, components, touches_frame, coverage, confidence, "
          + "descriptors, colour, computed_at, fingerprint) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
        ImageStore.bind(s, imageId, a.modelId(), Blobs.floats(a.appearance()), Blobs.floats(a.shape().shapeVector()),
            a.silhouette().source(), small.width(), small.height(), Blobs.maskBits(small), a.silhouette().components(),
            a.silhouette().touchesFrame() ? 1 : 0, a.silhouette().coverage(), a.silhouette().confidence(), descriptors,
            json(a.colour()), ImageStore.now(), a.fingerprint() == null ? null : Blobs.halfFloats(a.fingerprint()));
        return s.executeUpdate();
      }
    });
  }

  /** The stored analysis of a ready image, combined with its catalog row. */
  public Optional<ImageAnalysis> load(ImageRow row) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("SELECT model_id, appearance, shape, silhouette_source, mask_width, "
          + "mask_height, mask, components, touches_frame, coverage, confidence, descriptors, colour, fingerprint "
          + "FROM features "
          + "WHERE image_id = ?")) {
        s.setLong(1, row.id());
        try (ResultSet rs = s.executeQuery()) {
          return rs.next() ? Optional.of(fromRow(row, rs)) : Optional.empty();
        }
      }
    });
  }

  private static ImageAnalysis fromRow(ImageRow row, ResultSet rs) throws SQLException {
    Mask mask = Blobs.mask(rs.getInt(5), rs.getInt(6), rs.getBytes(7));
    Silhouette silhouette = new Silhouette(mask, rs.getInt(8), rs.getInt(9) == 1, rs.getDouble(10), rs.getDouble(11),
        rs.getString(4));
    Descriptors d = parse(rs.getString(12), Descriptors.class);
    ShapeDescriptor shape = new ShapeDescriptor(Blobs.floats(rs.getBytes(3)), d.hu(), d.bboxX(), d.bboxY(), d.bboxW(),
        d.bboxH(), d.aspect(), d.areaFraction(), d.centroidX(), d.centroidY(), d.orientation());
    ColourStats colour = parse(rs.getString(13), ColourStats.class);
    byte[] fingerprint = rs.getBytes(14); // NULL for features stored before schema version 4
    return new ImageAnalysis(row.id(), row.path(), row.width(), row.height(), row.format(), Blobs.floats(rs.getBytes(2)),
        rs.getString(1), silhouette, shape, colour, row.contentHash() == null ? "" : row.contentHash(),
        fingerprint == null ? null : Blobs.fromHalfFloats(fingerprint));
  }

  /** One image's stored vectors. */
  public record Vectors(long imageId, String modelId, float[] appearance, float[] shape) {}

  /** Streams every stored vector pair of ready images (for rebuilding the vector index). */
  public void forEachVector(Consumer<Vectors> sink) {
    catalog.read(c -> {
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT f.image_id, f.model_id, f.appearance, f.shape FROM features f "
              + "JOIN images i ON i.id = f.image_id WHERE i.status = 'ready' ORDER BY f.image_id")) {
        while (rs.next()) {
          sink.accept(new Vectors(rs.getLong(1), rs.getString(2), Blobs.floats(rs.getBytes(3)),
              Blobs.floats(rs.getBytes(4))));
        }
      }
      return null;
    });
  }

  /** Whether an image has stored features (without reading them). */
  public boolean has(long imageId) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("SELECT 1 FROM features WHERE image_id = ?")) {
        s.setLong(1, imageId);
        try (ResultSet rs = s.executeQuery()) {
          return rs.next();
        }
      }
    });
  }

  /** The stored vectors of one image, when it has features. */
  public Optional<Vectors> vectorsOf(long imageId) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement(
          "SELECT image_id, model_id, appearance, shape FROM features WHERE image_id = ?")) {
        s.setLong(1, imageId);
        try (ResultSet rs = s.executeQuery()) {
          return rs.next() ? Optional.of(new Vectors(rs.getLong(1), rs.getString(2), Blobs.floats(rs.getBytes(3)),
              Blobs.floats(rs.getBytes(4)))) : Optional.empty();
        }
      }
    });
  }

  /** Ids of ready images whose features were made by {@code modelId}. */
  public List<Long> readyIds(String modelId) {
    return catalog.read(c -> {
      List<Long> ids = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT f.image_id FROM features f JOIN images i ON i.id = "
          + "f.image_id WHERE i.status = 'ready' AND f.model_id = ? ORDER BY f.image_id")) {
        s.setString(1, modelId);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            ids.add(rs.getLong(1));
          }
        }
      }
      return ids;
    });
  }

  /**
   * Ids of ready images whose features have no pixel fingerprint (stored before schema version 4): the indexer
   * analyses them again.
   */
  public List<Long> readyIdsWithoutFingerprint() {
    return catalog.read(c -> {
      List<Long> ids = new ArrayList<>();
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT f.image_id FROM features f JOIN images i ON i.id = f.image_id "
              + "WHERE i.status = 'ready' AND f.fingerprint IS NULL ORDER BY f.image_id")) {
        while (rs.next()) {
          ids.add(rs.getLong(1));
        }
      }
      return ids;
    });
  }

  public SilhouetteCounts silhouetteCounts() {
    return catalog.read(c -> {
      java.util.SortedMap<String, Integer> bySource = new java.util.TreeMap<>();
      int uncertain = 0;
      try (PreparedStatement s = c.prepareStatement("SELECT f.silhouette_source, COUNT(*), "
          + "SUM(CASE WHEN f.coverage > 0 AND f.confidence < ? THEN 1 ELSE 0 END) "
          + "FROM features f JOIN images i ON i.id = f.image_id WHERE i.status = 'ready' "
          + "GROUP BY f.silhouette_source")) {
        s.setDouble(1, org.morphscout.indexer.silhouette.Silhouette.UNCERTAIN_BELOW);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            bySource.merge(org.morphscout.indexer.silhouette.Silhouette.sourceWord(rs.getString(1)), rs.getInt(2),
                Integer::sum);
            uncertain += rs.getInt(3);
          }
        }
      }
      return new SilhouetteCounts(bySource, uncertain);
    });
  }

  /**
   * The stored silhouettes with something to report: several objects, cut off by the frame, or uncertain (an object
   * found with a confidence below {@link org.morphscout.indexer.silhouette.Silhouette#UNCERTAIN_BELOW}, as
   * {@link #silhouetteCounts} counts it). One query for the whole catalog: the browser filters 100,000 images by them.
   */
  public List<SilhouetteTraits> notableSilhouettes() {
    return catalog.read(c -> {
      List<SilhouetteTraits> result = new ArrayList<>();
      try (PreparedStatement s = c.prepareStatement("SELECT image_id, components, touches_frame, "
          + "CASE WHEN coverage > 0 AND confidence < ? THEN 1 ELSE 0 END AS uncertain FROM features "
          + "WHERE components > 1 OR touches_frame = 1 OR (coverage > 0 AND confidence < ?)")) {
        s.setDouble(1, org.morphscout.indexer.silhouette.Silhouette.UNCERTAIN_BELOW);
        s.setDouble(2, org.morphscout.indexer.silhouette.Silhouette.UNCERTAIN_BELOW);
        try (ResultSet rs = s.executeQuery()) {
          while (rs.next()) {
            result.add(new SilhouetteTraits(rs.getLong(1), rs.getInt(2), rs.getInt(3) == 1, rs.getInt(4) == 1));
          }
        }
      }
      return result;
    });
  }

  public Optional<String> setting(String key) {
    return catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("SELECT value FROM settings WHERE key = ?")) {
        s.setString(1, key);
        try (ResultSet rs = s.executeQuery()) {
          return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
        }
      }
    });
  }

  public void putSetting(String key, String value) {
    catalog.read(c -> {
      try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO settings(key, value) VALUES (?, ?)")) {
        ImageStore.bind(s, key, value);
        return s.executeUpdate();
      }
    });
  }

  private record Descriptors(double[] hu, double bboxX, double bboxY, double bboxW, double bboxH, double aspect,
      double areaFraction, double centroidX, double centroidY, double orientation) {}

  private static String json(Object o) {
    try {
      return JSON.writeValueAsString(o);
    } catch (JsonProcessingException e) {
      throw new MorphscoutException("cannot encode features: " + e.getOriginalMessage(), e);
    }
  }

  private static <T> T parse(String s, Class<T> type) {
    try {
      return JSON.readValue(s, type);
    } catch (JsonProcessingException e) {
      throw new MorphscoutException("stored features are damaged: " + e.getOriginalMessage(), e);
    }
  }
}
