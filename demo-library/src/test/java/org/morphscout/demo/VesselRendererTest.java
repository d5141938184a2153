package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;

class VesselRendererTest {
  private static final long SEED = 0x5EED_0002L;
  private final VesselRenderer renderer = new VesselRenderer();

  private static Shot randomShot(SplittableRandom rnd, int w, int h) {
    Archetype[] all = Archetype.values();
    VesselProfile p = VesselProfile.blend(all[rnd.nextInt(all.length)].profile(),
        all[rnd.nextInt(all.length)].profile(), rnd.nextDouble());
    Glaze g = Glazes.pick(rnd);
    double tilt = SceneChoices.tilt(rnd);
    return new Shot(w, h, SceneChoices.backdrop(rnd), SceneChoices.lighting(rnd), tilt,
        List.of(Placement.fitted(p, g, w, h, 0.7, tilt, 0)));
  }

  @Test
  void pixelsInsideTheMaskDifferFromTheBackdropAndOutsideAreUntouched() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    for (int trial = 0; trial < 8; trial++) {
      Rendering r = renderer.render(randomShot(rnd, 256, 224));
      BufferedImage img = r.image();
      BufferedImage plate = r.plate();
      GroundTruthMask m = r.mask();
      int inside = 0;
      int differs = 0;
      for (int y = 0; y < m.height(); y++) {
        for (int x = 0; x < m.width(); x++) {
          int d = diff(img.getRGB(x, y), plate.getRGB(x, y));
          if (m.get(x, y)) {
            inside++;
            differs += d >= 6 ? 1 : 0;
          } else if (!nearMask(m, x, y)) {
            // Antialiasing may touch the pixels next to the outline, nothing further out.
            assertThat(d).as("seed %d trial %d outside pixel (%d,%d)", SEED, trial, x, y).isZero();
          }
        }
      }
      assertThat(inside).as("seed %d trial %d mask area", SEED, trial).isGreaterThan(2000);
      assertThat((double) differs / inside).as("seed %d trial %d share of mask pixels unlike backdrop", SEED, trial)
          .isGreaterThan(0.97);
    }
  }

  @Test
  void maskAreaMatchesTheProfileAreaSeenStraightOn() {
    // With no camera tilt the silhouette is the side profile, so its area is the integral of 2 r(h) dh (scaled
    // by px/cm squared). Pixel-centre sampling of a smooth outline has no bias, only noise along the edge: allow 1 %.
    for (Archetype a : new Archetype[] {Archetype.VASE, Archetype.BOTTLE, Archetype.BOWL, Archetype.JAR}) {
      VesselProfile p = a.profile();
      Placement pl = new Placement(p, Glazes.named("slate"), 200, 380, 10.0);
      Rendering r = renderer.render(new Shot(400, 400, Backdrop.studioSweep(1), Lighting.STUDIO, 0, List.of(pl)));
      double expected = p.sideAreaCm2() * 100;
      assertThat((double) r.mask().area()).as("%s", a).isCloseTo(expected, within(expected * 0.01));
      assertThat(r.mask().boxHeight()).as("%s height", a).isCloseTo((int) Math.round(p.heightCm() * 10), within(1));
    }
  }

  @Test
  void sameShotGivesSamePixelsOnAnyThread() throws Exception {
    Shot shot = randomShot(new SplittableRandom(SEED + 7), 200, 160);
    int[] reference = pixels(renderer.render(shot).image());
    ExecutorService pool = Executors.newFixedThreadPool(2, new DemoThreads());
    try {
      List<Future<int[]>> futures = new ArrayList<>();
      for (int i = 0; i < 4; i++) {
        futures.add(pool.submit(() -> pixels(renderer.render(shot).image())));
      }
      for (Future<int[]> f : futures) {
        assertThat(f.get()).as("seed %d", SEED + 7).isEqualTo(reference);
      }
    } finally {
      pool.shutdownNow();
    }
  }

  @Test
  void cutOutIsTransparentOutsideAndOpaqueInside() {
    Rendering r = renderer.render(randomShot(new SplittableRandom(SEED + 3), 240, 240));
    BufferedImage cut = r.cutOut();
    GroundTruthMask m = r.mask();
    int opaqueInside = 0;
    int inside = 0;
    for (int y = 1; y < m.height() - 1; y++) {
      for (int x = 1; x < m.width() - 1; x++) {
        int alpha = cut.getRGB(x, y) >>> 24;
        if (!nearMask(m, x, y)) {
          assertThat(alpha).as("seed %d (%d,%d)", SEED + 3, x, y).isZero();
        } else if (m.get(x, y) && m.get(x - 1, y) && m.get(x + 1, y) && m.get(x, y - 1) && m.get(x, y + 1)) {
          inside++;
          opaqueInside += alpha == 255 ? 1 : 0;
        }
      }
    }
    assertThat(inside).isPositive();
    assertThat(opaqueInside).as("seed %d", SEED + 3).isEqualTo(inside);
  }

  @Test
  void oversizedOffCentrePlacementTouchesTheFrameAndTwoVesselsGiveTwoMasks() {
    Glaze g = Glazes.named("honey");
    double tilt = 0.15;
    Rendering cut = renderer.render(new Shot(320, 240, Backdrop.studioSweep(3), Lighting.STUDIO, tilt,
        List.of(Placement.fitted(Archetype.VASE.profile(), g, 320, 240, 1.25, tilt, 0.3))));
    assertThat(cut.mask().touchesFrame()).isTrue();
    Rendering two = renderer.render(new Shot(320, 240, Backdrop.studioSweep(3), Lighting.STUDIO, tilt, List.of(
        Placement.fitted(Archetype.JUG.profile(), g, 320, 240, 0.6, tilt, -0.2),
        Placement.fitted(Archetype.CUP.profile(), g, 320, 240, 0.4, tilt, 0.24))));
    assertThat(two.vesselMasks()).hasSize(2);
    assertThat(two.vesselMasks().get(0).iou(two.vesselMasks().get(1))).isZero();
    assertThat(two.mask().area())
        .isEqualTo(two.vesselMasks().get(0).area() + two.vesselMasks().get(1).area());
    assertThat(two.mask().touchesFrame()).isFalse();
  }

  static int diff(int a, int b) {
    return Math.abs(((a >> 16) & 0xFF) - ((b >> 16) & 0xFF)) + Math.abs(((a >> 8) & 0xFF) - ((b >> 8) & 0xFF))
        + Math.abs((a & 0xFF) - (b & 0xFF));
  }

  static boolean nearMask(GroundTruthMask m, int x, int y) {
    for (int dy = -1; dy <= 1; dy++) {
      for (int dx = -1; dx <= 1; dx++) {
        int xx = x + dx;
        int yy = y + dy;
        if (xx >= 0 && yy >= 0 && xx < m.width() && yy < m.height() && m.get(xx, yy)) {
          return true;
        }
      }
    }
    return false;
  }

  static int[] pixels(BufferedImage img) {
    return img.getRGB(0, 0, img.getWidth(), img.getHeight(), null, 0, img.getWidth());
  }
}
