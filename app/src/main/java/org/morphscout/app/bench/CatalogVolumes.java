package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.stream.Stream;
import org.morphscout.indexer.MorphscoutException;

/**
 * Measured per-image data volumes of an indexed catalog, for sizing larger deployments: the mean stored size of
 * each feature column, of the neighbour lists, of the thumbnails, of the vector index, and of the whole catalog
 * folder. Reads the catalog's SQLite file with plain SQL (column names of layout step 1); changes nothing.
 *
 * @param images images with features
 * @param appearanceBytes mean appearance vector blob (float32 x dimension)
 * @param shapeBytes mean shape vector blob
 * @param maskBytes mean packed silhouette mask blob
 * @param maskPixels mean mask width x height
 * @param descriptorBytes mean JSON shape descriptors
 * @param colourBytes mean JSON colour statistics
 * @param neighbourRowsPerImage neighbour-list rows per image
 * @param databaseBytesPerImage catalog.db (with WAL) bytes per image, indexes and all
 * @param thumbnailBytesPerImage thumbnail files per image
 * @param vectorIndexBytesPerImage Lucene index files per image
 */
public record CatalogVolumes(int images, double appearanceBytes, double shapeBytes, double maskBytes,
    double maskPixels, double descriptorBytes, double colourBytes, double neighbourRowsPerImage,
    double databaseBytesPerImage, double thumbnailBytesPerImage, double vectorIndexBytesPerImage) {

  /** Measures the catalog in {@code catalogDir}. */
  public static CatalogVolumes measure(Path catalogDir) throws IOException {
    Path db = catalogDir.resolve("catalog.db");
    if (!Files.isRegularFile(db)) {
      throw new MorphscoutException("No catalog at " + catalogDir + " (catalog.db missing)");
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement s = c.createStatement()) {
      double[] f;
      try (ResultSet r = s.executeQuery("SELECT count(*), avg(length(appearance)), avg(length(shape)), "
          + "avg(length(mask)), avg(mask_width * mask_height), avg(length(descriptors)), avg(length(colour)) "
          + "FROM features")) {
        r.next();
        f = new double[7];
        for (int i = 0; i < 7; i++) {
          f[i] = r.getDouble(i + 1);
        }
      }
      double neighbourRows;
      try (ResultSet r = s.executeQuery("SELECT count(*) FROM neighbours")) {
        r.next();
        neighbourRows = r.getDouble(1);
      }
      int n = (int) f[0];
      if (n == 0) {
        throw new MorphscoutException("The catalog at " + catalogDir + " has no analysed images yet");
      }
      long dbBytes = bytes(db) + bytes(catalogDir.resolve("catalog.db-wal"));
      return new CatalogVolumes(n, f[1], f[2], f[3], f[4], f[5], f[6], neighbourRows / n, (double) dbBytes / n,
          (double) folderBytes(catalogDir.resolve("thumbnails")) / n,
          (double) folderBytes(catalogDir.resolve("vectors")) / n);
    } catch (SQLException e) {
      throw new MorphscoutException("Cannot read the catalog " + db + ": " + e.getMessage(), e);
    }
  }

  private static long bytes(Path p) throws IOException {
    return Files.isRegularFile(p) ? Files.size(p) : 0;
  }

  private static long folderBytes(Path dir) throws IOException {
    if (!Files.isDirectory(dir)) {
      return 0;
    }
    try (Stream<Path> files = Files.walk(dir)) {
      return files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
    }
  }
}
