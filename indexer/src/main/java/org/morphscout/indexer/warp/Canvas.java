package org.morphscout.indexer.warp;

/**
 * The small square grid on which aligned masks and the displacement field live, placed over A's mask.
 *
 * <p>Canvas index {@code i} (pixel centre) sits at A-mask coordinate {@code originX + (i + 0.5) / scale}; the same
 * for y. Displacements on the canvas are in canvas pixels; divide by {@code scale} for A-mask pixels.
 *
 * @param size canvas width and height in pixels
 * @param scale canvas pixels per A-mask pixel, positive
 * @param originX A-mask x of the canvas's left edge
 * @param originY A-mask y of the canvas's top edge
 */
public record Canvas(int size, double scale, double originX, double originY) {

  public Canvas {
    if (size <= 0 || !(scale > 0)) {
      throw new IllegalArgumentException("canvas size and scale must be positive");
    }
  }

  /** A-mask x of canvas index {@code i} (may be fractional). */
  public double maskX(double i) {
    return originX + (i + 0.5) / scale;
  }

  /** A-mask y of canvas index {@code j}. */
  public double maskY(double j) {
    return originY + (j + 0.5) / scale;
  }

  /** Canvas index (fractional) of A-mask x. */
  public double canvasX(double maskX) {
    return (maskX - originX) * scale - 0.5;
  }

  /** Canvas index (fractional) of A-mask y. */
  public double canvasY(double maskY) {
    return (maskY - originY) * scale - 0.5;
  }
}
