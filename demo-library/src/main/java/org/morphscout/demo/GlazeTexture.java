package org.morphscout.demo;

/** Surface pattern of a glaze, laid out in surface coordinates so it wraps around the turned form. */
public enum GlazeTexture {
  /** Even colour with a little thickness variation. */
  PLAIN,
  /** Iron speckle: small dark spots of the accent colour. */
  SPECKLE,
  /** Crackle: a network of fine crazing lines (cell borders of Worley noise) in the accent colour. */
  CRACKLE,
  /** Horizontal bands in the accent colour, as if painted on the wheel. */
  STRIPES,
  /** A second glaze dipped over the top, ending in a band of runs. */
  DRIP_BAND;

  /** Lower-case name for manifests, e.g. {@code "drip-band"}. */
  public String label() {
    return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
  }
}
