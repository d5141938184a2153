package org.morphscout.app.gui;

/** The browser's panes, in tab order. The inspector is not here: it sits beside every pane. */
public enum Pane {
  LIBRARY("Library"),
  CHAINS("Chains"),
  PAIRS("Pairs"),
  WALKTHROUGH("Walkthrough"),
  INDEXING("Indexing");

  private final String title;

  Pane(String title) {
    this.title = title;
  }

  public String title() {
    return title;
  }
}
