package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import org.junit.jupiter.api.Test;

/**
 * The fast JPEG path's native library comes from the {@code org.openpnp:opencv} artifact alone: it carries a build for
 * each platform we promise (Linux x86-64 and arm64, macOS x86-64 and arm64), and each build is for the machine its
 * folder names. Only Linux x86-64 can be loaded here ({@code OpenCvJpegDecoderTest}); for the others the file headers
 * are read: the ELF machine field (System V ABI, gABI: 62 x86-64, 183 AArch64) and the Mach-O CPU type (Apple's
 * {@code mach/machine.h}: 0x01000007 x86-64, 0x0100000C arm64; both values from memory).
 */
class OpenCvNativesTest {
  private static final String ROOT = "nu/pattern/opencv/";

  @Test
  void linuxBuildsAreElfForTheirMachines() throws IOException {
    assertThat(elfMachine("linux/x86_64/libopencv_java490.so")).isEqualTo(62);
    assertThat(elfMachine("linux/ARMv8/libopencv_java490.so")).isEqualTo(183);
  }

  @Test
  void macBuildsAreMachOForTheirMachines() throws IOException {
    assertThat(machCpu("osx/x86_64/libopencv_java490.dylib")).isEqualTo(0x01000007);
    assertThat(machCpu("osx/ARMv8/libopencv_java490.dylib")).isEqualTo(0x0100000C);
  }

  private static ByteBuffer head(String resource) throws IOException {
    try (InputStream in = OpenCvNativesTest.class.getClassLoader().getResourceAsStream(ROOT + resource)) {
      assertThat(in).as("%s in the org.openpnp:opencv artifact", resource).isNotNull();
      return ByteBuffer.wrap(in.readNBytes(64)).order(ByteOrder.LITTLE_ENDIAN);
    }
  }

  /** e_machine of a 64-bit little-endian ELF file. */
  private static int elfMachine(String resource) throws IOException {
    ByteBuffer b = head(resource);
    assertThat(b.getInt(0)).as("ELF magic of %s", resource).isEqualTo(0x464C457F); // 0x7F 'E' 'L' 'F'
    assertThat(b.get(4)).as("64-bit").isEqualTo((byte) 2);
    assertThat(b.get(5)).as("little-endian").isEqualTo((byte) 1);
    return b.getShort(18) & 0xffff;
  }

  /** cputype of a 64-bit Mach-O file (magic MH_MAGIC_64, 0xFEEDFACF, stored little-endian). */
  private static int machCpu(String resource) throws IOException {
    ByteBuffer b = head(resource);
    assertThat(b.getInt(0)).as("Mach-O 64 magic of %s", resource).isEqualTo(0xFEEDFACF);
    return b.getInt(4);
  }
}
