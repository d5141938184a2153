package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Re-declaring a model's square picture size, on small hand-built ONNX messages (field numbers of onnx.proto3). */
class OnnxSquareInputTest {

  @Test
  void changesOnlyTheLastTwoDimensionsOfInputsAndOutputs() {
    byte[] model = model();
    OnnxSquareInput.Patched p = OnnxSquareInput.resize(model, 320, 256);
    // input 1x3x320x320 and output 1x1x320x320: four dimensions; the node attribute of 320 and the leading 320 of
    // the third declaration (a batch of 320 pictures of 7x7) stay.
    assertThat(p.changed()).isEqualTo(4);
    assertThat(p.model()).hasSameSizeAs(model);
    assertThat(OnnxSquareInput.resize(p.model(), 256, 320).model()).isEqualTo(model);
    assertThat(OnnxSquareInput.resize(p.model(), 320, 256).changed()).isZero();
    int differing = 0;
    for (int i = 0; i < model.length; i++) {
      differing += model[i] != p.model()[i] ? 1 : 0;
    }
    assertThat(differing).as("bytes changed: two per dimension at most").isBetween(4, 8);
  }

  @Test
  void refusesSizesOfAnotherLengthAndBrokenMessages() {
    assertThatThrownBy(() -> OnnxSquareInput.resize(model(), 320, 96)).isInstanceOf(IllegalArgumentException.class);
    byte[] cut = java.util.Arrays.copyOf(model(), 20);
    assertThatThrownBy(() -> OnnxSquareInput.resize(cut, 320, 256)).isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("not an ONNX model");
  }

  /** ModelProto { ir_version 8, graph { node { attribute 320 }, input, output, output } }. */
  private static byte[] model() {
    byte[] node = field(5, varint(3, 320)); // NodeProto.attribute { i: 320 }
    byte[] graph = concat(field(1, node), field(11, valueInfo("x", 1, 3, 320, 320)),
        field(12, valueInfo("y", 1, 1, 320, 320)), field(12, valueInfo("z", 320, 7, 7)));
    return concat(varint(1, 8), field(7, graph));
  }

  private static byte[] valueInfo(String name, long... dims) {
    ByteArrayOutputStream shape = new ByteArrayOutputStream();
    for (long d : dims) {
      shape.writeBytes(field(1, varint(1, d)));
    }
    byte[] tensor = concat(varint(1, 1), field(2, shape.toByteArray()));
    return concat(field(1, name.getBytes(StandardCharsets.UTF_8)), field(2, field(1, tensor)));
  }

  private static byte[] field(int number, byte[] body) {
    return concat(raw((number << 3) | 2), raw(body.length), body);
  }

  private static byte[] varint(int number, long value) {
    return concat(raw(number << 3), raw(value));
  }

  private static byte[] raw(long v) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    while ((v & ~0x7fL) != 0) {
      out.write((int) ((v & 0x7f) | 0x80));
      v >>>= 7;
    }
    out.write((int) v);
    return out.toByteArray();
  }

  private static byte[] concat(byte[]... parts) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    for (byte[] p : parts) {
      out.writeBytes(p);
    }
    return out.toByteArray();
  }
}
