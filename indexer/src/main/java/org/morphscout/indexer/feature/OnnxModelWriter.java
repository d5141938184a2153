package org.morphscout.indexer.feature;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.util.ArrayList;
import java.util.List;

/**
 * Builds an ONNX {@code ModelProto} in memory and serialises it with {@link ProtoWriter}, so the project can generate
 * its own models without a protobuf library. Covers just what our graphs need: float32 inputs/outputs with fixed or
 * named (dynamic) dimensions, float32 and int64 initializers stored as {@code raw_data}, and nodes of the default
 * domain with int, ints, float and string attributes.
 *
 * <p>Field numbers follow {@code onnx/onnx.proto} in the ONNX repository (ModelProto: ir_version 1, producer_name 2,
 * producer_version 3, doc_string 6, graph 7, opset_import 8; GraphProto: node 1, name 2, initializer 5, input 11,
 * output 12; NodeProto: input 1, output 2, name 3, op_type 4, attribute 5; AttributeProto: name 1, f 2, i 3, s 4, ints
 * 8, type 20; TensorProto: dims 1, data_type 2, name 8, raw_data 9; ValueInfoProto: name 1, type 2; TypeProto:
 * tensor_type 1; TypeProto.Tensor: elem_type 1, shape 2; TensorShapeProto: dim 1; Dimension: dim_value 1, dim_param
 * 2; OperatorSetIdProto: domain 1, version 2). Not thread-safe.
 */
final class OnnxModelWriter {
  /** IR version 8 (ONNX 1.10+), read by ONNX Runtime 1.21. */
  static final long IR_VERSION = 8;

  /** Default-domain operator set; every operator used here keeps its opset-13..17 signature. */
  static final long OPSET = 17;

  static final int FLOAT = 1;
  static final int INT64 = 7;

  private static final int ATTR_FLOAT = 1;
  private static final int ATTR_INT = 2;
  private static final int ATTR_STRING = 3;
  private static final int ATTR_INTS = 7;

  private final String graphName;
  private final List<ProtoWriter> nodes = new ArrayList<>();
  private final List<ProtoWriter> initializers = new ArrayList<>();
  private final List<ProtoWriter> inputs = new ArrayList<>();
  private final List<ProtoWriter> outputs = new ArrayList<>();
  private int nodeCount;

  OnnxModelWriter(String graphName) {
    this.graphName = graphName;
  }

  /** A float32 graph input; each dimension is a {@code Number} (fixed) or a {@code String} (named, dynamic). */
  OnnxModelWriter input(String name, Object... dims) {
    inputs.add(valueInfo(name, dims));
    return this;
  }

  /** A float32 graph output, dimensions as in {@link #input}. */
  OnnxModelWriter output(String name, Object... dims) {
    outputs.add(valueInfo(name, dims));
    return this;
  }

  OnnxModelWriter floatTensor(String name, long[] dims, float[] data) {
    ByteBuffer buf = ByteBuffer.allocate(4 * data.length).order(ByteOrder.LITTLE_ENDIAN);
    buf.asFloatBuffer().put(data);
    initializers.add(tensor(name, dims, FLOAT, buf.array()));
    return this;
  }

  OnnxModelWriter int64Tensor(String name, long... data) {
    ByteBuffer buf = ByteBuffer.allocate(8 * data.length).order(ByteOrder.LITTLE_ENDIAN);
    buf.asLongBuffer().put(data);
    initializers.add(tensor(name, new long[] {data.length}, INT64, buf.array()));
    return this;
  }

  /** A scalar-like float constant of shape [1], broadcast by Mul/Add/Div. */
  OnnxModelWriter floatConstant(String name, float value) {
    return floatTensor(name, new long[] {1}, new float[] {value});
  }

  /** Starts a node of the default domain; attributes are added on the returned builder. */
  Node node(String opType, List<String> in, String out) {
    Node node = new Node(opType, in, out, opType + "_" + nodeCount++);
    nodes.add(node.proto);
    return node;
  }

  byte[] toBytes(String producer, String docString) {
    ProtoWriter graph = new ProtoWriter();
    nodes.forEach(n -> graph.message(1, n));
    graph.string(2, graphName);
    initializers.forEach(t -> graph.message(5, t));
    inputs.forEach(v -> graph.message(11, v));
    outputs.forEach(v -> graph.message(12, v));
    ProtoWriter opset = new ProtoWriter().string(1, "").varint(2, OPSET);
    return new ProtoWriter()
        .varint(1, IR_VERSION)
        .string(2, producer)
        .string(3, "1")
        .string(6, docString)
        .message(7, graph)
        .message(8, opset)
        .toByteArray();
  }

  private static ProtoWriter tensor(String name, long[] dims, int dataType, byte[] raw) {
    ProtoWriter t = new ProtoWriter();
    for (long d : dims) {
      t.varint(1, d);
    }
    return t.varint(2, dataType).string(8, name).bytes(9, raw);
  }

  private static ProtoWriter valueInfo(String name, Object... dims) {
    ProtoWriter shape = new ProtoWriter();
    for (Object d : dims) {
      ProtoWriter dim = new ProtoWriter();
      if (d instanceof Number n) {
        dim.varint(1, n.longValue());
      } else {
        dim.string(2, d.toString());
      }
      shape.message(1, dim);
    }
    ProtoWriter tensorType = new ProtoWriter().varint(1, FLOAT).message(2, shape);
    ProtoWriter type = new ProtoWriter().message(1, tensorType);
    return new ProtoWriter().string(1, name).message(2, type);
  }

  /** One node under construction. */
  static final class Node {
    private final ProtoWriter proto = new ProtoWriter();

    private Node(String opType, List<String> in, String out, String name) {
      in.forEach(i -> proto.string(1, i));
      proto.string(2, out).string(3, name).string(4, opType);
    }

    Node ints(String name, long... values) {
      ProtoWriter a = new ProtoWriter().string(1, name).varint(20, ATTR_INTS);
      for (long v : values) {
        a.varint(8, v);
      }
      proto.message(5, a);
      return this;
    }

    Node integer(String name, long value) {
      proto.message(5, new ProtoWriter().string(1, name).varint(20, ATTR_INT).varint(3, value));
      return this;
    }

    Node real(String name, float value) {
      proto.message(5, new ProtoWriter().string(1, name).varint(20, ATTR_FLOAT).float32(2, value));
      return this;
    }

    Node text(String name, String value) {
      proto.message(5, new ProtoWriter().string(1, name).varint(20, ATTR_STRING).string(4, value));
      return this;
    }
  }
}
