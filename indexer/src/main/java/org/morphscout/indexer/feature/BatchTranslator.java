package org.morphscout.indexer.feature;

import ai.djl.ndarray.NDArray;
import ai.djl.ndarray.NDList;
import ai.djl.ndarray.types.Shape;
import ai.djl.translate.NoBatchifyTranslator;
import ai.djl.translate.TranslatorContext;
import java.nio.FloatBuffer;

/**
 * DJL translator for one already stacked batch: the input becomes one float32 tensor, the output is read by a
 * {@link ModelOutput} inside the predictor's context (so no NDArray outlives it). No batchifier: the batch axis is
 * already in the data. Stateless apart from its immutable reader, so one instance serves every predictor.
 */
final class BatchTranslator implements NoBatchifyTranslator<BatchTranslator.Batch, float[][]> {
  private final ModelOutput reader;

  BatchTranslator(ModelOutput reader) {
    this.reader = reader;
  }

  /** One batch: the stacked input tensor of {@code count} samples, row-major in {@code shape}. */
  record Batch(int count, long[] shape, float[] data) {}

  @Override
  public NDList processInput(TranslatorContext ctx, Batch batch) {
    NDArray array = ctx.getNDManager().create(FloatBuffer.wrap(batch.data()), new Shape(batch.shape()));
    ctx.setAttachment("count", batch.count());
    return new NDList(array);
  }

  @Override
  public float[][] processOutput(TranslatorContext ctx, NDList list) {
    return reader.read(list, (Integer) ctx.getAttachment("count"));
  }
}
