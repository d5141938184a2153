package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.util.Arrays;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Time per 768 x 768 image of {@link BorderModelSilhouettes} (median of repeated runs after warm-up). A benchmark,
 * not a test: excluded from the normal build; run with {@code main} or by including the tag.
 */
@Tag("benchmark")
class BorderModelBenchmark {
  /** Median wall-clock (cpu = false) or thread CPU (cpu = true) milliseconds per image. */
  static double medianMillis(int runs, boolean cpu) {
    java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
    BorderModelSilhouettes ex = new BorderModelSilhouettes();
    Shape s = Scenes.shape(Scenes.ShapeKind.VASE, 384, 384, 220);
    BufferedImage img = Scenes.background(Scenes.Background.NOISE, 768, 768, 7);
    Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    for (int i = 0; i < 30; i++) {
      ex.extract(img);
    }
    long[] t = new long[runs];
    for (int i = 0; i < runs; i++) {
      long t0 = cpu ? mx.getCurrentThreadCpuTime() : System.nanoTime();
      ex.extract(img);
      t[i] = (cpu ? mx.getCurrentThreadCpuTime() : System.nanoTime()) - t0;
    }
    Arrays.sort(t);
    return t[runs / 2] / 1e6;
  }

  @Test
  void underFiftyMillisecondsPerImage() {
    assertThat(medianMillis(50, true)).isLessThan(50);
  }

  public static void main(String[] args) {
    System.out.printf("BorderModelSilhouettes 768x768: median %.1f ms wall, %.1f ms thread CPU%n",
        medianMillis(100, false), medianMillis(100, true));
  }
}
