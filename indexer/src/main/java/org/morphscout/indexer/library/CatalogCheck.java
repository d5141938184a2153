package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Files;
import java.util.HashSet;
import java.util.Optional;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.vector.LuceneIndexOptions;
import org.morphscout.indexer.vector.LuceneVectorIndex;

/**
 * The full check of a catalog on request ({@code status --check}): every page of the database (SQLite's
 * {@code PRAGMA quick_check}), and whether the vector index opens and holds exactly the catalog's analysed images.
 * Reads only. Opening a catalog runs the cheap part (header, small tables) every time; this is the rest.
 *
 * @param database "ok" or what is wrong with the database
 * @param vectors "ok", "none yet", or what is wrong with the vector index
 */
public record CatalogCheck(String database, String vectors) {
  /** Whether both parts are fine. */
  public boolean ok() {
    return database.equals("ok") && (vectors.equals("ok") || vectors.equals("none yet"));
  }

  /** Runs the check. */
  public static CatalogCheck run(Library library) throws IOException {
    String database = "ok";
    try {
      library.catalog().requireIntact();
    } catch (MorphscoutException e) {
      database = e.getMessage();
    }
    return new CatalogCheck(database, database.equals("ok") ? vectors(library) : "not checked (database damaged)");
  }

  private static String vectors(Library library) throws IOException {
    Optional<String> model = LibrarySettings.activeModel(library.features());
    if (model.isEmpty() || !Files.isDirectory(library.catalog().vectorDir())) {
      return "none yet";
    }
    Set<Long> ready = new HashSet<>(library.features().readyIds(model.get()));
    try (LuceneVectorIndex index = LuceneVectorIndex.openReadOnly(library.catalog().vectorDir(),
        LuceneIndexOptions.defaults())) {
      Set<Long> held = index.ids();
      if (held.equals(ready)) {
        return "ok";
      }
      Set<Long> missing = new HashSet<>(ready);
      missing.removeAll(held);
      Set<Long> extra = new HashSet<>(held);
      extra.removeAll(ready);
      return missing.size() + " analysed images missing and " + extra.size() + " extra in the vector index (brought "
          + "in line from the catalog by the next command that searches, or by morphscout index)";
    } catch (MorphscoutException e) {
      return e.getMessage();
    }
  }
}
