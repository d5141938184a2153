package org.morphscout.indexer.testing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.HashSet;
import java.util.Set;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/** Checks of a catalog's consistency shared by the reliability tests. */
public final class CatalogChecks {
  private CatalogChecks() {}

  /** The vector index holds exactly the catalog's ready images (the catalog is the source of truth). */
  public static void catalogAndIndexAgree(Library library, String context) throws IOException {
    Set<Long> ready = new HashSet<>();
    library.images().withStatus(ImageStatus.READY).forEach(r -> ready.add(r.id()));
    try (LuceneVectorIndex idx = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir())) {
      assertThat(idx.ids()).as("vector index ids vs ready catalog images (%s)", context).isEqualTo(ready);
    }
  }

  /**
   * Checked with SQL, independently of the stores' code: every image row has its own path, every ready image has
   * exactly one features row, every failed image has a reason, and no foreign key dangles.
   */
  public static void noDuplicatesOrOrphans(Library library, String context) {
    library.catalog().read(c -> {
      try (Statement s = c.createStatement()) {
        assertThat(count(s, "SELECT COUNT(*) - COUNT(DISTINCT path) FROM images"))
            .as("image rows sharing a path (%s)", context).isZero();
        assertThat(count(s, "SELECT COUNT(*) FROM images i WHERE i.status = 'ready' AND "
            + "(SELECT COUNT(*) FROM features f WHERE f.image_id = i.id) <> 1"))
            .as("ready images without exactly one features row (%s)", context).isZero();
        assertThat(count(s, "SELECT COUNT(*) FROM images i WHERE i.status = 'failed' AND NOT EXISTS "
            + "(SELECT 1 FROM failures f WHERE f.image_id = i.id)"))
            .as("failed images without a reason (%s)", context).isZero();
        assertThat(count(s, "PRAGMA foreign_key_check")).as("foreign key violations (%s)", context).isZero();
      }
      return null;
    });
  }

  /** SQLite's own consistency check of the database file ("ok" when sound; SQLite documentation, PRAGMA). */
  public static String integrityCheck(Library library) {
    return library.catalog().read(c -> {
      try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA integrity_check")) {
        rs.next();
        return rs.getString(1);
      }
    });
  }

  private static long count(Statement s, String sql) throws java.sql.SQLException {
    try (ResultSet rs = s.executeQuery(sql)) {
      long n = 0;
      if (sql.startsWith("PRAGMA")) {
        while (rs.next()) {
          n++;
        }
        return n;
      }
      rs.next();
      return rs.getLong(1);
    }
  }

  /** The absolute, normalised form the catalog stores paths in. */
  public static String key(Path p) {
    return p.toAbsolutePath().normalize().toString();
  }
}
