package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Time per image of the built-in descriptor on one ONNX Runtime thread. Run with
 * {@code -Dgroups=benchmark -DexcludedGroups= -Dtest=GistEmbedderBenchmark}.
 */
@Tag("benchmark")
class GistEmbedderBenchmark {
  private static final Logger LOG = LoggerFactory.getLogger(GistEmbedderBenchmark.class);

  @TempDir Path dir;

  @Test
  void timePerImage() throws IOException {
    List<BufferedImage> imgs = new ArrayList<>();
    for (int i = 0; i < 64; i++) {
      imgs.add(TestImages.random(i, 512, 384, false));
    }
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.builtIn(dir, new EmbedderSettings(16, 1))) {
      for (int round = 0; round < 3; round++) {
        long t0 = System.nanoTime();
        for (BufferedImage img : imgs) {
          GistInput.prepare(img);
        }
        long t1 = System.nanoTime();
        e.embed(imgs);
        long t2 = System.nanoTime();
        double prep = (t1 - t0) / 1e6 / imgs.size();
        double total = (t2 - t1) / 1e6 / imgs.size();
        LOG.info("round {}: Java preparation {} ms/image, embed (preparation + graph) {} ms/image, graph ~{} ms/image",
            round, String.format("%.2f", prep), String.format("%.2f", total), String.format("%.2f", total - prep));
      }
    }
  }
}
