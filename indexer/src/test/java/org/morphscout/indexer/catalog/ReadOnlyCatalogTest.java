package org.morphscout.indexer.catalog;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A catalog on read-only media is read without writing anything. The test runs as any user (root can write through
 * permissions), so it forces the read-only-media path and checks that no file of the folder changes or appears.
 */
class ReadOnlyCatalogTest {
  @TempDir Path tmp;

  @Test
  void readingOnReadOnlyMediaChangesNothing() throws IOException {
    Path dir = tmp.resolve("catalog");
    try (Catalog c = Catalog.open(dir)) {
      new ImageStore(c).ensureRoot(tmp.resolve("photos"));
    }
    Map<String, byte[]> before = snapshot(dir);
    try (Catalog c = Catalog.openForReading(dir, true)) {
      assertThat(c.isReadOnly()).isTrue();
      assertThat(c.onReadOnlyMedia()).isTrue();
      int roots = c.read(conn -> {
        try (Statement s = conn.createStatement(); ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM roots")) {
          rs.next();
          return rs.getInt(1);
        }
      });
      assertThat(roots).isEqualTo(1);
    }
    Map<String, byte[]> after = snapshot(dir);
    assertThat(after.keySet()).isEqualTo(before.keySet());
    before.forEach((name, bytes) -> assertThat(after.get(name)).as(name).isEqualTo(bytes));
  }

  private static Map<String, byte[]> snapshot(Path dir) throws IOException {
    return FolderSnapshot.of(dir);
  }

  @Test
  void aMissingTemporaryFolderIsSaidInOneLine() {
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> Catalog.requireTempFolder(tmp.resolve("no-such-tmp")))
        .isInstanceOf(org.morphscout.indexer.MorphscoutException.class).hasMessageContaining("TMPDIR")
        .hasMessageContaining("no-such-tmp");
    Catalog.requireTempFolder(tmp);
  }
}
