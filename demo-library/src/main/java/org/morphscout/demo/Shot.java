package org.morphscout.demo;

import java.util.List;
import java.util.Objects;

/**
 * Everything needed to draw one picture.
 *
 * @param width picture width, pixels, in [16, 8192]
 * @param height picture height, pixels, in [16, 8192]
 * @param backdrop the backdrop
 * @param lighting the light
 * @param cameraTilt how much the camera looks down, as the height-to-width ratio of a horizontal circle's image
 *     (sine of the elevation angle), in [0, 0.5]; 0.15 is a typical product shot
 * @param vessels the vessels, drawn in the order given (later ones in front)
 */
public record Shot(int width, int height, Backdrop backdrop, Lighting lighting, double cameraTilt,
    List<Placement> vessels) {
  public Shot {
    if (width < 16 || height < 16 || width > 8192 || height > 8192) {
      throw new IllegalArgumentException("picture size must be within 16..8192: " + width + "x" + height);
    }
    Objects.requireNonNull(backdrop, "backdrop");
    Objects.requireNonNull(lighting, "lighting");
    if (!(cameraTilt >= 0 && cameraTilt <= 0.5)) {
      throw new IllegalArgumentException("cameraTilt must be in [0, 0.5]: " + cameraTilt);
    }
    vessels = List.copyOf(vessels);
  }
}
