package org.morphscout.app.gui.service;

/** Problems worth filtering by in the grid. */
public enum ImageFlag {
  /** The object touches the frame: probably cut off. */
  CUT_OFF("cut off"),
  /** More than one sizeable object was found. */
  SEVERAL_OBJECTS("several objects"),
  /** The silhouette is uncertain: the same threshold as the pair reasons and {@code status} use. */
  LOW_CONFIDENCE("uncertain silhouette"),
  /** The file could not be read or analysed. */
  FAILED("failed");

  private final String label;

  ImageFlag(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }
}
