package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.slf4j.LoggerFactory;

/** The generated ONNX graph, run by ONNX Runtime, against the plain-Java {@link GistReference}. */
class GistModelTest {
  @TempDir Path cache;

  @Test
  void onnxGraphEqualsPlainJavaReference() throws IOException {
    long[] seeds = {1, 2, 3, 42, 2001};
    List<BufferedImage> images = new ArrayList<>();
    for (long seed : seeds) {
      images.add(TestImages.random(seed, 90 + (int) (seed % 97), 140 - (int) (seed % 50), seed % 2 == 0));
    }
    try (OnnxAppearanceEmbedder embedder = OnnxAppearanceEmbedder.builtIn(cache)) {
      assertThat(embedder.modelId()).isEqualTo("gist-lab-v1");
      assertThat(embedder.dimension()).isEqualTo(GistModelBuilder.DIMENSION).isEqualTo(560);
      List<float[]> got = embedder.embed(images);
      double worst = 0;
      for (int i = 0; i < seeds.length; i++) {
        float[] want = GistReference.embed(GistInput.prepare(images.get(i)));
        float[] have = got.get(i);
        assertThat(have).hasSize(want.length);
        for (int j = 0; j < want.length; j++) {
          assertThat(have[j]).as("seed %d component %d", seeds[i], j).isCloseTo(want[j], within(1e-4f));
          worst = Math.max(worst, Math.abs(have[j] - want[j]));
        }
      }
      LoggerFactory.getLogger(GistModelTest.class).info("largest ONNX - reference difference: {}", worst);
    }
  }

  @Test
  void generatedModelIsDeterministicAndCachedFileIsReused() throws IOException {
    assertThat(GistModelBuilder.build()).isEqualTo(GistModelBuilder.build());
    Path first = OnnxAppearanceEmbedder.writeBuiltInModel(cache);
    long modified = first.toFile().lastModified();
    Path second = OnnxAppearanceEmbedder.writeBuiltInModel(cache);
    assertThat(second).isEqualTo(first);
    assertThat(second.toFile().lastModified()).isEqualTo(modified);
  }
}
