package org.morphscout.demo;

import java.util.Locale;

/** What the vessel stands in front of. */
public enum BackdropKind {
  /** Seamless paper sweep: wall colour curving into floor colour, soft light falloff. The usual product shot. */
  STUDIO_SWEEP,
  /** Two-colour linear gradient at a seeded angle. */
  GRADIENT,
  /** Linen cloth: fine warp and weft threads over soft folds. */
  LINEN,
  /** Plain wall behind a wooden table top with horizontal grain. */
  WOOD_TABLE,
  /** Plaster wall, a wooden shelf board and its front edge: the studio shelf of the walkthrough set. */
  SHELF;

  /** Lower-case name for manifests, e.g. {@code "studio-sweep"}. */
  public String label() {
    return name().toLowerCase(Locale.ROOT).replace('_', '-');
  }
}
