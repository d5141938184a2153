package org.morphscout.indexer.feature;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
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
    ThreadMXBean cpu = ManagementFactory.getThreadMXBean();
    try (OnnxAppearanceEmbedder e = OnnxAppearanceEmbedder.builtIn(dir, new EmbedderSettings(16, 1))) {
      for (int round = 0; round < 8; round++) {
        // Thread CPU time, not wall time: the build machine is shared. With one intra-op thread ONNX Runtime runs
        // on the calling thread, so its work is counted too.
        long t0 = cpu.getCurrentThreadCpuTime();
        for (BufferedImage img : imgs) {
          GistInput.prepare(img);
        }
        long t1 = cpu.getCurrentThreadCpuTime();
        e.embed(imgs);
        long t2 = cpu.getCurrentThreadCpuTime();
        double prep = (t1 - t0) / 1e6 / imgs.size();
        double total = (t2 - t1) / 1e6 / imgs.size();
        LOG.info("round {}: CPU time: Java preparation {} ms/image, embed (preparation + graph) {} ms/image, graph ~{} ms/image",
            round, String.format("%.2f", prep), String.format("%.2f", total), String.format("%.2f", total - prep));
      }
    }
  }
}
