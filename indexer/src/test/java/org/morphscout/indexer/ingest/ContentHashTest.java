package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** SHA-256 against the FIPS 180-2 example vectors (Appendix B) and the empty message. */
class ContentHashTest {
  @TempDir Path dir;

  @Test
  void fipsOneBlockMessage() throws Exception {
    // FIPS 180-2 Appendix B.1: SHA-256("abc").
    Path file = Files.writeString(dir.resolve("abc.txt"), "abc", StandardCharsets.US_ASCII);
    assertThat(ContentHash.sha256Hex(file))
        .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  }

  @Test
  void fipsMillionAs() throws Exception {
    // FIPS 180-2 Appendix B.3: one million 'a' -- spans many of the 64 KiB read blocks.
    byte[] a = new byte[1_000_000];
    Arrays.fill(a, (byte) 'a');
    Path file = Files.write(dir.resolve("million.bin"), a);
    assertThat(ContentHash.sha256Hex(file))
        .isEqualTo("cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0");
  }

  @Test
  void emptyFile() throws Exception {
    // SHA-256 of the empty message: NIST's additional SHA-2 examples (CSRC, "SHA2_Additional", the 0-byte message;
    // from memory), and the same as GNU coreutils' sha256sum of an empty file on this machine.
    Path file = Files.write(dir.resolve("empty"), new byte[0]);
    assertThat(ContentHash.sha256Hex(file))
        .isEqualTo("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    assertThat(ContentHash.sha256Hex(new byte[0])).isEqualTo(ContentHash.sha256Hex(file));
  }
}
