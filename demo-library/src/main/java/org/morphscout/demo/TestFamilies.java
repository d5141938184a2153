package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Small pictures with known ground truth for other modules' tests (public API). Every method is a pure function
 * of its arguments: the same seed gives the same pixels. Pictures are small (320 x 320 unless stated) to keep
 * tests fast; a family of ten renders in well under a second.
 */
public final class TestFamilies {
  /** Default width and height of test pictures, pixels. */
  public static final int SIZE = 320;

  private static final VesselRenderer RENDERER = new VesselRenderer();

  private TestFamilies() {}

  /** {@link #silhouetteFamily(long, int, Archetype, Archetype, int, int)} at {@value #SIZE} x {@value #SIZE}. */
  public static List<FamilyItem> silhouetteFamily(long seed, int n, Archetype a, Archetype b) {
    return silhouetteFamily(seed, n, a, b, SIZE, SIZE);
  }

  /**
   * {@code n} pictures of the blend from {@code a} to {@code b} at t = i / (n - 1), in order of t. Glaze,
   * backdrop (a studio sweep), light, scale (pixels per cm) and the foot position are the same for every member,
   * so only the silhouette changes; the scale is chosen so that the largest member fills about 78 % of the frame.
   *
   * @param n number of members, in [2, 200]
   */
  public static List<FamilyItem> silhouetteFamily(long seed, int n, Archetype a, Archetype b, int width,
      int height) {
    if (n < 2 || n > 200) {
      throw new IllegalArgumentException("family size must be in [2, 200]: " + n);
    }
    SplittableRandom rnd = new SplittableRandom(seed);
    Glaze glaze = Glazes.palette().get(rnd.nextInt(Glazes.palette().size()));
    Backdrop backdrop = Backdrop.studioSweep(rnd.nextLong());
    Lighting light = SceneChoices.lighting(rnd);
    double tilt = 0.14;
    VesselProfile pa = a.profile();
    VesselProfile pb = b.profile();
    // Heights and station radii are linear in t and the largest radius is convex in t, so the endpoints bound
    // every member's box.
    double above = Math.max(pa.heightCm() + pa.lipRadiusCm() * tilt, pb.heightCm() + pb.lipRadiusCm() * tilt);
    double below = Math.max(pa.footRadiusCm(), pb.footRadiusCm()) * tilt;
    double left = Math.max(pa.leftExtentCm(), pb.leftExtentCm());
    double right = Math.max(pa.rightExtentCm(), pb.rightExtentCm());
    double scale = Math.min(0.78 * height / (above + below), 0.78 * width / (left + right));
    double footX = width / 2.0 - (right - left) / 2 * scale;
    double floorY = height * 0.53 + (above + below) / 2 * scale - below * scale;
    List<FamilyItem> items = new ArrayList<>(n);
    for (int i = 0; i < n; i++) {
      double t = (double) i / (n - 1);
      VesselProfile p = VesselProfile.blend(pa, pb, t);
      Shot shot = new Shot(width, height, backdrop, light, tilt,
          List.of(new Placement(p, glaze, footX, floorY, scale)));
      Rendering r = RENDERER.render(shot);
      String label = String.format(Locale.ROOT, "family-%s-%s-t%.3f", a.noun(), b.noun(), t);
      items.add(new FamilyItem(label, r.image(), r.mask(), t));
    }
    return items;
  }

  /**
   * {@code m} unrelated pictures at {@value #SIZE} x {@value #SIZE}: random archetypes, glazes, backdrops and
   * lights, each vessel fitted to the frame.
   */
  public static List<DemoImage> distractors(long seed, int m) {
    if (m < 0 || m > 500) {
      throw new IllegalArgumentException("distractor count must be in [0, 500]: " + m);
    }
    SplittableRandom rnd = new SplittableRandom(seed ^ 0xD15L);
    List<DemoImage> out = new ArrayList<>(m);
    Archetype[] all = Archetype.values();
    for (int i = 0; i < m; i++) {
      Archetype a = all[rnd.nextInt(all.length)];
      Glaze g = Glazes.pick(rnd);
      VesselProfile p = a.profile().varied(rnd.nextLong(), 0.05);
      String label = String.format(Locale.ROOT, "distractor-%02d-%s-%s", i, a.noun(), g.name());
      out.add(picture(label, p, g, SceneChoices.backdrop(rnd), SceneChoices.lighting(rnd), 0.7));
    }
    return out;
  }

  /**
   * Four planted pairs (distinct archetypes; within a pair the profile differs by about 2 % and the glaze by a
   * slight colour shift, same backdrop and light) among five others (the remaining archetypes and two half-way
   * blends), each other with its own glaze and backdrop. Order shuffled with the seed.
   */
  public static PlantedPairs plantedPairs(long seed) {
    SplittableRandom rnd = new SplittableRandom(seed ^ 0x9A1L);
    Archetype[] arch = Archetype.values().clone();
    shuffle(arch, rnd);
    Glaze[] glazes = Glazes.palette().toArray(new Glaze[0]);
    shuffle(glazes, rnd);
    List<DemoImage> images = new ArrayList<>();
    List<int[]> planted = new ArrayList<>();
    int glazeIndex = 0;
    for (int k = 0; k < 4; k++) {
      Archetype a = arch[k];
      Glaze g = glazes[glazeIndex++];
      Backdrop bd = Backdrop.studioSweep(rnd.nextLong());
      Lighting light = SceneChoices.lighting(rnd);
      int shift = 8 + rnd.nextInt(8);
      planted.add(new int[] {images.size(), images.size() + 1});
      images.add(picture("planted-" + k + "a-" + a.noun(), a.profile().varied(rnd.nextLong(), 0.02), g, bd, light,
          0.72));
      images.add(picture("planted-" + k + "b-" + a.noun(), a.profile().varied(rnd.nextLong(), 0.02),
          g.shifted(shift, -shift / 2, shift / 2), bd, light, 0.72));
    }
    for (int k = 4; k < arch.length; k++) {
      images.add(picture("other-" + arch[k].noun(), arch[k].profile(), glazes[glazeIndex++],
          SceneChoices.backdrop(rnd), SceneChoices.lighting(rnd), 0.7));
    }
    for (int k = 0; k < 2; k++) {
      Archetype a = arch[4 + k % (arch.length - 4)];
      Archetype b = arch[k];
      images.add(picture("other-" + a.noun() + "-" + b.noun() + "-blend",
          VesselProfile.blend(a.profile(), b.profile(), 0.5), glazes[glazeIndex++], SceneChoices.backdrop(rnd),
          SceneChoices.lighting(rnd), 0.7));
    }
    int[] order = new int[images.size()];
    for (int i = 0; i < order.length; i++) {
      order[i] = i;
    }
    shuffleInts(order, rnd);
    int[] position = new int[order.length];
    List<DemoImage> shuffled = new ArrayList<>();
    for (int i = 0; i < order.length; i++) {
      position[order[i]] = i;
      shuffled.add(images.get(order[i]));
    }
    List<PlantedPairs.Pair> pairs = new ArrayList<>();
    for (int[] p : planted) {
      int x = position[p[0]];
      int y = position[p[1]];
      pairs.add(new PlantedPairs.Pair(Math.min(x, y), Math.max(x, y)));
    }
    return new PlantedPairs(shuffled, pairs);
  }

  /**
   * A 384 x 288 original (JPEG q0.92) and five near-duplicates: resized to 75 % (q0.85), recompressed at q0.60,
   * cropped 4 % per side and brightened 6 % then resized back (q0.88), saved as PNG, halved (q0.90); plus three
   * unrelated pictures on the same kind of backdrop (the same archetype in another glaze and light, and two other
   * archetypes).
   */
  public static NearDuplicateSet nearDuplicates(long seed) {
    SplittableRandom rnd = new SplittableRandom(seed ^ 0xD0BL);
    Archetype[] arch = Archetype.values().clone();
    shuffle(arch, rnd);
    Glaze[] glazes = Glazes.palette().toArray(new Glaze[0]);
    shuffle(glazes, rnd);
    int w = 384;
    int h = 288;
    try {
      BufferedImage src = render(arch[0].profile(), glazes[0].withTexture(GlazeTexture.SPECKLE, rnd.nextLong()),
          Backdrop.studioSweep(rnd.nextLong()), SceneChoices.lighting(rnd), w, h, 0.72).image();
      EncodedImage original = jpeg("original", src, 0.92f, "none");
      BufferedImage decoded = original.image();
      List<EncodedImage> copies = List.of(
          jpeg("resized-0.75", ImageCodec.resize(decoded, w * 3 / 4, h * 3 / 4), 0.85f, "resize 0.75, jpeg q0.85"),
          jpeg("recompressed-q0.60", decoded, 0.60f, "jpeg q0.60"),
          jpeg("cropped-brightened", ImageCodec.resize(ImageCodec.brightened(
              ImageCodec.cropped(decoded, w / 25, h / 25, w - 2 * (w / 25), h - 2 * (h / 25)), 1.06), w, h),
              0.88f, "crop 4 % per side, brighten 6 %, resize back, jpeg q0.88"),
          png("png-copy", decoded, "re-saved as png"),
          jpeg("half-size", ImageCodec.resize(decoded, w / 2, h / 2), 0.90f, "resize 0.5, jpeg q0.90"));
      List<EncodedImage> unrelated = new ArrayList<>();
      unrelated.add(jpeg("unrelated-same-shape-" + glazes[1].name(), render(arch[0].profile(), glazes[1],
          Backdrop.studioSweep(rnd.nextLong()), SceneChoices.lighting(rnd), w, h, 0.72).image(), 0.92f, "none"));
      for (int k = 1; k <= 2; k++) {
        unrelated.add(jpeg("unrelated-" + arch[k].noun(), render(arch[k].profile(), glazes[1 + k],
            Backdrop.studioSweep(rnd.nextLong()), SceneChoices.lighting(rnd), w, h, 0.72).image(), 0.92f, "none"));
      }
      return new NearDuplicateSet(original, copies, unrelated);
    } catch (IOException e) {
      // In-memory encoding and decoding with the JDK's own codecs: failing here means a broken JDK.
      throw new UncheckedIOException("in-memory JPEG/PNG coding failed", e);
    }
  }

  private static EncodedImage jpeg(String label, BufferedImage img, float q, String edit) throws IOException {
    byte[] bytes = ImageCodec.jpeg(img, q);
    return new EncodedImage(label, ImageCodec.decode(bytes), bytes, "jpeg", edit);
  }

  private static EncodedImage png(String label, BufferedImage img, String edit) throws IOException {
    byte[] bytes = ImageCodec.png(img);
    return new EncodedImage(label, ImageCodec.decode(bytes), bytes, "png", edit);
  }

  private static DemoImage picture(String label, VesselProfile p, Glaze g, Backdrop bd, Lighting light,
      double fill) {
    Rendering r = render(p, g, bd, light, SIZE, SIZE, fill);
    return new DemoImage(label, r.image(), r.mask());
  }

  private static Rendering render(VesselProfile p, Glaze g, Backdrop bd, Lighting light, int w, int h,
      double fill) {
    double tilt = 0.14;
    return RENDERER.render(new Shot(w, h, bd, light, tilt, List.of(Placement.fitted(p, g, w, h, fill, tilt, 0))));
  }

  private static <T> void shuffle(T[] a, SplittableRandom rnd) {
    for (int i = a.length - 1; i > 0; i--) {
      int j = rnd.nextInt(i + 1);
      T t = a[i];
      a[i] = a[j];
      a[j] = t;
    }
  }

  private static void shuffleInts(int[] a, SplittableRandom rnd) {
    for (int i = a.length - 1; i > 0; i--) {
      int j = rnd.nextInt(i + 1);
      int t = a[i];
      a[i] = a[j];
      a[j] = t;
    }
  }
}
