package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.util.Objects;

/**
 * One member of a silhouette family: the vessel blended {@code t} of the way from archetype A to archetype B, with
 * everything else (glaze, backdrop, light, scale, position) held fixed.
 *
 * @param label readable id, e.g. {@code family-bottle-vase-t0.250}
 * @param image the picture, TYPE_INT_RGB
 * @param mask exact ground-truth mask
 * @param t the blend parameter, in [0, 1]
 */
public record FamilyItem(String label, BufferedImage image, GroundTruthMask mask, double t) {
  public FamilyItem {
    Objects.requireNonNull(label, "label");
    Objects.requireNonNull(image, "image");
    Objects.requireNonNull(mask, "mask");
    if (!(t >= 0 && t <= 1)) {
      throw new IllegalArgumentException("t must be in [0, 1]: " + t);
    }
  }
}
