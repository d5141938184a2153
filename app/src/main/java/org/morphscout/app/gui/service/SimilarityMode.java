package org.morphscout.app.gui.service;

/** Which vector "similar" means: how the image looks, or the outline of its object. */
public enum SimilarityMode {
  APPEARANCE("appearance"),
  SHAPE("shape");

  private final String label;

  SimilarityMode(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }
}
