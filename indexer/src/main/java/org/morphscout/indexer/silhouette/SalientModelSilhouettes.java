package org.morphscout.indexer.silhouette;

import ai.djl.Device;
import ai.djl.MalformedModelException;
import ai.djl.Model;
import ai.djl.inference.Predictor;
import ai.djl.ndarray.NDArray;
import ai.djl.ndarray.NDList;
import ai.djl.ndarray.NDManager;
import ai.djl.ndarray.types.Shape;
import ai.djl.translate.NoopTranslator;
import ai.djl.translate.TranslateException;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.morphscout.indexer.MorphscoutException;

/**
 * Optional learned extractor: the small U-2-Net salient-object network ({@code u2netp.onnx}; X. Qin et al.,
 * "U^2-Net: Going deeper with nested U-structure for salient object detection", Pattern Recognition 106, 2020) run on
 * the CPU through DJL with the ONNX Runtime engine. For cluttered photographs where the border model has no clean
 * background to learn from.
 *
 * <p>Input 1x3xNxN float (N = {@link #DEFAULT_INPUT_SIZE} by default), RGB, ImageNet mean (0.485, 0.456, 0.406) and std (0.229, 0.224, 0.225) after scaling
 * 8-bit values to [0, 1] (the reference code divides by the image's maximum instead; the difference is negligible for
 * photographs that reach white). The first output, the fused saliency map [1, 1, N, N], is min-max normalised,
 * resized to the working resolution (long side 256), thresholded at 0.5 and cleaned up like the border model's mask.
 * Confidence is the mean decisiveness |2s - 1| of the normalised map over the image: near 1 when the network is sure
 * of every pixel.
 *
 * <p>The packaged network declares N = 320 ({@link #DECLARED_SIZE}, its training size), but its layers work at any
 * size that survives five halvings (a multiple of 32); a smaller N is re-declared on loading ({@link OnnxSquareInput})
 * and costs about (N / 320)^2 of the time. Measured on the 88 demo pictures that reach the model and the ten real
 * photographs of the test suite (docs/BENCHMARKS.md): at 288 the masks overlap those at 320 with IoU 0.996 on average
 * (0.95 at worst) and every photograph's box IoU stays within 0.04 of its figure at 320, for 0.8x the CPU time; at 256
 * (0.65x) one photograph falls from 0.97 to 0.70, and at 224 another to 0.49, so 288 is the default.
 *
 * <p>It loads only the given file and never downloads anything ({@link SalientModelStore} installs the file). Thread-
 * safe: the loaded model is shared, each call makes its own predictor. Close it to free the native session.
 */
public final class SalientModelSilhouettes implements SilhouetteExtractor, AutoCloseable {
  /** The picture size the packaged model declares. */
  static final int DECLARED_SIZE = 320;
  /** The picture size the model is run at by default: see the class comment for why not 320. */
  public static final int DEFAULT_INPUT_SIZE = 288;
  private static final float[] MEAN = {0.485f, 0.456f, 0.406f};
  private static final float[] STD = {0.229f, 0.224f, 0.225f};
  private static final int WORKING_LONG_SIDE = 256;
  private static final MaskCleanup.Settings CLEANUP = new MaskCleanup.Settings(1, 2, 0.1);

  private final Model model;
  private final int size;

  /** Loads the model file, to run at {@link #DEFAULT_INPUT_SIZE}. */
  public SalientModelSilhouettes(Path modelFile) throws IOException {
    this(modelFile, DEFAULT_INPUT_SIZE);
  }

  /**
   * Loads the model file.
   *
   * @param inputSize the side of the square picture the network sees, 128..320, a multiple of 32 (five halvings)
   * @throws MorphscoutException when the file is missing or is not a loadable ONNX model
   * @throws IOException when it cannot be read
   */
  public SalientModelSilhouettes(Path modelFile, int inputSize) throws IOException {
    if (inputSize < 128 || inputSize > DECLARED_SIZE || inputSize % 32 != 0) {
      throw new IllegalArgumentException("the learned model's input size must be a multiple of 32 in 128.."
          + DECLARED_SIZE + ", got " + inputSize);
    }
    if (!Files.isRegularFile(modelFile)) {
      throw new MorphscoutException("The salient-object model " + modelFile + " does not exist; install it first.");
    }
    byte[] bytes = Files.readAllBytes(modelFile);
    if (inputSize != DECLARED_SIZE) {
      try {
        bytes = OnnxSquareInput.resize(bytes, DECLARED_SIZE, inputSize).model();
      } catch (IllegalArgumentException e) {
        throw new MorphscoutException("Cannot load the salient-object model " + modelFile + ": " + e.getMessage(), e);
      }
    }
    this.size = inputSize;
    this.model = Model.newInstance("u2netp", Device.cpu(), "OnnxRuntime");
    try {
      // One thread per inference: indexing already runs one analysis per core, and ONNX Runtime's own pool would
      // oversubscribe the cores (its workers spin while they wait, burning CPU for nothing).
      model.load(new ByteArrayInputStream(bytes), Map.of("intraOpNumThreads", "1", "interOpNumThreads", "1"));
    } catch (MalformedModelException | RuntimeException e) {
      model.close();
      throw new MorphscoutException("Cannot load the salient-object model " + modelFile + ": " + e.getMessage(), e);
    }
  }

  /** The side of the square picture the network sees. */
  public int inputSize() {
    return size;
  }

  @Override
  public String name() {
    return "learned";
  }

  @Override
  public Silhouette extract(BufferedImage image) {
    int outW = image.getWidth();
    int outH = image.getHeight();
    float[] saliency = saliency(image);
    normaliseMinMax(saliency);
    int n = size;

    double scale = Math.min(1.0, WORKING_LONG_SIDE / (double) Math.max(outW, outH));
    int w = Math.max(1, (int) Math.round(outW * scale));
    int h = Math.max(1, (int) Math.round(outH * scale));
    byte[] raw = new byte[w * h];
    double decisive = 0;
    for (int y = 0; y < h; y++) {
      double sy = Math.max(0, Math.min(n - 1, (y + 0.5) * n / h - 0.5));
      for (int x = 0; x < w; x++) {
        double sx = Math.max(0, Math.min(n - 1, (x + 0.5) * n / w - 0.5));
        double s = bilinear(saliency, n, sx, sy);
        raw[y * w + x] = (byte) (s >= 0.5 ? 1 : 0);
        decisive += Math.abs(2 * s - 1);
      }
    }
    return MaskCleanup.finish(raw, w, h, CLEANUP, outW, outH, decisive / (w * h), name());
  }

  /** The network's first output for the image, {@link #inputSize()} squared, row-major, raw values. */
  float[] saliency(BufferedImage image) {
    float[] input = input(image, size);
    try (Predictor<NDList, NDList> predictor = model.newPredictor(new NoopTranslator(null));
        NDManager manager = model.getNDManager().newSubManager()) {
      NDArray x = manager.create(input, new Shape(1, 3, size, size));
      NDList out = predictor.predict(new NDList(x));
      float[] s = out.get(0).toFloatArray();
      if (s.length != size * size) {
        throw new MorphscoutException("The salient-object model gave " + s.length + " values, expected "
            + size * size + "; is it the u2netp model?");
      }
      return s;
    } catch (TranslateException e) {
      throw new MorphscoutException("The salient-object model failed on an image: " + e.getMessage(), e);
    }
  }

  /** Resizes to size x size (bilinear) and packs normalised RGB planes (CHW). */
  static float[] input(BufferedImage image, int size) {
    BufferedImage small = new BufferedImage(size, size, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = small.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
    g.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
    g.drawImage(image, 0, 0, size, size, null);
    g.dispose();
    int[] px = Pixels.argb(small);
    int plane = size * size;
    float[] out = new float[3 * plane];
    for (int i = 0; i < plane; i++) {
      int p = px[i];
      out[i] = (((p >> 16) & 0xff) / 255f - MEAN[0]) / STD[0];
      out[plane + i] = (((p >> 8) & 0xff) / 255f - MEAN[1]) / STD[1];
      out[2 * plane + i] = ((p & 0xff) / 255f - MEAN[2]) / STD[2];
    }
    return out;
  }

  static void normaliseMinMax(float[] v) {
    float min = Float.POSITIVE_INFINITY;
    float max = Float.NEGATIVE_INFINITY;
    for (float x : v) {
      min = Math.min(min, x);
      max = Math.max(max, x);
    }
    float range = max - min;
    for (int i = 0; i < v.length; i++) {
      v[i] = range > 0 ? (v[i] - min) / range : 0f;
    }
  }

  private static double bilinear(float[] s, int n, double x, double y) {
    int x0 = Math.min(n - 2, (int) x);
    int y0 = Math.min(n - 2, (int) y);
    double fx = x - x0;
    double fy = y - y0;
    int i = y0 * n + x0;
    double top = s[i] + fx * (s[i + 1] - s[i]);
    double bot = s[i + n] + fx * (s[i + n + 1] - s[i + n]);
    return top + fy * (bot - top);
  }

  @Override
  public void close() {
    model.close();
  }
}
