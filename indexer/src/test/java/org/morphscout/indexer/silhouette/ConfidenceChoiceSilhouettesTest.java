package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class ConfidenceChoiceSilhouettesTest {
  private static final BufferedImage IMAGE = new BufferedImage(64, 48, BufferedImage.TYPE_INT_ARGB);

  /** A fixed answer, counting how often it was asked. */
  private static final class Fixed implements SilhouetteExtractor {
    final Silhouette answer;
    final AtomicInteger calls = new AtomicInteger();

    Fixed(Silhouette answer) {
      this.answer = answer;
    }

    @Override
    public Silhouette extract(BufferedImage image) {
      calls.incrementAndGet();
      return answer;
    }

    @Override
    public String name() {
      return answer.source();
    }
  }

  private static Silhouette box(int x0, int y0, int x1, int y1, double confidence, boolean touches, String source) {
    byte[] data = new byte[64 * 48];
    for (int y = y0; y < y1; y++) {
      for (int x = x0; x < x1; x++) {
        data[y * 64 + x] = 1;
      }
    }
    Mask m = new Mask(64, 48, data);
    return new Silhouette(m, 1, touches, m.coverage(), confidence, source);
  }

  private static ConfidenceChoiceSilhouettes choice(Fixed classical, Fixed learned) {
    return new ConfidenceChoiceSilhouettes(classical, () -> learned, ConfidenceChoiceSilhouettes.Options.DEFAULTS);
  }

  @Test
  void aConfidentClassicalSilhouetteIsKeptWithoutRunningTheModel() {
    // The box is in one piece, clear of the frame and mirror-symmetric, so the symmetry bonus lifts it too.
    Fixed classical = new Fixed(box(20, 10, 44, 40, 0.9, false, "border-model"));
    Fixed learned = new Fixed(box(0, 0, 64, 48, 0.99, false, "learned"));
    Silhouette s = choice(classical, learned).extract(IMAGE);
    assertThat(s.source()).isEqualTo("border-model");
    assertThat(s.confidence()).isEqualTo(1.0); // 0.9 + the symmetry bonus, clamped
    assertThat(learned.calls).hasValue(0);
  }

  @Test
  void aSymmetricWholeMaskSkipsTheModelAndAnAsymmetricOneDoesNot() {
    // Trust 0.65: below the 0.75 at which the model runs, unless the mask looks whole (one piece, off the frame,
    // mirror-symmetric).
    Fixed whole = new Fixed(box(20, 10, 44, 40, 0.65, false, "border-model"));
    Fixed learned = new Fixed(box(20, 10, 44, 40, 0.99, false, "learned"));
    Silhouette s = choice(whole, learned).extract(IMAGE);
    assertThat(learned.calls).hasValue(0);
    assertThat(s.confidence()).isCloseTo(0.80, org.assertj.core.api.Assertions.within(1e-9));
    // An L-shaped mask (a lit side and the base, say) of the same trust is not symmetric: the model is asked.
    byte[] data = new byte[64 * 48];
    for (int y = 10; y < 40; y++) {
      for (int x = 20; x < (y >= 32 ? 44 : 28); x++) {
        data[y * 64 + x] = 1;
      }
    }
    Mask ell = new Mask(64, 48, data);
    assertThat(ell.mirrorSymmetry()).isLessThan(0.9);
    Fixed part = new Fixed(new Silhouette(ell, 1, false, ell.coverage(), 0.65, "border-model"));
    choice(part, learned).extract(IMAGE);
    assertThat(learned.calls).hasValue(1);
    // Cut by the frame, the same symmetric box gets no bonus either.
    Fixed cut = new Fixed(box(20, 10, 44, 40, 0.65, true, "border-model"));
    choice(cut, learned).extract(IMAGE);
    assertThat(learned.calls).hasValue(2);
  }

  @Test
  void mirrorSymmetryOfMasks() {
    assertThat(box(20, 10, 44, 40, 0.5, false, "x").mask().mirrorSymmetry()).isEqualTo(1.0);
    assertThat(Mask.empty(8, 8).mirrorSymmetry()).isZero();
    // A right triangle: its mirror image about the centroid's vertical overlaps it only in part.
    byte[] data = new byte[32 * 32];
    for (int y = 0; y < 32; y++) {
      for (int x = 0; x <= y; x++) {
        data[y * 32 + x] = 1;
      }
    }
    assertThat(new Mask(32, 32, data).mirrorSymmetry()).isBetween(0.2, 0.8);
  }

  @Test
  void aDoubtfulClassicalSilhouetteLosesToAConfidentLearnedOne() {
    // The classical mask found the frame's lower half (touches the border, low separation); the learned one an object.
    Fixed classical = new Fixed(box(0, 24, 64, 48, 0.4, true, "border-model"));
    Fixed learned = new Fixed(box(20, 8, 44, 40, 0.92, false, "learned"));
    Silhouette s = choice(classical, learned).extract(IMAGE);
    assertThat(learned.calls).hasValue(1);
    assertThat(s.source()).isEqualTo("learned");
    assertThat(s.uncertain()).isFalse();
  }

  @Test
  void whenNeitherIsTrustworthyTheSilhouetteIsUncertain() {
    Fixed classical = new Fixed(box(0, 0, 64, 30, 0.35, true, "border-model"));
    Fixed learned = new Fixed(box(40, 30, 64, 48, 0.3, true, "learned"));
    Silhouette s = choice(classical, learned).extract(IMAGE);
    assertThat(s.uncertain()).isTrue();
    assertThat(s.confidence()).isLessThan(Silhouette.UNCERTAIN_BELOW);
  }

  @Test
  void agreementRaisesTrustAndDisagreementLowersIt() {
    Silhouette classicalMask = box(20, 10, 44, 40, 0.45, false, "border-model");
    Fixed agreeing = new Fixed(box(20, 10, 44, 40, 0.45, false, "learned"));
    Fixed disagreeing = new Fixed(box(0, 0, 10, 10, 0.45, false, "learned"));
    double agreed = choice(new Fixed(classicalMask), agreeing).extract(IMAGE).confidence();
    double disagreed = choice(new Fixed(classicalMask), disagreeing).extract(IMAGE).confidence();
    assertThat(agreed).isGreaterThan(0.45).isGreaterThan(disagreed);
    assertThat(disagreed).isLessThan(0.45);
  }

  @Test
  void optionsAreValidated() {
    assertThatThrownBy(() -> new ConfidenceChoiceSilhouettes.Options(1.5, 0.75, 0.85, 0.02, 0.9, 0.15))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> new ConfidenceChoiceSilhouettes.Options(0.5, 0.75, 0.85, 0.6, 0.9, 0.15))
        .isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void theModelFolderIsTheOptionElseTheEnvironmentElseTheUsersDataFolder() {
    Path home = Path.of("/home/someone");
    assertThat(ModelFolder.resolve(Optional.of(Path.of("/opt/m")), Map.of(ModelFolder.ENV, "/env/m"), home).dir())
        .isEqualTo(Path.of("/opt/m"));
    assertThat(ModelFolder.resolve(Optional.empty(), Map.of(ModelFolder.ENV, "/env/m"), home).dir())
        .isEqualTo(Path.of("/env/m"));
    assertThat(ModelFolder.resolve(Optional.empty(), Map.of("XDG_DATA_HOME", "/data"), home).dir())
        .isEqualTo(Path.of("/data/morphscout/models"));
    // The XDG base-directory specification ignores a relative XDG_DATA_HOME.
    assertThat(ModelFolder.resolve(Optional.empty(), Map.of("XDG_DATA_HOME", "rel"), home).dir())
        .isEqualTo(Path.of("/home/someone/.local/share/morphscout/models"));
    assertThat(ModelFolder.resolve(Optional.empty(), Map.of(), home).salientModel())
        .isEqualTo(Path.of("/home/someone/.local/share/morphscout/models/u2netp.onnx"));
  }
}
