package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

class OutputFileTest {
  @TempDir Path tmp;

  @Test
  void refusesFoldersInputsAndFilesInThePath() throws IOException {
    Path input = Files.writeString(tmp.resolve("a.png"), "picture");
    assertThatThrownBy(() -> OutputFile.check(input, List.of(input))).isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("one of the input images");
    // The same file by another spelling, and through a link.
    assertThatThrownBy(() -> OutputFile.check(tmp.resolve("x/../a.png"), List.of(input)))
        .hasMessageContaining("one of the input images");
    Path link = Files.createSymbolicLink(tmp.resolve("link.png"), input);
    assertThatThrownBy(() -> OutputFile.check(link, List.of(input))).hasMessageContaining("one of the input images");

    Path empty = Files.createDirectories(tmp.resolve("empty"));
    assertThatThrownBy(() -> OutputFile.write(empty, List.of(), f -> Files.writeString(f, "x")))
        .hasMessageContaining("is a folder");
    assertThat(empty).isEmptyDirectory();
    assertThatThrownBy(() -> OutputFile.check(input.resolve("under-a-file.png"), List.of()))
        .hasMessageContaining("is a file, not a folder");
    assertThat(input).hasContent("picture");
  }

  @Test
  void aFailedWriteLeavesTheOldFileAndNoTemporaryFile() throws IOException {
    Path out = Files.writeString(tmp.resolve("sheet.png"), "old");
    assertThatThrownBy(() -> OutputFile.write(out, List.of(), f -> {
      Files.writeString(f, "half");
      throw new IOException("No space left on device");
    })).hasMessageContaining("No space left");
    assertThat(out).hasContent("old");
    try (var files = Files.list(tmp)) {
      assertThat(files.toList()).containsExactly(out);
    }
    OutputFile.write(out, List.of(), f -> Files.writeString(f, "new"));
    assertThat(out).hasContent("new");
  }
}
