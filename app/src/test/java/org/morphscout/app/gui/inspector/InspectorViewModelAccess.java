package org.morphscout.app.gui.inspector;

import org.morphscout.indexer.silhouette.Silhouette;

/** Test access to the inspector's package-private helpers. */
public final class InspectorViewModelAccess {
  private InspectorViewModelAccess() {}

  public static String uncertainNote(Silhouette s) {
    return InspectorViewModel.uncertainNote(s);
  }
}
