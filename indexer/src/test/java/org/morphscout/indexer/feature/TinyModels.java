package org.morphscout.indexer.feature;

import java.util.List;
import java.util.SplittableRandom;

/**
 * A tiny ONNX model written with our own {@link OnnxModelWriter}, standing in for a user's CNN: input "pixels"
 * [N, 3, 16, 16] -> Conv 3x3 (8 filters, seeded weights) -> Relu -> "features" [N, 8, 14, 14], and "pooled" =
 * GlobalAveragePool(features) [N, 8, 1, 1]. "pooled" is the first output.
 */
final class TinyModels {
  private TinyModels() {}

  static byte[] convNet(long seed) {
    SplittableRandom rnd = new SplittableRandom(seed);
    float[] w = new float[8 * 3 * 3 * 3];
    for (int i = 0; i < w.length; i++) {
      w[i] = (float) rnd.nextDouble(-1, 1);
    }
    float[] b = new float[8];
    for (int i = 0; i < b.length; i++) {
      b[i] = (float) rnd.nextDouble(0, 0.5);
    }
    OnnxModelWriter m = new OnnxModelWriter("tiny");
    m.input("pixels", "N", 3, 16, 16);
    m.output("pooled", "N", 8, 1, 1);
    m.output("features", "N", 8, 14, 14);
    m.floatTensor("w", new long[] {8, 3, 3, 3}, w);
    m.floatTensor("b", new long[] {8}, b);
    m.node("Conv", List.of("pixels", "w", "b"), "conv").ints("kernel_shape", 3, 3);
    m.node("Relu", List.of("conv"), "features");
    m.node("GlobalAveragePool", List.of("features"), "pooled");
    return m.toBytes("morphscout-test", "tiny test model");
  }
}
