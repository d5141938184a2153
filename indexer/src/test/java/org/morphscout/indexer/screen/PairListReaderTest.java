package org.morphscout.indexer.screen;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

class PairListReaderTest {
  @TempDir Path tmp;

  private List<PairListReader.Entry> read(byte[] content) throws IOException {
    Path f = Files.write(tmp.resolve("pairs.csv"), content);
    List<PairListReader.Entry> out = new ArrayList<>();
    try (PairListReader r = new PairListReader(f)) {
      r.forEachRemaining(out::add);
    }
    return out;
  }

  private static byte[] utf8(String s) {
    return s.getBytes(StandardCharsets.UTF_8);
  }

  @Test
  void aByteOrderMarkIsNotPartOfThePath() throws IOException {
    List<PairListReader.Entry> rows = read(utf8("\uFEFF/p/a.jpg,/p/b.jpg\r\n/p/c.jpg,/p/d.jpg\r\n"));
    assertThat(rows).extracting(e -> e.row().pathA()).containsExactly("/p/a.jpg", "/p/c.jpg");
  }

  @Test
  void badRowsNameTheirLineAndTheRestIsRead() throws IOException {
    byte[] latin1 = "/p/caf\u00e9.jpg,/p/b.jpg\n".getBytes(StandardCharsets.ISO_8859_1);
    byte[] head = utf8("a,b,shot\n/p/a.jpg,/p/b.jpg,one\n\n/p/only-one.jpg\n");
    byte[] tail = utf8("/p/x.jpg,\"/p/y\n.jpg\",two\n/p/e.jpg,\"unclosed\n/p/f.jpg,/p/g.jpg\n");
    byte[] all = new byte[head.length + latin1.length + tail.length];
    System.arraycopy(head, 0, all, 0, head.length);
    System.arraycopy(latin1, 0, all, head.length, latin1.length);
    System.arraycopy(tail, 0, all, head.length + latin1.length, tail.length);
    Path f = Files.write(tmp.resolve("pairs.csv"), all);
    try (PairListReader r = new PairListReader(f)) {
      assertThat(r.extraNames()).containsExactly("shot");
      List<PairListReader.Entry> rows = new ArrayList<>();
      r.forEachRemaining(rows::add);
      assertThat(rows).hasSize(5);
      assertThat(rows.get(0).row().extras()).containsExactly("one");
      assertThat(rows.get(1).problem()).isEqualTo("line 4: a row needs two image paths");
      assertThat(rows.get(2).problem()).startsWith("line 5: not UTF-8");
      assertThat(rows.get(3).row().pathB()).isEqualTo("/p/y\n.jpg");
      assertThat(rows.get(4).line()).isEqualTo(8);
      assertThat(rows.get(4).problem()).contains("unbalanced quote");
    }
  }

  @Test
  void utf16AndBinaryFilesAreRefusedWhole() {
    assertThatThrownBy(() -> read("/p/a.jpg,/p/b.jpg\n".getBytes(StandardCharsets.UTF_16)))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("UTF-16");
    assertThatThrownBy(() -> read(new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 13}))
        .isInstanceOf(MorphscoutException.class).hasMessageContaining("binary");
  }

  @Test
  void emptyFilesHaveNoRowsAndHugeRowsAreRefusedAlone() throws IOException {
    assertThat(read(new byte[0])).isEmpty();
    assertThat(read(utf8("\n\n  \n"))).isEmpty();
    String huge = "/p/" + "x".repeat(PairListReader.MAX_ROW_BYTES) + ".jpg,/p/b.jpg\n";
    List<PairListReader.Entry> rows = read(utf8(huge + "/p/a.jpg,/p/b.jpg\n"));
    assertThat(rows).hasSize(2);
    assertThat(rows.get(0).problem()).contains("longer than 1 MB");
    assertThat(rows.get(1).row().pathA()).isEqualTo("/p/a.jpg");
  }

  @Test
  void streamsLongListsRowByRow() throws IOException {
    Path f = tmp.resolve("long.csv");
    int n = 200_000;
    try (BufferedWriter w = Files.newBufferedWriter(f)) {
      for (int i = 0; i < n; i++) {
        w.write("/p/a" + i + ".jpg,/p/b" + i + ".jpg\n");
      }
    }
    long count = 0;
    try (PairListReader r = new PairListReader(f)) {
      while (r.hasNext()) {
        assertThat(r.next().row()).isNotNull();
        count++;
      }
    }
    assertThat(count).isEqualTo(n);
  }
}
