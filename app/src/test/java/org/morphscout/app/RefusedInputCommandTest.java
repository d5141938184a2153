package org.morphscout.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.library.Library;

/**
 * What the command line does with a catalog it must refuse (newer schema, damaged file) and with a model file whose
 * checksum does not match: exit code 3 ("could not do the work", see ExitCodes), one clear line on stderr, no stack
 * trace, and the catalog's files left exactly as they were.
 */
class RefusedInputCommandTest {
  private static final long SEED = 20261206L;

  @TempDir Path tmp;

  private record Run(int code, String out, String err) {}

  private static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
    return new Run(code, out.toString(), err.toString());
  }

  private Path catalog() throws IOException {
    Path catalog = tmp.resolve("catalog");
    try (Library library = Library.open(catalog)) {
      library.images().ensureRoot(Files.createDirectories(tmp.resolve("photos")));
    }
    return catalog;
  }

  @Test
  void aCatalogFromANewerSchemaIsRefusedByEveryKindOfCommand() throws IOException {
    Path catalog = catalog();
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
    for (String[] args : new String[][] {
      {"--catalog", catalog.toString(), "status"},
      {"--catalog", catalog.toString(), "index", tmp.resolve("photos").toString()},
    }) {
      Run r = run(args);
      assertThat(r.code()).as("exit code of %s; stderr: %s", args[2], r.err()).isEqualTo(3);
      assertThat(r.err()).contains("newer Morphscout").contains("999").contains("left untouched")
          .doesNotContain("Exception").doesNotContain("\tat ");
    }
    assertUntouched(catalog, before);
  }

  @Test
  void aDamagedCatalogIsRefusedWithAClearMessage() throws IOException {
    Path catalog = catalog();
    Path db = catalog.resolve("catalog.db");
    byte[] bytes = Files.readAllBytes(db);
    System.arraycopy("not a database!!".getBytes(StandardCharsets.US_ASCII), 0, bytes, 0, 16);
    Files.write(db, bytes);
    Map<String, byte[]> before = snapshot(catalog);
    Run r = run("--catalog", catalog.toString(), "status");
    assertThat(r.code()).as(r.err()).isEqualTo(3);
    assertThat(r.err()).contains(db.toString()).contains("damaged").contains("left untouched")
        .doesNotContain("\tat ");
    assertUntouched(catalog, before);
  }

  @Test
  void aSalientModelWithTheWrongChecksumIsRefusedAndNotInstalled() throws IOException {
    Path catalog = catalog();
    byte[] junk = new byte[100_000];
    new SplittableRandom(SEED).nextBytes(junk);
    Path bad = Files.write(tmp.resolve("u2netp.onnx"), junk);
    Path folder = tmp.resolve("models");
    Run r = run("--catalog", catalog.toString(), "models", "add-salient", "--from", bad.toString(), "--models",
        folder.toString());
    assertThat(r.code()).as("seed %d; %s", SEED, r.err()).isEqualTo(3);
    assertThat(r.err()).contains("checksum").doesNotContain("\tat ");
    try (Stream<Path> models = Files.exists(folder) ? Files.list(folder)
        : Stream.empty()) {
      assertThat(models.map(p -> p.getFileName().toString())).as("installed model files")
          .noneMatch(n -> n.startsWith("u2netp"));
    }
  }

  private static void assertUntouched(Path dir, Map<String, byte[]> before) throws IOException {
    Map<String, byte[]> after = snapshot(dir);
    assertThat(after.keySet()).as("files of the catalog folder").isEqualTo(before.keySet());
    before.forEach((name, bytes) -> assertThat(after.get(name)).as("bytes of %s", name).isEqualTo(bytes));
  }

  private static Map<String, byte[]> snapshot(Path dir) throws IOException {
    Map<String, byte[]> files = new TreeMap<>();
    try (Stream<Path> all = Files.walk(dir)) {
      for (Path p : all.filter(Files::isRegularFile).toList()) {
        files.put(dir.relativize(p).toString(), Files.readAllBytes(p));
      }
    }
    return files;
  }
}
