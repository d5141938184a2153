package org.morphscout.app.gui.service;

/** How a suggested pair fares in screening: good to morph, usable with care, or not worth it. */
public enum PairVerdict {
  PASS,
  WARN,
  FAIL
}
