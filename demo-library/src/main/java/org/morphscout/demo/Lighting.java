package org.morphscout.demo;

/**
 * One key light plus ambient fill.
 *
 * @param azimuthDeg direction the key light comes from, degrees: -90 = from the left, 0 = from the camera,
 *     +90 = from the right; range [-90, 90]
 * @param elevationDeg height of the key light above the horizontal, degrees in [0, 80]
 * @param intensity strength of the key light, in [0, 2]; 1 = normal studio exposure
 * @param ambient share of light that comes from everywhere (fill), in [0, 1]
 * @param warmth colour temperature shift, in [-1, 1]: negative = bluish daylight, positive = warm tungsten
 * @param exposure overall brightness multiplier on the final picture, in (0, 2]; 1 = correct exposure
 */
public record Lighting(double azimuthDeg, double elevationDeg, double intensity, double ambient, double warmth,
    double exposure) {
  /** Soft key from the upper left, the default product-shot light. */
  public static final Lighting STUDIO = new Lighting(-40, 35, 1.0, 0.28, 0.1, 1.0);

  public Lighting {
    check(azimuthDeg, -90, 90, "azimuthDeg");
    check(elevationDeg, 0, 80, "elevationDeg");
    check(intensity, 0, 2, "intensity");
    check(ambient, 0, 1, "ambient");
    check(warmth, -1, 1, "warmth");
    if (!(exposure > 0 && exposure <= 2)) {
      throw new IllegalArgumentException("exposure must be in (0, 2]: " + exposure);
    }
  }

  /** The same light with another exposure. */
  public Lighting withExposure(double newExposure) {
    return new Lighting(azimuthDeg, elevationDeg, intensity, ambient, warmth, newExposure);
  }

  private static void check(double v, double lo, double hi, String name) {
    if (!(v >= lo && v <= hi)) {
      throw new IllegalArgumentException(name + " must be in [" + lo + ", " + hi + "]: " + v);
    }
  }
}
