package org.morphscout.indexer.silhouette;

/**
 * Settings of {@link BorderModelSilhouettes}. Pixel values are at the working resolution.
 *
 * @param workingLongSide long side, in pixels, of the reduced image the model works on. Default 256: fast (a few ms)
 *     and fine enough for shape search; raise it for thin objects. Range 64..2048.
 * @param bandFraction width of the border band that samples the background, as a fraction of the short side.
 *     Default 0.05. Wider bands see more background but more of an object close to the frame. Range 0.01..0.25.
 * @param maxModes colour modes the band may be clustered into (1..3). Default 3: wall, floor and a shadow.
 * @param minModeShare a colour mode must hold at least this share of the band to count as background, so an object
 *     cut by the frame does not become a background colour. Default 0.15. Range 0..0.5.
 * @param surfaceDegree degree of the smooth background surface fitted per Lab channel over the band: 1 (plane) or 2
 *     (quadratic). Default 2, which also follows vignetting and curved studio sweeps.
 * @param smoothingSigma Gaussian blur of the reduced Lab image before distances, in working pixels, so fine texture
 *     (fabric, paper, noise) averages out instead of becoming object. Default 1.0. Range 0..8.
 * @param openRadius disk radius of the opening that removes specks, in working pixels. Default 1. Range 0..16.
 * @param closeRadius disk radius of the closing that seals small gaps, in working pixels. Default 2. Range 0..16.
 * @param minComponentFraction components below this fraction of the largest are not counted. Default 0.1.
 * @param minContrast smallest CIELAB distance (Delta E*ab, 1976) from the background that can be object. Default 6:
 *     about three just-noticeable differences, below which "objects" are mostly shading.
 * @param minNormalisedDistance smallest distance, in units of the band's robust spread, that can be object. Default
 *     3.0. Together with {@code minContrast} it makes a plain or purely textured image come out empty.
 */
public record BorderModelOptions(
    int workingLongSide,
    double bandFraction,
    int maxModes,
    double minModeShare,
    int surfaceDegree,
    double smoothingSigma,
    int openRadius,
    int closeRadius,
    double minComponentFraction,
    double minContrast,
    double minNormalisedDistance) {

  /** The documented defaults. */
  public static final BorderModelOptions DEFAULTS =
      new BorderModelOptions(256, 0.05, 3, 0.15, 2, 1.0, 1, 2, 0.1, 6.0, 3.0);

  public BorderModelOptions {
    require(workingLongSide >= 64 && workingLongSide <= 2048, "workingLongSide must be in 64..2048");
    require(bandFraction >= 0.01 && bandFraction <= 0.25, "bandFraction must be in [0.01, 0.25]");
    require(maxModes >= 1 && maxModes <= 3, "maxModes must be in 1..3");
    require(minModeShare >= 0 && minModeShare <= 0.5, "minModeShare must be in [0, 0.5]");
    require(surfaceDegree == 1 || surfaceDegree == 2, "surfaceDegree must be 1 or 2");
    require(smoothingSigma >= 0 && smoothingSigma <= 8, "smoothingSigma must be in [0, 8]");
    require(openRadius >= 0 && openRadius <= 16, "openRadius must be in 0..16");
    require(closeRadius >= 0 && closeRadius <= 16, "closeRadius must be in 0..16");
    require(minComponentFraction >= 0 && minComponentFraction <= 1, "minComponentFraction must be in [0, 1]");
    require(minContrast >= 0 && minContrast <= 100, "minContrast must be in [0, 100]");
    require(minNormalisedDistance >= 0 && minNormalisedDistance <= 100, "minNormalisedDistance must be in [0, 100]");
  }

  public static BorderModelOptions defaults() {
    return DEFAULTS;
  }

  private static void require(boolean ok, String message) {
    if (!ok) {
      throw new IllegalArgumentException(message);
    }
  }
}
