package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.lucene.store.MMapDirectory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MappedIndexFilesTest {
  private static final long GIB = 1L << 30;

  @Test
  void anIndexUpToHalfOfTheMemoryIsLoadedAtOpen() {
    assertThat(MappedIndexFiles.loads(4 * GIB, 24 * GIB)).isTrue(); // a million 1024-d vectors on this machine
    assertThat(MappedIndexFiles.loads(12 * GIB, 24 * GIB)).isTrue();
    assertThat(MappedIndexFiles.loads(12 * GIB + 1, 24 * GIB)).isFalse();
    assertThat(MappedIndexFiles.loads(0, 24 * GIB)).isTrue();
    assertThat(MappedIndexFiles.loads(1, 0)).as("memory unknown").isFalse();
    assertThat(MappedIndexFiles.loads(1, -1)).isFalse();
  }

  @Test
  void theFolderSizeDecides(@TempDir Path dir) throws IOException {
    Files.write(dir.resolve("_0.vec"), new byte[4096]);
    Files.write(dir.resolve("_0.vex"), new byte[1000]);
    assertThat(MappedIndexFiles.loadsAtOpen(dir, 2 * 5096)).isTrue();
    assertThat(MappedIndexFiles.loadsAtOpen(dir, 2 * 5096 - 1)).isFalse();
    try (MMapDirectory directory = MappedIndexFiles.open(dir)) { // and it opens either way
      assertThat(directory.listAll()).contains("_0.vec", "_0.vex");
    }
  }
}
