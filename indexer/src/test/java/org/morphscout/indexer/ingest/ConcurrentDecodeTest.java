package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One decoder shared by several threads gives the same pictures as decoding one file at a time. */
class ConcurrentDecodeTest {
  @TempDir Path dir;

  @Test
  void parallelDecodesMatchSequentialOnes() throws Exception {
    long seed = 99L;
    Random rnd = new Random(seed);
    List<Path> files = new ArrayList<>();
    String[] formats = {"png", "jpeg", "bmp", "gif", "tiff"};
    for (int i = 0; i < 10; i++) {
      BufferedImage img = new BufferedImage(90 + i, 60, BufferedImage.TYPE_INT_RGB);
      for (int y = 0; y < 60; y++) {
        for (int x = 0; x < img.getWidth(); x++) {
          img.setRGB(x, y, rnd.nextInt(1 << 24));
        }
      }
      String f = formats[i % formats.length];
      files.add(TestImages.write(dir, "f" + i + "." + f, TestImages.encode(img, f)));
    }
    ImageIoDecoder decoder = new ImageIoDecoder(DecodeOptions.defaults());
    List<int[]> sequential = new ArrayList<>();
    for (Path f : files) {
      sequential.add(pixels(decoder.decode(f)));
    }
    ExecutorService pool = Executors.newFixedThreadPool(4, r -> new Thread(r, "test-decode"));
    try {
      List<Future<int[]>> futures = new ArrayList<>();
      for (int round = 0; round < 2; round++) {
        for (Path f : files) {
          futures.add(pool.submit(() -> pixels(decoder.decode(f))));
        }
      }
      for (int i = 0; i < futures.size(); i++) {
        assertThat(futures.get(i).get()).as("seed %d, file %s", seed, files.get(i % files.size()))
            .isEqualTo(sequential.get(i % files.size()));
      }
    } finally {
      pool.shutdownNow();
    }
  }

  private static int[] pixels(DecodedImage d) {
    BufferedImage a = d.analysis();
    return a.getRGB(0, 0, a.getWidth(), a.getHeight(), null, 0, a.getWidth());
  }
}
