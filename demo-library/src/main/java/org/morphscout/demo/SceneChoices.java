package org.morphscout.demo;

import java.util.List;
import java.util.SplittableRandom;

/**
 * Seeded picks of the studio's photographic choices: backdrop, light, camera tilt, picture size. Proportions are
 * invented to look like a small studio's catalogue (mostly a light paper sweep, a key light from one side).
 */
final class SceneChoices {
  /** Light sweep papers {wall, floor}: mostly warm and cool whites, a few greys and one dark. */
  private static final int[][] SWEEPS = {
      {0xEEECE8, 0xDEDAD4}, {0xF2F1EE, 0xE2E0DC}, {0xE9E6E0, 0xD6D0C6}, {0xE4E7EA, 0xD2D6DA},
      {0xEDE7DF, 0xDDD3C6}, {0xD9D9D7, 0xC5C4C0}, {0x3C3C3E, 0x2A2A2C}, {0xE8E2D6, 0xD8CDB9}};
  private static final int[][] GRADIENTS = {
      {0xE9DCCB, 0xB9A48C}, {0xDCE3E6, 0x9AA9B2}, {0xEDE4E0, 0xC8B4AE}, {0xD8DDD0, 0xA5AE98}};
  private static final int[][] LINENS = {{0xE3DDD0, 0xD2CAB9}, {0xD9D6CF, 0xC6C1B6}, {0xE6E2DA, 0xCFC7BA}};
  private static final int[][] TABLES = {{0xE8E6E1, 0x9A6B45}, {0xEEEBE6, 0x7B5536}, {0xE2E0DB, 0xB08A63}};
  private static final List<int[]> SIZES_LANDSCAPE = List.of(new int[] {1024, 768});
  private static final List<int[]> SIZES_PORTRAIT = List.of(new int[] {768, 1024});
  private static final List<int[]> SIZES_SQUARE = List.of(new int[] {1000, 1000});

  private SceneChoices() {}

  /** Studio sweep 62 %, gradient 15 %, linen 11 %, wood table 12 %. */
  static Backdrop backdrop(SplittableRandom rnd) {
    double u = rnd.nextDouble();
    long seed = rnd.nextLong();
    if (u < 0.62) {
      int[] c = SWEEPS[rnd.nextInt(SWEEPS.length)];
      return new Backdrop(BackdropKind.STUDIO_SWEEP, c[0], c[1], 0.55 + 0.15 * rnd.nextDouble(), seed);
    }
    if (u < 0.77) {
      int[] c = GRADIENTS[rnd.nextInt(GRADIENTS.length)];
      return new Backdrop(BackdropKind.GRADIENT, c[0], c[1], 0.6, seed);
    }
    if (u < 0.88) {
      int[] c = LINENS[rnd.nextInt(LINENS.length)];
      return new Backdrop(BackdropKind.LINEN, c[0], c[1], 0.6, seed);
    }
    int[] c = TABLES[rnd.nextInt(TABLES.length)];
    return new Backdrop(BackdropKind.WOOD_TABLE, c[0], c[1], 0.5 + 0.12 * rnd.nextDouble(), seed);
  }

  /** Key light 25-60 degrees to either side, 20-50 degrees up, modest variations of strength, fill and colour. */
  static Lighting lighting(SplittableRandom rnd) {
    double side = rnd.nextBoolean() ? -1 : 1;
    return new Lighting(side * (25 + 35 * rnd.nextDouble()), 20 + 30 * rnd.nextDouble(),
        0.85 + 0.3 * rnd.nextDouble(), 0.22 + 0.16 * rnd.nextDouble(), -0.4 + 0.9 * rnd.nextDouble(),
        0.95 + 0.1 * rnd.nextDouble());
  }

  /** Camera looking down by a sine of 0.10-0.22. */
  static double tilt(SplittableRandom rnd) {
    return 0.10 + 0.12 * rnd.nextDouble();
  }

  /** Picture size {w, h}: tall vessels favour portrait, wide ones landscape. */
  static int[] size(SplittableRandom rnd, VesselProfile profile) {
    double aspect = profile.heightCm() / (profile.leftExtentCm() + profile.rightExtentCm());
    double u = rnd.nextDouble();
    double portrait;
    double square;
    if (aspect > 1.3) {
      portrait = 0.55;
      square = 0.25;
    } else if (aspect < 0.8) {
      portrait = 0.05;
      square = 0.35;
    } else {
      portrait = 0.25;
      square = 0.30;
    }
    List<int[]> pick = u < portrait ? SIZES_PORTRAIT : u < portrait + square ? SIZES_SQUARE : SIZES_LANDSCAPE;
    return pick.get(0).clone();
  }
}
