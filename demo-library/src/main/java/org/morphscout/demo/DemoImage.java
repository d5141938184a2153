package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.util.Objects;

/**
 * A test picture with its exact vessel mask.
 *
 * @param label readable id, e.g. {@code distractor-03-jar-cobalt}
 * @param image the picture, TYPE_INT_RGB
 * @param mask exact ground-truth mask of the vessel(s)
 */
public record DemoImage(String label, BufferedImage image, GroundTruthMask mask) {
  public DemoImage {
    Objects.requireNonNull(label, "label");
    Objects.requireNonNull(image, "image");
    Objects.requireNonNull(mask, "mask");
  }
}
