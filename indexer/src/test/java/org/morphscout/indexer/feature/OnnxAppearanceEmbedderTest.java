package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

class OnnxAppearanceEmbedderTest {
  private static final long SEED = 777;

  @TempDir Path dir;

  private static List<BufferedImage> images(int n) {
    List<BufferedImage> list = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      list.add(TestImages.random(SEED + i, 40 + 13 * i, 70 - 3 * i, i % 3 == 0));
    }
    return list;
  }

  @Test
  void batchGivesTheSameUnitVectorsAsSingleCalls() throws IOException {
    List<BufferedImage> imgs = images(7);
    // Batches of 3 so the 7 images cross batch boundaries.
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.builtIn(dir, new EmbedderSettings(3, 1))) {
      List<float[]> batch = e.embed(imgs);
      assertThat(batch).hasSize(7);
      for (int i = 0; i < imgs.size(); i++) {
        float[] single = e.embed(List.of(imgs.get(i))).get(0);
        assertThat(norm(batch.get(i))).as("seed %d image %d", SEED, i).isCloseTo(1.0, within(1e-5));
        for (int j = 0; j < single.length; j++) {
          assertThat(batch.get(i)[j]).as("seed %d image %d comp %d", SEED, i, j).isCloseTo(single[j], within(1e-6f));
        }
      }
      assertThat(e.embed(List.of())).isEmpty();
    }
  }

  @Test
  void concurrentCallersGetTheSameVectorsAsOneCaller() throws Exception {
    List<BufferedImage> imgs = images(4);
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.builtIn(dir, new EmbedderSettings(2, 1))) {
      List<float[]> expected = e.embed(imgs);
      List<List<float[]>> results = java.util.Collections.synchronizedList(new ArrayList<>());
      List<Throwable> failures = java.util.Collections.synchronizedList(new ArrayList<>());
      List<Thread> threads = new ArrayList<>();
      for (int t = 0; t < 3; t++) {
        Thread thread = new Thread(() -> {
          try {
            results.add(e.embed(imgs));
          } catch (Throwable ex) {
            failures.add(ex);
          }
        }, "embed-test-" + t);
        threads.add(thread);
        thread.start();
      }
      for (Thread thread : threads) {
        thread.join();
      }
      assertThat(failures).isEmpty();
      assertThat(results).hasSize(3);
      for (List<float[]> r : results) {
        for (int i = 0; i < imgs.size(); i++) {
          assertThat(r.get(i)).containsExactly(expected.get(i), within(1e-6f));
        }
      }
    }
  }

  @Test
  void userModelFromJsonWorksAndPoolsLikeTheGraph() throws IOException {
    Files.write(dir.resolve("tiny.onnx"), TinyModels.convNet(1));
    Path json = dir.resolve("tiny.json");
    Files.writeString(json, """
        {"model": "tiny.onnx", "inputWidth": 16, "inputHeight": 16, "channelOrder": "BGR",
         "mean": [0.5, 0.5, 0.5], "std": [0.25, 0.25, 0.25], "scale": 0.00392156862745098,
         "output": "features", "globalAveragePool": true}
        """);
    ModelDescription fromJson = ModelDescription.fromJson(json);
    assertThat(fromJson.modelFile()).isEqualTo(dir.resolve("tiny.onnx").toAbsolutePath());
    assertThat(fromJson.channelOrder()).isEqualTo(ModelDescription.ChannelOrder.BGR);
    // The same model read from its first output ("pooled", pooled by ONNX Runtime's GlobalAveragePool).
    ModelDescription firstOutput = new ModelDescription(fromJson.modelFile(), 16, 16,
        ModelDescription.ChannelOrder.BGR, fromJson.mean(), fromJson.std(), fromJson.scale(),
        ModelDescription.Layout.NCHW, "", false);
    List<BufferedImage> imgs = images(5);
    try (OnnxAppearanceEmbedder a = OnnxAppearanceEmbedder.custom(fromJson);
        OnnxAppearanceEmbedder b = OnnxAppearanceEmbedder.custom(firstOutput)) {
      assertThat(a.dimension()).isEqualTo(8);
      assertThat(b.dimension()).isEqualTo(8);
      assertThat(a.modelId()).matches("custom:[0-9a-f]{16}:16x16").isEqualTo(b.modelId());
      List<float[]> va = a.embed(imgs);
      List<float[]> vb = b.embed(imgs);
      for (int i = 0; i < imgs.size(); i++) {
        assertThat(norm(va.get(i))).isCloseTo(1.0, within(1e-5));
        for (int j = 0; j < 8; j++) {
          assertThat(va.get(i)[j]).as("seed %d image %d", SEED, i).isCloseTo(vb.get(i)[j], within(1e-5f));
        }
      }
    }
    ModelDescription flat = new ModelDescription(fromJson.modelFile(), 16, 16,
        ModelDescription.ChannelOrder.RGB, fromJson.mean(), fromJson.std(), fromJson.scale(),
        ModelDescription.Layout.NCHW, "features", false);
    try (OnnxAppearanceEmbedder c = OnnxAppearanceEmbedder.custom(flat)) {
      assertThat(c.dimension()).isEqualTo(8 * 14 * 14);
    }
  }

  @Test
  void modelIdChangesWhenTheFileChanges() throws IOException {
    Path file = dir.resolve("m.onnx");
    Files.write(file, TinyModels.convNet(1));
    ModelDescription d = new ModelDescription(file, 16, 16, ModelDescription.ChannelOrder.RGB,
        new float[] {0, 0, 0}, new float[] {1, 1, 1}, 1f / 255f, ModelDescription.Layout.NCHW, "", true);
    String first;
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.custom(d)) {
      first = e.modelId();
    }
    Files.write(file, TinyModels.convNet(2));
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.custom(d)) {
      assertThat(e.modelId()).startsWith("custom:").isNotEqualTo(first);
    }
  }

  @Test
  void badModelPathsGiveClearErrors() throws IOException {
    Path missing = dir.resolve("nowhere.onnx");
    assertThatThrownBy(() -> OnnxAppearanceEmbedder.custom(ModelDescription.defaults(missing)))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining(missing.toString())
        .hasMessageContaining("does not exist");
    Path garbage = dir.resolve("garbage.onnx");
    Files.writeString(garbage, "this is not a model");
    assertThatThrownBy(() -> OnnxAppearanceEmbedder.custom(ModelDescription.defaults(garbage)))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining(garbage.toString());
    Path json = dir.resolve("typo.json");
    Files.writeString(json, "{\"model\": \"x.onnx\", \"inputWidht\": 10}");
    assertThatThrownBy(() -> ModelDescription.fromJson(json))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("typo.json");
    assertThatThrownBy(() -> new ModelDescription(garbage, 0, 10, ModelDescription.ChannelOrder.RGB,
        new float[3], new float[] {1, 1, 1}, 1f, ModelDescription.Layout.NCHW, "", true))
        .isInstanceOf(MorphscoutException.class);
  }

  @Test
  void unknownOutputNameIsReported() throws IOException {
    Path file = dir.resolve("m.onnx");
    Files.write(file, TinyModels.convNet(3));
    ModelDescription d = new ModelDescription(file, 16, 16, ModelDescription.ChannelOrder.RGB,
        new float[] {0, 0, 0}, new float[] {1, 1, 1}, 1f / 255f, ModelDescription.Layout.NCHW, "logits", true);
    assertThatThrownBy(() -> OnnxAppearanceEmbedder.custom(d))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("logits")
        .hasMessageContaining("features");
  }

  private static double norm(float[] v) {
    double s = 0;
    for (float x : v) {
      s += x * x;
    }
    return Math.sqrt(s);
  }
}
