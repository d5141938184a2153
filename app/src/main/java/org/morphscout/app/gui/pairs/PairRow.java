package org.morphscout.app.gui.pairs;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.morphscout.app.gui.service.PairSuggestion;

/** One line of the pairs table: a suggestion, the two names, and the user's decision and note as they stand. */
public final class PairRow {
  private final PairSuggestion suggestion;
  private final String nameA;
  private final String nameB;
  private final ReadOnlyStringWrapper decision = new ReadOnlyStringWrapper(this, "decision", "");
  private final ReadOnlyStringWrapper note = new ReadOnlyStringWrapper(this, "note", "");

  public PairRow(PairSuggestion suggestion, String nameA, String nameB) {
    this.suggestion = suggestion;
    this.nameA = nameA;
    this.nameB = nameB;
  }

  public PairSuggestion suggestion() {
    return suggestion;
  }

  public String nameA() {
    return nameA;
  }

  public String nameB() {
    return nameB;
  }

  /** "approved", "rejected" or "" (undecided), as stored in the catalog. */
  public ReadOnlyStringProperty decisionProperty() {
    return decision.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty noteProperty() {
    return note.getReadOnlyProperty();
  }

  void decided(String verdictWord, String noteText) {
    decision.set(verdictWord);
    note.set(noteText == null ? "" : noteText);
  }
}
