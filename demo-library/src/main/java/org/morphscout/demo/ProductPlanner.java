package org.morphscout.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Plans the product pictures and their near-duplicates. All choices are made here, sequentially, from one seed
 * (each product draws from its own stream derived from the master seed and its index), so that the drawing jobs
 * can run in any order.
 */
final class ProductPlanner {
  /** Product lines and their share of the catalogue (invented proportions). */
  private static final String[] LINES = {"vases", "jugs", "bottles", "bowls", "cups", "jars"};
  private static final double[] SHARES = {0.24, 0.15, 0.17, 0.17, 0.15, 0.12};

  private final DemoOptions options;
  private final VesselRenderer renderer = new VesselRenderer();

  ProductPlanner(DemoOptions options) {
    this.options = options;
  }

  List<LibraryJob> plan() {
    int n = options.productCount();
    List<String> lines = lineSequence(n, new SplittableRandom(Noise.mix(options.seed() ^ 0x11EL)));
    List<LibraryJob> jobs = new ArrayList<>(n);
    int step = options.duplicates() == 0 ? Integer.MAX_VALUE : n / options.duplicates();
    int dupKind = 0;
    for (int i = 0; i < n; i++) {
      long productSeed = Noise.mix(options.seed() * 31 + i + 1);
      SplittableRandom rnd = new SplittableRandom(productSeed);
      Product p = product(lines.get(i), i, productSeed, rnd);
      boolean dup = options.duplicates() > 0 && i % step == step / 2 && i / step < options.duplicates();
      jobs.add(dup ? withDuplicate(p, dupKind++ % 3) : single(p));
    }
    return jobs;
  }

  /** One product's shot and manifest row. */
  record Product(Shot shot, ManifestRow row, boolean alpha) {}

  Product product(String line, int index, long productSeed, SplittableRandom rnd) {
    Archetype a = mainArchetype(line, rnd);
    Archetype b = a;
    double t = 0;
    if (rnd.nextDouble() < 0.55) {
      Archetype[] partners = partners(a);
      b = partners[rnd.nextInt(partners.length)];
      // Rounded to the manifest's precision so the manifest states exactly what was drawn.
      t = Math.round((0.08 + 0.40 * rnd.nextDouble()) * 1000) / 1000.0;
    }
    VesselProfile profile = VesselProfile.blend(a.profile(), b.profile(), t).varied(rnd.nextLong(), 0.04);
    Glaze glaze = Glazes.pick(rnd);
    Backdrop backdrop = SceneChoices.backdrop(rnd);
    Lighting light = SceneChoices.lighting(rnd);
    double tilt = SceneChoices.tilt(rnd);
    int[] size = SceneChoices.size(rnd, profile);
    double fill = 0.62 + 0.18 * rnd.nextDouble();
    double offset = 0.08 * (rnd.nextDouble() - 0.5);
    boolean png = rnd.nextDouble() < 0.10;
    boolean alpha = png && rnd.nextDouble() < 0.4;
    Placement placement = Placement.fitted(profile, glaze, size[0], size[1], fill, tilt, offset);
    Shot shot = new Shot(size[0], size[1], backdrop, light, tilt, List.of(placement));
    String file = String.format(Locale.ROOT, "%s/%s-%s-%03d.%s", line, a.noun(), glaze.name(), index + 1,
        png ? "png" : "jpg");
    ManifestRow row = new ManifestRow(file, line, a.noun(), b.noun(), t, glaze.name(), glaze.texture().label(),
        alpha ? "none" : backdrop.kind().label(), size[0], size[1], png ? "png" : "jpeg", alpha, "", "", -1,
        productSeed);
    return new Product(shot, row, alpha);
  }

  private LibraryJob single(Product p) {
    return new LibraryJob(List.of(p.row()), () -> List.of(encode(p, renderer.render(p.shot()))));
  }

  /** A product plus a near-duplicate: resized for the web, a small thumbnail, or lightly edited. */
  private LibraryJob withDuplicate(Product p, int kind) {
    ManifestRow r = p.row();
    String stem = r.file().substring(0, r.file().lastIndexOf('.'));
    int w = r.width();
    int h = r.height();
    String suffix;
    int dw;
    int dh;
    switch (kind) {
      case 0 -> {
        suffix = "-web";
        dw = w * 5 / 8;
        dh = h * 5 / 8;
      }
      case 1 -> {
        suffix = "-small";
        dw = w * 9 / 20;
        dh = h * 9 / 20;
      }
      default -> {
        suffix = "-edit";
        dw = w * 4 / 5;
        dh = h * 4 / 5;
      }
    }
    ManifestRow dupRow = new ManifestRow(stem + suffix + ".jpg", r.productLine(), r.archetypeA(), r.archetypeB(),
        r.blendT(), r.glaze(), r.texture(), r.backdrop(), dw, dh, "jpeg", false, "", r.file(), -1, r.seed());
    return new LibraryJob(List.of(r, dupRow), () -> {
      Rendering rendering = renderer.render(p.shot());
      byte[] original = encode(p, rendering);
      BufferedImageEdit edit = kind == 2
          ? img -> ImageCodec.resize(ImageCodec.brightened(ImageCodec.cropped(img, w * 3 / 100, h * 3 / 100,
              w - w * 6 / 100, h - h * 6 / 100), 1.05), dw, dh)
          : img -> ImageCodec.resize(img, dw, dh);
      byte[] copy = ImageCodec.jpeg(edit.apply(rendering.image()), kind == 1 ? 0.85f : 0.75f);
      return List.of(original, copy);
    });
  }

  @FunctionalInterface
  private interface BufferedImageEdit {
    java.awt.image.BufferedImage apply(java.awt.image.BufferedImage img);
  }

  private byte[] encode(Product p, Rendering rendering) throws java.io.IOException {
    if (p.row().format().equals("png")) {
      return ImageCodec.png(p.alpha() ? rendering.cutOut() : rendering.image());
    }
    return ImageCodec.jpeg(rendering.image(), options.jpegQuality());
  }

  private static Archetype mainArchetype(String line, SplittableRandom rnd) {
    return switch (line) {
      case "vases" -> rnd.nextDouble() < 0.65 ? Archetype.VASE : Archetype.AMPHORA;
      case "jugs" -> Archetype.JUG;
      case "bottles" -> Archetype.BOTTLE;
      case "bowls" -> Archetype.BOWL;
      case "cups" -> Archetype.CUP;
      default -> Archetype.JAR;
    };
  }

  /** Archetypes a product of this shape may lean toward (t below one half keeps it in its own line). */
  static Archetype[] partners(Archetype a) {
    return switch (a) {
      case VASE -> new Archetype[] {Archetype.AMPHORA, Archetype.BOTTLE, Archetype.JAR};
      case AMPHORA -> new Archetype[] {Archetype.VASE, Archetype.JAR};
      case JUG -> new Archetype[] {Archetype.JAR, Archetype.VASE, Archetype.CUP};
      case BOTTLE -> new Archetype[] {Archetype.VASE, Archetype.JAR};
      case BOWL -> new Archetype[] {Archetype.CUP, Archetype.JAR};
      case CUP -> new Archetype[] {Archetype.BOWL, Archetype.JUG};
      case JAR -> new Archetype[] {Archetype.VASE, Archetype.BOWL, Archetype.JUG};
    };
  }

  /** Exactly the planned share of each line (largest remainders), in a seeded shuffled order. */
  static List<String> lineSequence(int n, SplittableRandom rnd) {
    int[] counts = new int[LINES.length];
    double[] rest = new double[LINES.length];
    int assigned = 0;
    for (int k = 0; k < LINES.length; k++) {
      double exact = n * SHARES[k];
      counts[k] = (int) Math.floor(exact);
      rest[k] = exact - counts[k];
      assigned += counts[k];
    }
    while (assigned < n) {
      int best = 0;
      for (int k = 1; k < LINES.length; k++) {
        if (rest[k] > rest[best]) {
          best = k;
        }
      }
      counts[best]++;
      rest[best] = -1;
      assigned++;
    }
    List<String> seq = new ArrayList<>(n);
    for (int k = 0; k < LINES.length; k++) {
      for (int c = 0; c < counts[k]; c++) {
        seq.add(LINES[k]);
      }
    }
    // Fisher-Yates with the seeded stream (Collections.shuffle would need a java.util.Random).
    for (int i = seq.size() - 1; i > 0; i--) {
      int j = rnd.nextInt(i + 1);
      String tmp = seq.get(i);
      seq.set(i, seq.get(j));
      seq.set(j, tmp);
    }
    return seq;
  }
}
