package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.util.List;
import java.util.function.Supplier;

/**
 * The result of {@link VesselRenderer#render}: the picture, the same picture without the vessels (the backdrop with
 * the floor shadows), the exact mask of all vessels and of each one, and the antialiased coverage used for
 * compositing. The images are fresh per render; callers may change them. Thread-safe.
 */
public final class Rendering {
  private final BufferedImage image;
  private final Supplier<BufferedImage> plateDrawer;
  private BufferedImage plate;
  private final GroundTruthMask mask;
  private final List<GroundTruthMask> vesselMasks;
  private final byte[] coverage;

  Rendering(BufferedImage image, Supplier<BufferedImage> plateDrawer, GroundTruthMask mask,
      List<GroundTruthMask> vesselMasks, byte[] coverage) {
    this.image = image;
    this.plateDrawer = plateDrawer;
    this.mask = mask;
    this.vesselMasks = List.copyOf(vesselMasks);
    this.coverage = coverage;
  }

  /** The picture, TYPE_INT_RGB. */
  public BufferedImage image() {
    return image;
  }

  /**
   * The backdrop alone (with the vessels' floor shadows and the same grain), TYPE_INT_RGB, same size. Encoded on
   * first use (most callers never need it).
   */
  public synchronized BufferedImage plate() {
    if (plate == null) {
      plate = plateDrawer.get();
    }
    return plate;
  }

  /** Union of all vessels' masks. */
  public GroundTruthMask mask() {
    return mask;
  }

  /** One mask per vessel, in {@link Shot#vessels()} order; each is the whole vessel, even where another hides it. */
  public List<GroundTruthMask> vesselMasks() {
    return vesselMasks;
  }

  /**
   * The vessels cut out of the backdrop: TYPE_INT_ARGB with alpha = antialiased coverage (0 outside, 255 inside),
   * colour = the picture's colour. Edge pixels carry a little backdrop colour, as real cut-outs do.
   */
  public BufferedImage cutOut() {
    int w = image.getWidth();
    int h = image.getHeight();
    int[] rgb = ImageCodec.pixels(image);
    int[] argb = new int[rgb.length];
    for (int i = 0; i < rgb.length; i++) {
      int a = coverage[i] & 0xFF;
      argb[i] = a == 0 ? 0 : (a << 24) | (rgb[i] & 0xFFFFFF);
    }
    return ImageCodec.image(argb, w, h, BufferedImage.TYPE_INT_ARGB);
  }
}
