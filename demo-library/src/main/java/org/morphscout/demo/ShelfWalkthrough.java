package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * The walkthrough set in {@code shelves/}: views of one studio shelf from a camera that pans slowly to the right
 * while the daylight slowly brightens, so the views have one true smooth order. File names carry a shuffled
 * number; the true position is the manifest's {@code shelf_order}.
 */
final class ShelfWalkthrough {
  static final int VIEW_WIDTH = 1024;
  static final int VIEW_HEIGHT = 768;
  /** Pan between neighbouring views, pixels: about 5.5 % of the view width. */
  static final int STEP_PX = 56;

  private final DemoOptions options;

  ShelfWalkthrough(DemoOptions options) {
    this.options = options;
  }

  LibraryJob plan() {
    int views = options.shelfViews();
    long seed = Noise.mix(options.seed() ^ 0x5E1FL);
    SplittableRandom rnd = new SplittableRandom(seed);
    int panoWidth = VIEW_WIDTH + (views - 1) * STEP_PX;
    Backdrop shelf = new Backdrop(BackdropKind.SHELF, 0xE6E1D8, 0x8E6442, 0.56, rnd.nextLong());
    double tilt = 0.12;
    double floorY = VIEW_HEIGHT * 0.66;
    // One scale for the whole shelf, so the pieces keep their true relative sizes (a 30 cm vase ~ 40 % of the view).
    double pxPerCm = VIEW_HEIGHT * 0.40 / 30;
    List<Placement> vessels = new ArrayList<>();
    Archetype[] all = Archetype.values();
    double x = 110;
    while (x < panoWidth - 60) {
      Archetype a = all[rnd.nextInt(all.length)];
      VesselProfile p = a.profile().varied(rnd.nextLong(), 0.05);
      double left = p.leftExtentCm() * pxPerCm;
      double right = p.rightExtentCm() * pxPerCm;
      vessels.add(new Placement(p, Glazes.pick(rnd), x + left, floorY, pxPerCm));
      x += left + right + 40 + 90 * rnd.nextDouble();
    }
    Shot pano = new Shot(panoWidth, VIEW_HEIGHT, shelf, new Lighting(-55, 30, 1.0, 0.3, 0.2, 1.0), tilt, vessels);
    int[] labels = shuffledLabels(views, rnd);
    List<ManifestRow> rows = new ArrayList<>();
    for (int i = 0; i < views; i++) {
      String file = String.format(Locale.ROOT, "shelves/studio-shelf-%02d.jpg", labels[i] + 1);
      rows.add(new ManifestRow(file, "shelves", "", "", 0, "", "", shelf.kind().label(), VIEW_WIDTH, VIEW_HEIGHT,
          "jpeg", false, "", "", i, seed));
    }
    return new LibraryJob(rows, () -> {
      BufferedImage wide = new VesselRenderer().render(pano).image();
      List<byte[]> files = new ArrayList<>();
      for (int i = 0; i < views; i++) {
        BufferedImage view = ImageCodec.cropped(wide, i * STEP_PX, 0, VIEW_WIDTH, VIEW_HEIGHT);
        // Daylight rising by about 1 % per view.
        double gain = 0.92 + 0.16 * i / Math.max(1, views - 1);
        files.add(ImageCodec.jpeg(ImageCodec.brightened(view, gain), options.jpegQuality()));
      }
      return files;
    });
  }

  private static int[] shuffledLabels(int n, SplittableRandom rnd) {
    int[] labels = new int[n];
    for (int i = 0; i < n; i++) {
      labels[i] = i;
    }
    for (int i = n - 1; i > 0; i--) {
      int j = rnd.nextInt(i + 1);
      int t = labels[i];
      labels[i] = labels[j];
      labels[j] = t;
    }
    return labels;
  }
}
