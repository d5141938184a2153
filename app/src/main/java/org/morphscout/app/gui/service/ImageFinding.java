package org.morphscout.app.gui.service;

/**
 * Problems found in an image ("findings"), worth filtering by in the grid and shown on its tile and in the
 * inspector. The order is the order of importance: a tile's note strip names the first one an image has.
 */
public enum ImageFinding {
  /** The file is no longer found under its folder (kept with its decisions in case it comes back). */
  MISSING("missing"),
  /** The file could not be read or analysed. */
  FAILED("failed"),
  /** The silhouette is uncertain: {@code Silhouette.uncertain()}, the threshold the pair reasons and status use. */
  UNCERTAIN("uncertain silhouette"),
  /** The object touches the frame: probably cut off. */
  CUT_OFF("cut off"),
  /** More than one sizeable object was found. */
  SEVERAL_OBJECTS("several objects");

  private final String label;

  ImageFinding(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }
}
