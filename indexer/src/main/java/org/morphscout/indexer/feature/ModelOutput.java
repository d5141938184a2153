package org.morphscout.indexer.feature;

import ai.djl.ndarray.NDArray;
import ai.djl.ndarray.NDList;
import ai.djl.ndarray.types.Shape;
import java.util.Arrays;
import java.util.List;
import org.morphscout.indexer.MorphscoutException;

/**
 * Picks a model's output tensor (by name, or the first) and turns it into one raw vector per sample: a 4-D feature
 * map is averaged over its spatial axes when {@code pool} is on (NCHW when {@code channelsFirst}, else NHWC), any
 * other output is flattened per sample. Immutable and thread-safe.
 */
record ModelOutput(String outputName, boolean pool, boolean channelsFirst) {
  float[][] read(NDList outputs, int count) {
    NDArray array = outputs.get(0);
    if (!outputName.isEmpty()) {
      array = null;
      for (NDArray a : outputs) {
        if (outputName.equals(a.getName())) {
          array = a;
        }
      }
      if (array == null) {
        List<String> names = outputs.stream().map(NDArray::getName).toList();
        throw new MorphscoutException("The model has no output named \"" + outputName + "\"; it has " + names + ".");
      }
    }
    Shape shape = array.getShape();
    if (shape.dimension() < 1 || shape.get(0) != count) {
      throw new MorphscoutException(
          "The model output has shape " + shape + "; expected the batch of " + count + " first.");
    }
    float[] data = array.toFloatArray();
    int per = data.length / count;
    float[][] out = new float[count][];
    boolean pool4d = pool && shape.dimension() == 4;
    for (int b = 0; b < count; b++) {
      if (!pool4d) {
        out[b] = Arrays.copyOfRange(data, b * per, (b + 1) * per);
        continue;
      }
      int channels = (int) (channelsFirst ? shape.get(1) : shape.get(3));
      int spatial = per / channels;
      float[] v = new float[channels];
      for (int c = 0; c < channels; c++) {
        double s = 0;
        for (int p = 0; p < spatial; p++) {
          s += data[b * per + (channelsFirst ? c * spatial + p : p * channels + c)];
        }
        v[c] = (float) (s / spatial);
      }
      out[b] = v;
    }
    return out;
  }
}
