package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Wire-format examples from the protocol buffers encoding guide (protobuf.dev, "Encoding"; from memory). */
class ProtoWriterTest {
  private static byte[] bytes(int... v) {
    byte[] b = new byte[v.length];
    for (int i = 0; i < v.length; i++) {
      b[i] = (byte) v[i];
    }
    return b;
  }

  @Test
  void varintFieldOf150() {
    assertThat(new ProtoWriter().varint(1, 150).toByteArray()).isEqualTo(bytes(0x08, 0x96, 0x01));
  }

  @Test
  void stringFieldTesting() {
    assertThat(new ProtoWriter().string(2, "testing").toByteArray())
        .isEqualTo(bytes(0x12, 0x07, 0x74, 0x65, 0x73, 0x74, 0x69, 0x6e, 0x67));
  }

  @Test
  void negativeIntTakesTenBytes() {
    assertThat(new ProtoWriter().varint(1, -1).toByteArray())
        .isEqualTo(bytes(0x08, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0xff, 0x01));
  }

  @Test
  void embeddedMessageAndFixed32() {
    // Field 3 holding {field 1 = 150} is 1a 03 08 96 01; a float field (wire type 5) is little-endian IEEE 754.
    assertThat(new ProtoWriter().message(3, new ProtoWriter().varint(1, 150)).toByteArray())
        .isEqualTo(bytes(0x1a, 0x03, 0x08, 0x96, 0x01));
    assertThat(new ProtoWriter().float32(2, 1.0f).toByteArray()).isEqualTo(bytes(0x15, 0x00, 0x00, 0x80, 0x3f));
  }
}
