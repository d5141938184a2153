package org.morphscout.indexer.ingest;

import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Builds a tiny lossless WebP byte by byte, because no pure-Java WebP writer exists.
 *
 * <p>Construction, following RFC 9649 (WebP Image Format), section 2 (RIFF container) and section 3 (lossless
 * bitstream, "VP8L"):
 * <ol>
 *   <li>RIFF header: "RIFF", little-endian size of everything after this field, "WEBP"; then the chunk "VP8L"
 *       with its little-endian payload size, payload, and a pad byte when the size is odd (section 2.5, 2.7).</li>
 *   <li>Payload: signature byte 0x2F, then a bit stream read least-significant bit first (section 3.2): 14 bits
 *       width - 1, 14 bits height - 1, 1 bit alpha_is_used, 3 bits version (0).</li>
 *   <li>1 bit "transform present" = 0 (section 4): no transforms.</li>
 *   <li>Spatially coded ARGB image (section 5): 1 bit colour cache = 0, 1 bit meta prefix codes = 0, then five
 *       prefix codes, for green (+ length prefixes), red, blue, alpha and distance, each a "simple code length code"
 *       (section 3.7.2.1.1): 1 bit = 1 (simple), 1 bit num_symbols - 1, 1 bit is_first_8bits, first symbol (1 or 8
 *       bits), second symbol (8 bits) when two. One symbol means a zero-length code (no bits per pixel); two
 *       symbols get one-bit codes, 0 for the smaller symbol value, 1 for the larger (canonical code order).</li>
 *   <li>Pixels: for each pixel in row-major order, the green code, then red, blue, alpha codes (section 5.2.2);
 *       here only green has two symbols, so each pixel costs one bit: 0 = the first green, 1 = the second.</li>
 * </ol>
 * So the image holds two colours, {@code (r, g0, b, a)} and {@code (r, g1, b, a)}, laid out by a bit per pixel.
 */
final class WebPLosslessBuilder {
  private WebPLosslessBuilder() {}

  /**
   * @param pattern row-major, true selects green value {@code g1}
   * @param g0 must be smaller than {@code g1}
   */
  static byte[] build(int width, int height, boolean[] pattern, int r, int g0, int g1, int b, int a) {
    if (g0 >= g1 || pattern.length != width * height) {
      throw new IllegalArgumentException("need g0 < g1 and one pattern entry per pixel");
    }
    Bits bits = new Bits();
    bits.put(width - 1, 14).put(height - 1, 14).put(a == 255 ? 0 : 1, 1).put(0, 3);
    bits.put(0, 1); // no transform
    bits.put(0, 1); // no colour cache
    bits.put(0, 1); // no meta prefix codes
    bits.put(1, 1).put(1, 1).put(1, 1).put(g0, 8).put(g1, 8); // green: two symbols
    single(bits, r);
    single(bits, b);
    single(bits, a);
    single(bits, 0); // distance: never used
    for (boolean p : pattern) {
      bits.put(p ? 1 : 0, 1);
    }
    byte[] stream = bits.bytes();
    byte[] payload = new byte[1 + stream.length];
    payload[0] = 0x2F;
    System.arraycopy(stream, 0, payload, 1, stream.length);
    int pad = payload.length % 2;
    ByteBuffer riff = ByteBuffer.allocate(12 + 8 + payload.length + pad).order(ByteOrder.LITTLE_ENDIAN);
    riff.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(4 + 8 + payload.length + pad);
    riff.put("WEBP".getBytes(StandardCharsets.US_ASCII));
    riff.put("VP8L".getBytes(StandardCharsets.US_ASCII)).putInt(payload.length).put(payload);
    return riff.array();
  }

  /**
   * Wraps a simple lossless WebP ({@link #build}) in the extended format (RFC 9649 section 2.7): a VP8X chunk
   * (flags byte with the EXIF bit 0x08 and, when {@code alpha}, the alpha bit 0x10; 3 reserved bytes; canvas
   * width - 1 and height - 1 as 24-bit little-endian), the VP8L chunk, then an EXIF chunk holding {@code exifTiff}
   * (a TIFF-structured Exif block without the "Exif\0\0" prefix).
   */
  static byte[] withExif(byte[] simpleWebP, int width, int height, boolean alpha, byte[] exifTiff) {
    byte[] vp8l = java.util.Arrays.copyOfRange(simpleWebP, 12, simpleWebP.length); // chunk incl. header + pad
    int exifPad = exifTiff.length % 2;
    int size = 4 + (8 + 10) + vp8l.length + (8 + exifTiff.length + exifPad);
    ByteBuffer b = ByteBuffer.allocate(8 + size).order(ByteOrder.LITTLE_ENDIAN);
    b.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(size).put("WEBP".getBytes(StandardCharsets.US_ASCII));
    b.put("VP8X".getBytes(StandardCharsets.US_ASCII)).putInt(10);
    b.put((byte) (0x08 | (alpha ? 0x10 : 0))).put((byte) 0).put((byte) 0).put((byte) 0);
    put24(b, width - 1);
    put24(b, height - 1);
    b.put(vp8l);
    b.put("EXIF".getBytes(StandardCharsets.US_ASCII)).putInt(exifTiff.length).put(exifTiff);
    if (exifPad == 1) {
      b.put((byte) 0);
    }
    return b.array();
  }

  private static void put24(ByteBuffer b, int v) {
    b.put((byte) v).put((byte) (v >> 8)).put((byte) (v >> 16));
  }

  /** A simple code with one symbol: 8-bit form when the symbol needs more than 1 bit. */
  private static void single(Bits bits, int symbol) {
    bits.put(1, 1).put(0, 1);
    if (symbol <= 1) {
      bits.put(0, 1).put(symbol, 1);
    } else {
      bits.put(1, 1).put(symbol, 8);
    }
  }

  /** Least-significant-bit-first bit packer (RFC 9649 section 3.2). */
  private static final class Bits {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private int current;
    private int used;

    Bits put(int value, int count) {
      for (int i = 0; i < count; i++) {
        current |= ((value >> i) & 1) << used;
        if (++used == 8) {
          out.write(current);
          current = 0;
          used = 0;
        }
      }
      return this;
    }

    byte[] bytes() {
      if (used > 0) {
        out.write(current);
        current = 0;
        used = 0;
      }
      return out.toByteArray();
    }
  }
}
