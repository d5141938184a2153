package org.morphscout.indexer.feature;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;

/**
 * A minimal protocol-buffers wire-format encoder (protobuf.dev, "Encoding"): varints (wire type 0), 32-bit fixed
 * (wire type 5) and length-delimited fields (wire type 2), which is all the ONNX messages written by
 * {@link OnnxModelWriter} need. Fields are written in the order called; protobuf readers accept any order. Not
 * thread-safe: one writer builds one message.
 */
final class ProtoWriter {
  private static final int VARINT = 0;
  private static final int LENGTH_DELIMITED = 2;
  private static final int FIXED32 = 5;

  private final ByteArrayOutputStream out = new ByteArrayOutputStream();

  /** An int32/int64/enum field (negative values take ten bytes, as the encoding requires). */
  ProtoWriter varint(int field, long value) {
    tag(field, VARINT);
    rawVarint(value);
    return this;
  }

  ProtoWriter string(int field, String value) {
    return bytes(field, value.getBytes(StandardCharsets.UTF_8));
  }

  ProtoWriter bytes(int field, byte[] value) {
    tag(field, LENGTH_DELIMITED);
    rawVarint(value.length);
    out.writeBytes(value);
    return this;
  }

  /** An embedded message. */
  ProtoWriter message(int field, ProtoWriter message) {
    return bytes(field, message.toByteArray());
  }

  /** A single float field (fixed32, little-endian IEEE 754). */
  ProtoWriter float32(int field, float value) {
    tag(field, FIXED32);
    int bits = Float.floatToIntBits(value);
    for (int i = 0; i < 4; i++) {
      out.write((bits >>> (8 * i)) & 0xFF);
    }
    return this;
  }

  /** A packed repeated int64 field. */
  ProtoWriter packedVarints(int field, long[] values) {
    ProtoWriter inner = new ProtoWriter();
    for (long v : values) {
      inner.rawVarint(v);
    }
    return bytes(field, inner.toByteArray());
  }

  byte[] toByteArray() {
    return out.toByteArray();
  }

  private void tag(int field, int wireType) {
    rawVarint(((long) field << 3) | wireType);
  }

  private void rawVarint(long value) {
    long v = value;
    while ((v & ~0x7FL) != 0) {
      out.write((int) ((v & 0x7F) | 0x80));
      v >>>= 7;
    }
    out.write((int) v);
  }
}
