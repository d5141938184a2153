package org.morphscout.app.gui.common;

/**
 * The browser's panes, in tab order (the constants' names are stored in the window settings, so they stay; the
 * titles are what people see). The inspector is not here: it sits beside every pane.
 */
public enum Pane {
  LIBRARY("Images"),
  CHAINS("Chains"),
  PAIRS("Pairs"),
  WALKTHROUGH("Walk"),
  INDEXING("Indexing");

  private final String title;

  Pane(String title) {
    this.title = title;
  }

  public String title() {
    return title;
  }
}
