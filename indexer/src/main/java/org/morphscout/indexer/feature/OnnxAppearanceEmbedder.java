package org.morphscout.indexer.feature;

import ai.djl.Device;
import ai.djl.MalformedModelException;
import ai.djl.Model;
import ai.djl.engine.EngineException;
import ai.djl.inference.Predictor;
import ai.djl.translate.TranslateException;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentLinkedDeque;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.feature.BatchTranslator.Batch;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Runs an ONNX image model on the CPU through DJL's ONNX Runtime engine and returns L2-normalised appearance vectors:
 * either the built-in GIST + colour-layout graph ({@link GistModelBuilder}, id "gist-lab-v1") or a user model
 * described by a {@link ModelDescription} (id "custom:" + the first 16 hex digits of the file's SHA-256 + ":" + input
 * size, so a changed file gets a new id).
 *
 * <p>{@link #embed} prepares every image in Java, stacks them into one tensor per batch of
 * {@link EmbedderSettings#batchSize()} and runs each batch in one call. Nothing is downloaded: the model is a local
 * file and the ONNX Runtime native library comes from its jar (run with {@code -Dai.djl.offline=true}).
 *
 * <p>Thread-safe: a DJL Predictor is not, so each call borrows a predictor from a pool (creating one when all are
 * busy) and returns it afterwards; concurrent callers run in parallel. All predictors and the model are released by
 * {@link #close()}.
 */
public final class OnnxAppearanceEmbedder implements AppearanceEmbedder {
  private static final Logger LOG = LoggerFactory.getLogger(OnnxAppearanceEmbedder.class);

  private final String modelId;
  private final Path modelFile;
  private final ModelInput input;
  private final EmbedderSettings settings;
  private final Model model;
  private final BatchTranslator translator;
  private final ConcurrentLinkedDeque<Predictor<Batch, float[][]>> idle = new ConcurrentLinkedDeque<>();
  private final List<Predictor<Batch, float[][]>> all = new ArrayList<>();
  private final int dimension;
  private volatile boolean closed;

  private OnnxAppearanceEmbedder(
      String modelId, Path modelFile, ModelInput input, ModelOutput output, EmbedderSettings settings) {
    this.modelId = modelId;
    this.modelFile = modelFile;
    this.input = input;
    this.settings = settings;
    if (!Files.isRegularFile(modelFile)) {
      throw new MorphscoutException("The appearance model " + modelFile + " does not exist or is not a file.");
    }
    this.translator = new BatchTranslator(output);
    // Model.load on a local file: no model zoo, no repository, nothing that could try to download.
    this.model = Model.newInstance(modelId, Device.cpu(), "OnnxRuntime");
    try {
      model.load(
          modelFile.toAbsolutePath().getParent(),
          modelFile.getFileName().toString(),
          Map.of("intraOpNumThreads", Integer.toString(settings.intraOpThreads()), "interOpNumThreads", "1"));
    } catch (MalformedModelException | IOException | EngineException e) {
      model.close();
      throw new MorphscoutException(
          "The appearance model " + modelFile + " could not be loaded (is it an ONNX file?): " + e.getMessage(), e);
    }
    try {
      // Probe with one mid-grey image: finds the vector length and fails early on an unusable model.
      BufferedImage grey = new BufferedImage(8, 8, BufferedImage.TYPE_INT_ARGB);
      this.dimension = embed(List.of(grey)).get(0).length;
    } catch (RuntimeException e) {
      close();
      throw e;
    }
    LOG.info("Loaded appearance model {} from {} ({} dimensions)", modelId, modelFile, dimension);
  }

  /** The built-in GIST model with default settings; its file is written to (or reused from) {@code cacheDir}. */
  public static OnnxAppearanceEmbedder builtIn(Path cacheDir) throws IOException {
    return builtIn(cacheDir, EmbedderSettings.DEFAULT);
  }

  /**
   * The built-in GIST model. The generated file {@code gist-lab-v1.onnx} is rewritten when missing or different.
   *
   * @throws IOException when the cache folder or file cannot be written
   */
  public static OnnxAppearanceEmbedder builtIn(Path cacheDir, EmbedderSettings settings) throws IOException {
    Path file = writeBuiltInModel(cacheDir);
    return new OnnxAppearanceEmbedder(
        GistModelBuilder.MODEL_ID, file, ModelInput.gist(), new ModelOutput(GistModelBuilder.OUTPUT, false, true),
        settings);
  }

  /** Writes the built-in model file into {@code cacheDir} unless an identical one is there; returns its path. */
  public static Path writeBuiltInModel(Path cacheDir) throws IOException {
    byte[] bytes = GistModelBuilder.build();
    Files.createDirectories(cacheDir);
    Path file = cacheDir.resolve(GistModelBuilder.MODEL_ID + ".onnx");
    if (Files.isRegularFile(file) && Arrays.equals(Files.readAllBytes(file), bytes)) {
      return file;
    }
    Path tmp = Files.createTempFile(cacheDir, GistModelBuilder.MODEL_ID, ".tmp");
    try {
      Files.write(tmp, bytes);
      Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    } finally {
      Files.deleteIfExists(tmp);
    }
    return file;
  }

  /** A user model with default settings. */
  public static OnnxAppearanceEmbedder custom(ModelDescription description) throws IOException {
    return custom(description, EmbedderSettings.DEFAULT);
  }

  /**
   * A user model.
   *
   * @throws IOException when the model file cannot be read for hashing
   * @throws MorphscoutException when it is missing, not an ONNX model, or its output cannot be read
   */
  public static OnnxAppearanceEmbedder custom(ModelDescription description, EmbedderSettings settings)
      throws IOException {
    if (!Files.isRegularFile(description.modelFile())) {
      throw new MorphscoutException(
          "The appearance model " + description.modelFile() + " does not exist or is not a file.");
    }
    boolean nchw = description.layout() == ModelDescription.Layout.NCHW;
    return new OnnxAppearanceEmbedder(
        CustomModelId.of(description),
        description.modelFile(),
        ModelInput.of(description),
        new ModelOutput(description.outputName(), description.globalAveragePool(), nchw),
        settings);
  }

  @Override
  public String modelId() {
    return modelId;
  }

  @Override
  public int dimension() {
    return dimension;
  }

  @Override
  public List<float[]> embed(List<BufferedImage> images) {
    if (closed) {
      throw new IllegalStateException("embedder " + modelId + " is closed");
    }
    List<float[]> out = new ArrayList<>(images.size());
    long[] sample = input.sampleShape();
    int sampleSize = (int) Arrays.stream(sample).reduce(1, (a, b) -> a * b);
    for (int start = 0; start < images.size(); start += settings.batchSize()) {
      List<BufferedImage> chunk = images.subList(start, Math.min(images.size(), start + settings.batchSize()));
      float[] data = new float[chunk.size() * sampleSize];
      for (int i = 0; i < chunk.size(); i++) {
        System.arraycopy(input.prepare(chunk.get(i)), 0, data, i * sampleSize, sampleSize);
      }
      long[] shape = new long[sample.length + 1];
      shape[0] = chunk.size();
      System.arraycopy(sample, 0, shape, 1, sample.length);
      for (float[] v : run(new Batch(chunk.size(), shape, data))) {
        out.add(normalise(v));
      }
    }
    return out;
  }

  private float[][] run(Batch batch) {
    Predictor<Batch, float[][]> predictor = idle.pollFirst();
    if (predictor == null) {
      predictor = model.newPredictor(translator);
      synchronized (all) {
        all.add(predictor);
      }
    }
    try {
      return predictor.predict(batch);
    } catch (TranslateException | EngineException e) {
      throw new MorphscoutException(
          "The appearance model " + modelFile + " failed on a batch of " + batch.count() + " images: "
              + e.getMessage(), e);
    } finally {
      idle.offerFirst(predictor);
    }
  }

  /** Unit length; an all-zero vector stays zero (only a degenerate user model produces one). */
  private static float[] normalise(float[] v) {
    double s = 0;
    for (float x : v) {
      s += x * x;
    }
    if (s > 0) {
      float inv = (float) (1.0 / Math.sqrt(s));
      for (int i = 0; i < v.length; i++) {
        v[i] *= inv;
      }
    }
    return v;
  }

  @Override
  public void close() {
    if (closed) {
      return;
    }
    closed = true;
    synchronized (all) {
      all.forEach(Predictor::close);
      all.clear();
    }
    idle.clear();
    model.close();
  }
}
