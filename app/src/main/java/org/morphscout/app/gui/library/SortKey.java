package org.morphscout.app.gui.library;

/** How the grid is ordered. */
public enum SortKey {
  NAME("name"),
  FOLDER("folder"),
  SIZE("file size"),
  /** Similarity to the search image; only meaningful while a similarity search is shown. */
  SCORE("similarity");

  private final String label;

  SortKey(String label) {
    this.label = label;
  }

  @Override
  public String toString() {
    return label;
  }
}
