package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.ingest.DataEndCheck.Completeness;

/** End-marker walks over hand-made streams (ITU-T T.81 Annex B; ISO/IEC 15948 section 5). */
class DataEndCheckTest {
  @TempDir Path dir;

  private Path file(String name, int... bytes) throws Exception {
    byte[] b = new byte[bytes.length];
    for (int i = 0; i < bytes.length; i++) {
      b[i] = (byte) bytes[i];
    }
    return TestImages.write(dir, name, b);
  }

  @Test
  void jpegMarkers() throws Exception {
    // SOI, APP1 (length 6) containing a fake EOI inside (must be skipped as segment data), SOS (length 3... )
    // entropy data with a stuffed FF00 and a restart marker FFD0, then EOI.
    Path complete = file("c.jpg",
        0xFF, 0xD8,
        0xFF, 0xE1, 0x00, 0x06, 0xFF, 0xD9, 0x00, 0x00,
        0xFF, 0xDA, 0x00, 0x03, 0x01,
        0x12, 0xFF, 0x00, 0x34, 0xFF, 0xD0, 0x56,
        0xFF, 0xD9);
    assertThat(DataEndCheck.jpeg(complete)).isEqualTo(Completeness.COMPLETE);
    Path cut = file("t.jpg",
        0xFF, 0xD8,
        0xFF, 0xE1, 0x00, 0x06, 0xFF, 0xD9, 0x00, 0x00,
        0xFF, 0xDA, 0x00, 0x03, 0x01,
        0x12, 0xFF, 0x00, 0x34);
    assertThat(DataEndCheck.jpeg(cut)).isEqualTo(Completeness.TRUNCATED);
    Path cutInSegment = file("s.jpg", 0xFF, 0xD8, 0xFF, 0xE1, 0x00, 0x40, 0x01);
    assertThat(DataEndCheck.jpeg(cutInSegment)).isEqualTo(Completeness.TRUNCATED);
    Path garbage = file("g.jpg", 0xFF, 0xD8, 0x12, 0x34);
    assertThat(DataEndCheck.jpeg(garbage)).isEqualTo(Completeness.UNKNOWN);
  }

  @Test
  void pngChunks() throws Exception {
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    b.write(TestImages.PNG_SIGNATURE);
    b.write(TestImages.pngChunk("IHDR", TestImages.ihdr(1, 1, 8, 0)));
    b.write(TestImages.pngChunk("IDAT", new byte[] {1, 2, 3, 4, 5}));
    byte[] noEnd = b.toByteArray();
    b.write(TestImages.pngChunk("IEND", new byte[0]));
    byte[] full = b.toByteArray();
    assertThat(DataEndCheck.png(TestImages.write(dir, "f.png", full))).isEqualTo(Completeness.COMPLETE);
    assertThat(DataEndCheck.png(TestImages.write(dir, "n.png", noEnd))).isEqualTo(Completeness.TRUNCATED);
    assertThat(DataEndCheck.png(TestImages.write(dir, "h.png", Arrays.copyOf(full, 40))))
        .isEqualTo(Completeness.TRUNCATED);
  }

  @Test
  void riffSize() throws Exception {
    byte[] webp = WebPLosslessBuilder.build(2, 1, new boolean[] {true, false}, 0, 0, 255, 0, 255);
    assertThat(DataEndCheck.riff(TestImages.write(dir, "f.webp", webp))).isEqualTo(Completeness.COMPLETE);
    assertThat(DataEndCheck.riff(TestImages.write(dir, "t.webp", Arrays.copyOf(webp, webp.length - 3))))
        .isEqualTo(Completeness.TRUNCATED);
  }
}
