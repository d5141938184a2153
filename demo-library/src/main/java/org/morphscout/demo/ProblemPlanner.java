package org.morphscout.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Plans the pictures in {@code problems/}, each made to trip one check of an indexer: a vessel cut off by the
 * frame, two vessels in one picture, a badly under-exposed shot, a 2:1 panorama, a 96x72 thumbnail and a JPEG whose
 * bytes stop before the end (no EOI marker, part of the scan missing).
 */
final class ProblemPlanner {
  /** Share of the JPEG bytes kept in the corrupt file. */
  static final double CORRUPT_KEEP = 0.55;

  private final DemoOptions options;
  private final VesselRenderer renderer = new VesselRenderer();

  ProblemPlanner(DemoOptions options) {
    this.options = options;
  }

  /** A planned problem picture: its manifest row and the shot drawn for it. */
  record Planned(ManifestRow row, Shot shot) {}

  List<LibraryJob> plan() {
    List<LibraryJob> jobs = new ArrayList<>();
    for (Planned p : planShots()) {
      jobs.add(new LibraryJob(List.of(p.row()), () -> {
        byte[] bytes = ImageCodec.jpeg(renderer.render(p.shot()).image(), options.jpegQuality());
        return List.of(p.row().problem().equals("corrupt") ? ImageCodec.truncated(bytes, CORRUPT_KEEP) : bytes);
      }));
    }
    return jobs;
  }

  /** The six problem shots with their rows, in a fixed order. */
  List<Planned> planShots() {
    List<Planned> jobs = new ArrayList<>();
    SplittableRandom rnd = new SplittableRandom(Noise.mix(options.seed() ^ 0xBADL));

    // Cut off: a tall vessel scaled past the frame and pushed toward the right-hand edge.
    jobs.add(job("cut-off", Archetype.VASE, rnd, 1024, 768, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 1.25, tilt, 0.3))));
    // Two objects: a jug and a cup side by side.
    jobs.add(job("two-objects", Archetype.JUG, rnd, 1024, 768, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 0.6, tilt, -0.2),
        Placement.fitted(Archetype.CUP.profile(), g.shifted(-20, 10, 25), w, h, 0.4, tilt, 0.24))));
    // Very dark: the exposure is set far too low (see darkLight).
    jobs.add(job("very-dark", Archetype.BOTTLE, rnd, 768, 1024, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 0.7, tilt, 0))));
    // Panoramic 2:1 with the vessel small in the middle.
    jobs.add(job("panoramic", Archetype.BOWL, rnd, 2048, 1024, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 0.45, tilt, 0))));
    // Very small: 96x72 pixels.
    jobs.add(job("tiny", Archetype.JAR, rnd, 96, 72, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 0.72, tilt, 0))));
    // Corrupt: a normal product shot whose JPEG bytes are cut short.
    jobs.add(job("corrupt", Archetype.AMPHORA, rnd, 1024, 768, (p, g, w, h, tilt) -> List.of(
        Placement.fitted(p, g, w, h, 0.7, tilt, 0))));
    return jobs;
  }

  @FunctionalInterface
  private interface Layout {
    List<Placement> place(VesselProfile profile, Glaze glaze, int w, int h, double tilt);
  }

  private Planned job(String problem, Archetype archetype, SplittableRandom rnd, int w, int h, Layout layout) {
    long seed = rnd.nextLong();
    SplittableRandom r = new SplittableRandom(seed);
    VesselProfile profile = archetype.profile().varied(r.nextLong(), 0.04);
    Glaze glaze = Glazes.pick(r);
    Backdrop backdrop = problem.equals("very-dark")
        ? new Backdrop(BackdropKind.STUDIO_SWEEP, 0x4A4846, 0x3A3836, 0.6, r.nextLong())
        : Backdrop.studioSweep(r.nextLong());
    Lighting light = SceneChoices.lighting(r);
    if (problem.equals("very-dark")) {
      light = light.withExposure(0.1);
    }
    double tilt = SceneChoices.tilt(r);
    Shot shot = new Shot(w, h, backdrop, light, tilt, layout.place(profile, glaze, w, h, tilt));
    String file = "problems/" + problem + "-" + archetype.noun() + "-" + glaze.name() + ".jpg";
    ManifestRow row = new ManifestRow(file, archetype.productLine(), archetype.noun(), archetype.noun(), 0,
        glaze.name(), glaze.texture().label(), backdrop.kind().label(), w, h, "jpeg", false, problem, "", -1, seed);
    return new Planned(row, shot);
  }
}
