package org.morphscout.indexer;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;
import java.sql.SQLException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DiskSpaceTest {
  @TempDir Path tmp;

  @Test
  void fullDisksAreRecognisedThroughCauses() {
    // The ENOSPC text of Linux and the SQLITE_FULL code of SQLite (sqlite.org/rescode.html#full).
    assertThat(DiskSpace.isFull(new FileSystemException("/x", null, "No space left on device"))).isTrue();
    assertThat(DiskSpace.isFull(new RuntimeException("wrapped", new SQLException(
        "[SQLITE_FULL] Insertion failed because database is full (database or disk is full)")))).isTrue();
    assertThat(DiskSpace.isFull(new IOException("Disk quota exceeded"))).isTrue();
    assertThat(DiskSpace.isFull(new IOException("Permission denied"))).isFalse();
    assertThat(DiskSpace.isFull(null)).isFalse();
  }

  @Test
  void theMessageIsOneLineNamingTheFolderAndFreeSpace() {
    String m = DiskSpace.describe(new IOException("No space left on device"), tmp.resolve("not/yet"));
    assertThat(m).contains("disk is full", tmp.resolve("not/yet").toString())
        .containsPattern("\\d+(\\.\\d)? [KM]iB free").doesNotContain("\n");
    assertThat(DiskSpace.describe(new IOException("Broken pipe"), tmp)).isEqualTo("Broken pipe");
  }
}
