package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.FolderSnapshot;

/**
 * A catalog written by a newer Morphscout, or a damaged database file, is refused with a message that says so, and
 * every file of the catalog folder is left exactly as it was (compared byte for byte). SQLite file layout from the
 * SQLite documentation "Database File Format" (sqlite.org/fileformat.html): a 100-byte header that starts with
 * "SQLite format 3\0", the page size at offset 16 (2 bytes, big-endian), then the pages.
 */
class RefusedCatalogTest {
  private static final long SEED = 20261205L;

  @TempDir Path tmp;
  Path catalog;

  @BeforeEach
  void makeCatalog() throws IOException {
    catalog = tmp.resolve("catalog");
    try (Library library = Library.open(catalog)) {
      // Enough rows to fill several pages, so damage can hit a table's pages and not only the schema.
      long root = library.images().ensureRoot(tmp.resolve("photos"));
      library.catalog().inTransaction(c -> {
        for (int i = 0; i < 3000; i++) {
          library.images().insertPending(root, tmp.resolve("photos/picture-" + i + ".jpg").toString(), 1000 + i,
              1_700_000_000_000L + i, String.format("%064x", i));
        }
        return null;
      });
    }
  }

  @Test
  void aCatalogFromANewerSchemaIsRefusedAndLeftUntouched() throws IOException {
    try (Library library = Library.open(catalog)) {
      library.catalog().read(c -> {
        try (PreparedStatement s = c.prepareStatement(
            "INSERT INTO catalog_layout(step, name, sha256, applied_at) "
                + "VALUES (999, 'step-999-future.sql', '0', 'later')")) {
          return s.executeUpdate();
        }
      });
    }
    Map<String, byte[]> before = snapshot(catalog);
    assertThatThrownBy(() -> Library.open(catalog)).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("newer Morphscout").hasMessageContaining("999").hasMessageContaining("left untouched");
    assertUntouched(before);
  }

  @Test
  void aDamagedHeaderIsRefusedAndLeftUntouched() throws IOException {
    Path db = catalog.resolve("catalog.db");
    byte[] bytes = Files.readAllBytes(db);
    byte[] junk = "this is not SQLite".getBytes(StandardCharsets.US_ASCII);
    System.arraycopy(junk, 0, bytes, 0, junk.length);
    Files.write(db, bytes);
    Map<String, byte[]> before = snapshot(catalog);
    assertThatThrownBy(() -> Library.open(catalog)).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining(db.toString()).hasMessageContaining("damaged").hasMessageContaining("left untouched");
    assertUntouched(before);
  }

  @Test
  void aTruncatedDatabaseIsRefusedAndLeftUntouched() throws IOException {
    Path db = catalog.resolve("catalog.db");
    byte[] bytes = Files.readAllBytes(db);
    Files.write(db, java.util.Arrays.copyOf(bytes, bytes.length / 3));
    Map<String, byte[]> before = snapshot(catalog);
    assertThatThrownBy(() -> Library.open(catalog)).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining(db.toString()).hasMessageContaining("damaged").hasMessageContaining("left untouched");
    assertUntouched(before);
  }

  @Test
  void garbageInsideTheDatabaseIsRefusedBeforeIndexingWritesAndLeftUntouched() throws IOException {
    Path db = catalog.resolve("catalog.db");
    byte[] bytes = Files.readAllBytes(db);
    int pageSize = ((bytes[16] & 0xFF) << 8) | (bytes[17] & 0xFF); // header offset 16, big-endian
    assertThat(bytes.length / pageSize).as("pages in the test catalog").isGreaterThan(20);
    // Overwrite whole pages past the schema (page 1) with seeded noise.
    Random rnd = new Random(SEED);
    byte[] noise = new byte[pageSize];
    for (int page = 3; page < bytes.length / pageSize; page += 2) {
      rnd.nextBytes(noise);
      System.arraycopy(noise, 0, bytes, page * pageSize, pageSize);
    }
    Files.write(db, bytes);
    Map<String, byte[]> before = snapshot(catalog);
    // Opening reads the header, size and schema only (to stay fast for every command); damage inside the pages is
    // found by the indexer before its first write, and by any read that meets it. When the noise hits a page of the
    // schema itself (it spans several pages once the catalog has enough tables), opening refuses at once.
    Library opened;
    try {
      opened = Library.open(catalog);
    } catch (MorphscoutException refusedAtOpen) {
      assertThat(refusedAtOpen).hasMessageContaining(db.toString()).hasMessageContaining("damaged")
          .hasMessageContaining("left untouched");
      assertUntouched(before);
      return;
    }
    try (Library library = opened) {
      assertThatThrownBy(() -> new LibraryIndexer(library, AnalysisSetup.defaults(), IndexOptions.defaults())
          .index(java.util.List.of(Files.createDirectories(tmp.resolve("photos"))),
              org.morphscout.indexer.progress.ProgressListener.NONE,
              org.morphscout.indexer.progress.CancellationToken.none()))
          .as("seed %d", SEED).isInstanceOf(MorphscoutException.class)
          .hasMessageContaining(db.toString()).hasMessageContaining("damaged").hasMessageContaining("left untouched");
      assertThatThrownBy(() -> library.images().all()).isInstanceOf(MorphscoutException.class)
          .hasMessageContaining("damaged");
    }
    before.put("writer.lock", new byte[0]); // the indexer's (empty) lock file is the one file it makes
    assertUntouched(before);
  }

  private void assertUntouched(Map<String, byte[]> before) throws IOException {
    Map<String, byte[]> after = snapshot(catalog);
    assertThat(after.keySet()).as("files of the catalog folder").isEqualTo(before.keySet());
    before.forEach((name, bytes) -> assertThat(after.get(name)).as("bytes of %s", name).isEqualTo(bytes));
  }

  /** Every file under the folder (relative path to bytes); folders are not listed. */
  private static Map<String, byte[]> snapshot(Path dir) throws IOException {
    return FolderSnapshot.of(dir);
  }
}
