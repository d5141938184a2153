package org.morphscout.indexer.catalog;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import org.morphscout.indexer.silhouette.Mask;

/**
 * Encodes vectors and masks for BLOB columns: float32 little-endian, or IEEE 754 binary16 ("half") little-endian
 * where about three significant digits suffice; masks as packed bits, most significant first.
 */
public final class Blobs {
  private Blobs() {}

  public static byte[] floats(float[] v) {
    ByteBuffer b = ByteBuffer.allocate(v.length * Float.BYTES).order(ByteOrder.LITTLE_ENDIAN);
    b.asFloatBuffer().put(v);
    return b.array();
  }

  /**
   * Half-precision encoding (IEEE 754-2008 binary16, round to nearest even): half the bytes of {@link #floats}, a
   * relative error of at most 2^-11 for values of magnitude 6.1e-5 to 65504.
   */
  public static byte[] halfFloats(float[] v) {
    ByteBuffer b = ByteBuffer.allocate(v.length * Short.BYTES).order(ByteOrder.LITTLE_ENDIAN);
    for (float x : v) {
      b.putShort(Float.floatToFloat16(x));
    }
    return b.array();
  }

  /** Decodes {@link #halfFloats}. */
  public static float[] fromHalfFloats(byte[] bytes) {
    if (bytes.length % Short.BYTES != 0) {
      throw new IllegalArgumentException("half-float blob of " + bytes.length + " bytes is not whole values");
    }
    ByteBuffer b = ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN);
    float[] v = new float[bytes.length / Short.BYTES];
    for (int i = 0; i < v.length; i++) {
      v[i] = Float.float16ToFloat(b.getShort());
    }
    return v;
  }

  public static float[] floats(byte[] bytes) {
    if (bytes.length % Float.BYTES != 0) {
      throw new IllegalArgumentException("vector blob of " + bytes.length + " bytes is not whole floats");
    }
    float[] v = new float[bytes.length / Float.BYTES];
    ByteBuffer.wrap(bytes).order(ByteOrder.LITTLE_ENDIAN).asFloatBuffer().get(v);
    return v;
  }

  public static byte[] maskBits(Mask m) {
    int n = m.width() * m.height();
    byte[] out = new byte[(n + 7) / 8];
    for (int i = 0; i < n; i++) {
      if (m.get(i)) {
        out[i >> 3] |= (byte) (0x80 >>> (i & 7));
      }
    }
    return out;
  }

  public static Mask mask(int width, int height, byte[] bits) {
    int n = width * height;
    if (bits.length != (n + 7) / 8) {
      throw new IllegalArgumentException("mask blob has " + bits.length + " bytes, expected " + (n + 7) / 8);
    }
    byte[] data = new byte[n];
    for (int i = 0; i < n; i++) {
      data[i] = (byte) ((bits[i >> 3] >>> (7 - (i & 7))) & 1);
    }
    return new Mask(width, height, data);
  }
}
