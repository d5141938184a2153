package org.morphscout.demo;

import java.util.Objects;

/**
 * Where one vessel stands in a picture.
 *
 * @param profile the vessel's shape
 * @param glaze its glaze
 * @param footX x of the vessel's axis, pixels (may lie outside the frame)
 * @param floorY y of the centre of the foot's contact ellipse, pixels (may lie outside the frame)
 * @param pxPerCm scale, pixels per centimetre, &gt; 0
 */
public record Placement(VesselProfile profile, Glaze glaze, double footX, double floorY, double pxPerCm) {
  public Placement {
    Objects.requireNonNull(profile, "profile");
    Objects.requireNonNull(glaze, "glaze");
    if (!Double.isFinite(footX) || !Double.isFinite(floorY) || !(pxPerCm > 0) || Double.isInfinite(pxPerCm)) {
      throw new IllegalArgumentException("placement needs finite position and a positive scale");
    }
  }

  /**
   * A product-shot placement: the vessel's bounding box (handles, rim and foot ellipses included) is scaled to
   * {@code fill} of the frame's limiting side and centred, a little below the middle as product photos usually are.
   *
   * @param fill fraction of the limiting frame side the vessel spans, in (0, 1.5]
   * @param cameraTilt the shot's camera tilt (see {@link Shot#cameraTilt()})
   * @param offsetX horizontal shift of the centre as a fraction of the width (0 = centred)
   */
  public static Placement fitted(VesselProfile profile, Glaze glaze, int width, int height, double fill,
      double cameraTilt, double offsetX) {
    if (!(fill > 0 && fill <= 1.5)) {
      throw new IllegalArgumentException("fill must be in (0, 1.5]: " + fill);
    }
    double above = profile.heightCm() + profile.lipRadiusCm() * cameraTilt;
    double below = profile.footRadiusCm() * cameraTilt;
    double left = profile.leftExtentCm();
    double right = profile.rightExtentCm();
    double scale = Math.min(fill * height / (above + below), fill * width / (left + right));
    double footX = width * (0.5 + offsetX) - (right - left) / 2 * scale;
    double boxCentreY = height * 0.53;
    double floorY = boxCentreY + (above + below) / 2 * scale - below * scale;
    return new Placement(profile, glaze, footX, floorY, scale);
  }
}
