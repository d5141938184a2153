package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * Damaged and unusual catalogs: an empty database file, damage inside the small tables, garbage vector segments. SQLite
 * file layout from the SQLite documentation "Database File Format" (sqlite.org/fileformat.html): the page size is at
 * header offset 16 (2 bytes, big-endian).
 */
class DamagedCatalogTest {
  private static final long SEED = 1804;

  @TempDir Path tmp;

  @Test
  void anEmptyDatabaseFileIsRefusedByEveryOpenAndLeftEmpty() throws IOException {
    Path catalog = Files.createDirectories(tmp.resolve("catalog"));
    Path db = Files.createFile(catalog.resolve("catalog.db"));
    for (var open : List.<ThrowingOpen>of(Library::open, Library::openExisting, Library::openForReading)) {
      assertThatThrownBy(() -> open.apply(catalog).close()).isInstanceOf(MorphscoutException.class)
          .hasMessageContaining("empty (0 bytes)").hasMessageContaining("left untouched");
    }
    assertThat(Files.size(db)).isZero();
    try (Stream<Path> files = Files.list(catalog)) {
      assertThat(files.toList()).containsExactly(db);
    }
  }

  @Test
  void damageInTheImagesTableIsNoticedWhenOpeningForReading() throws IOException {
    Path catalog = tmp.resolve("catalog");
    try (Library library = Library.open(catalog)) {
      long root = library.images().ensureRoot(tmp.resolve("photos"));
      library.catalog().inTransaction(c -> {
        for (int i = 0; i < 2000; i++) {
          library.images().insertPending(root, tmp.resolve("photos/p-" + i + ".jpg").toString(), i, i,
              String.format("%064x", i));
        }
        return null;
      });
    }
    try (Library library = Library.openForReading(catalog)) {
      assertThat(library.images().all()).hasSize(2000);
      assertThat(library.catalog().isReadOnly()).isTrue();
    }
    Path db = catalog.resolve("catalog.db");
    byte[] bytes = Files.readAllBytes(db);
    int pageSize = ((bytes[16] & 0xFF) << 8) | (bytes[17] & 0xFF);
    int pages = bytes.length / pageSize;
    assertThat(pages).as("pages").isGreaterThan(10);
    // One page in the images table's range overwritten with seeded noise.
    Random rnd = new Random(SEED);
    int page = pages / 2 + rnd.nextInt(pages / 4);
    byte[] noise = new byte[pageSize];
    rnd.nextBytes(noise);
    System.arraycopy(noise, 0, bytes, page * pageSize, pageSize);
    Files.write(db, bytes);
    byte[] damaged = Files.readAllBytes(db);
    assertThatThrownBy(() -> Library.openForReading(catalog).close()).as("seed %d, page %d", SEED, page)
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("damaged").hasMessageContaining(db.toString());
    assertThat(Files.readAllBytes(db)).isEqualTo(damaged);
  }

  @Test
  void garbageVectorSegmentsAreRebuiltFromTheDatabase() throws IOException {
    Path root = Files.createDirectories(tmp.resolve("library"));
    List<FamilyItem> family = TestFamilies.silhouetteFamily(SEED, 4, Archetype.VASE, Archetype.BOTTLE);
    FamilyFolders.writePngs(family, root, "v");
    Path catalog = tmp.resolve("catalog");
    try (Library library = Library.open(catalog)) {
      index(library, false);
    }
    Random rnd = new Random(SEED);
    try (Stream<Path> files = Files.list(catalog.resolve("vectors"))) {
      for (Path f : files.filter(p -> !p.getFileName().toString().equals("write.lock")).toList()) {
        byte[] garbage = new byte[(int) Math.max(64, Files.size(f))];
        rnd.nextBytes(garbage);
        Files.write(f, garbage);
      }
    }
    // A read command finds the index unusable and rebuilds it from the catalog's stored vectors.
    try (Library library = Library.openForReading(catalog);
        QueryContext context = new QueryContext(library, AnalysisSetup.defaults())) {
      assertThat(context.index().ids()).isEqualTo(ready(library));
    }
    garble(catalog, rnd);
    // So does the indexer, with or without --rebuild-vectors.
    try (Library library = Library.open(catalog)) {
      IndexReport report = index(library, true);
      assertThat(report.vectorsRestored()).isEqualTo(4);
      assertThat(report.indexed()).isZero();
      try (LuceneVectorIndex idx = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir())) {
        assertThat(idx.ids()).isEqualTo(ready(library));
      }
    }
    garble(catalog, rnd);
    try (Library library = Library.open(catalog)) {
      assertThat(index(library, false).vectorsRestored()).isEqualTo(4);
    }
    assertThat(catalog.resolve("vectors.unusable")).doesNotExist();
  }

  @Test
  void statusCheckReadsEverything() throws IOException {
    Path catalog = tmp.resolve("catalog");
    try (Library library = Library.open(catalog)) {
      assertThat(CatalogCheck.run(library)).isEqualTo(new CatalogCheck("ok", "none yet"));
    }
  }

  private static void garble(Path catalog, Random rnd) throws IOException {
    try (Stream<Path> files = Files.list(catalog.resolve("vectors"))) {
      for (Path f : files.filter(p -> p.getFileName().toString().startsWith("segments")).toList()) {
        byte[] garbage = new byte[(int) Files.size(f)];
        rnd.nextBytes(garbage);
        Files.write(f, garbage);
      }
    }
  }

  private static Set<Long> ready(Library library) {
    Set<Long> ids = new HashSet<>();
    library.images().withStatus(ImageStatus.READY).forEach(r -> ids.add(r.id()));
    return ids;
  }

  private IndexReport index(Library library, boolean rebuild) throws IOException {
    return new LibraryIndexer(library, AnalysisSetup.defaults(),
        IndexOptions.defaults().withThreads(1).withNeighbours(2).withRebuildVectors(rebuild))
        .index(List.of(tmp.resolve("library")), ProgressListener.NONE, CancellationToken.none());
  }

  @FunctionalInterface
  interface ThrowingOpen {
    Library apply(Path dir) throws IOException;
  }
}
