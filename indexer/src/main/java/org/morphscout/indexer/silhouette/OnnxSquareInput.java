package org.morphscout.indexer.silhouette;

/**
 * Re-declares the square picture size of an ONNX model whose graph fixes it in its input and output declarations
 * while its layers work at any size (convolutions, pooling and resizes to the size of another tensor, as in the
 * salient-object network), so ONNX Runtime accepts a smaller picture. Only the declarations change: the last two
 * dimensions of every graph input and output that equal {@code from} become {@code to}; weights and layers stay as
 * they are, byte for byte.
 *
 * <p>Reads the protocol-buffers wire format (protobuf.dev, "Encoding") along the path ModelProto.graph (field 7) to
 * GraphProto.input (11) and .output (12), ValueInfoProto.type (2), TypeProto.tensor_type (1), .shape (2),
 * TensorShapeProto.dim (1), Dimension.dim_value (1), as the ONNX schema (onnx.proto3) numbers them. Both sizes must
 * take the same number of bytes as varints (128 to 16383), so the edit is made in place and no enclosing length
 * changes. Stateless.
 */
final class OnnxSquareInput {
  private static final int VARINT = 0;
  private static final int FIXED64 = 1;
  private static final int LENGTH_DELIMITED = 2;
  private static final int FIXED32 = 5;

  private OnnxSquareInput() {}

  /**
   * A copy of {@code model} with its square picture size re-declared.
   *
   * @return the copy and how many dimensions changed (0 when the model declares no {@code from} there)
   * @throws IllegalArgumentException when a size is outside 128..16383 or the bytes are not a protocol buffer
   */
  static Patched resize(byte[] model, int from, int to) {
    if (from < 128 || from > 16383 || to < 128 || to > 16383) {
      throw new IllegalArgumentException("picture sizes must be in 128..16383, got " + from + " and " + to);
    }
    byte[] out = model.clone();
    int changed = 0;
    for (int[] graph : fields(out, 0, out.length, 7)) {
      for (int io : new int[] {11, 12}) {
        for (int[] value : fields(out, graph[0], graph[1], io)) {
          for (int[] type : fields(out, value[0], value[1], 2)) {
            for (int[] tensor : fields(out, type[0], type[1], 1)) {
              for (int[] shape : fields(out, tensor[0], tensor[1], 2)) {
                changed += resizeLastTwo(out, shape, from, to);
              }
            }
          }
        }
      }
    }
    return new Patched(out, changed);
  }

  /** @param model the re-declared model; @param changed dimensions changed */
  record Patched(byte[] model, int changed) {}

  private static int resizeLastTwo(byte[] b, int[] shape, int from, int to) {
    java.util.List<int[]> dims = fields(b, shape[0], shape[1], 1);
    int changed = 0;
    for (int d = Math.max(0, dims.size() - 2); d < dims.size(); d++) {
      int[] dim = dims.get(d);
      int p = dim[0];
      while (p < dim[1]) {
        long key = varint(b, p);
        p = next(b, p);
        int field = (int) (key >>> 3);
        int wire = (int) (key & 7);
        if (field == 1 && wire == VARINT && varint(b, p) == from && next(b, p) - p == 2) {
          b[p] = (byte) (0x80 | (to & 0x7f));
          b[p + 1] = (byte) (to >>> 7);
          changed++;
        }
        p = skip(b, p, wire, dim[1]);
      }
    }
    return changed;
  }

  /** The [start, end) byte ranges of the length-delimited fields numbered {@code field} in b[start, end). */
  private static java.util.List<int[]> fields(byte[] b, int start, int end, int field) {
    java.util.List<int[]> out = new java.util.ArrayList<>();
    int p = start;
    while (p < end) {
      long key = varint(b, p);
      p = next(b, p);
      int wire = (int) (key & 7);
      if ((int) (key >>> 3) == field && wire == LENGTH_DELIMITED) {
        long len = varint(b, p);
        int from = next(b, p);
        if (len < 0 || from + len > end) {
          throw new IllegalArgumentException("not an ONNX model: a field runs past its message");
        }
        out.add(new int[] {from, (int) (from + len)});
      }
      p = skip(b, p, wire, end);
    }
    return out;
  }

  /** The position after the value of a field of wire type {@code wire} starting at p. */
  private static int skip(byte[] b, int p, int wire, int end) {
    int q = switch (wire) {
      case VARINT -> next(b, p);
      case FIXED64 -> p + 8;
      case LENGTH_DELIMITED -> {
        long len = varint(b, p);
        yield (int) Math.min(Integer.MAX_VALUE, next(b, p) + len);
      }
      case FIXED32 -> p + 4;
      default -> throw new IllegalArgumentException("not an ONNX model: wire type " + wire);
    };
    if (q > end || q < p) {
      throw new IllegalArgumentException("not an ONNX model: a field runs past its message");
    }
    return q;
  }

  private static long varint(byte[] b, int p) {
    long v = 0;
    for (int shift = 0; shift < 64; shift += 7) {
      if (p >= b.length) {
        throw new IllegalArgumentException("not an ONNX model: a number runs past the end");
      }
      int x = b[p++];
      v |= (long) (x & 0x7f) << shift;
      if ((x & 0x80) == 0) {
        return v;
      }
    }
    throw new IllegalArgumentException("not an ONNX model: a number is too long");
  }

  private static int next(byte[] b, int p) {
    while (p < b.length && (b[p] & 0x80) != 0) {
      p++;
    }
    return p + 1;
  }
}
