package org.morphscout.indexer.values;

import java.util.Locale;
import org.morphscout.indexer.MorphscoutException;

/** What the user decided about a pair. */
public enum DecisionKind {
  APPROVED,
  REJECTED;

  public String word() {
    return name().toLowerCase(Locale.ROOT);
  }

  /** Accepts the stored words and the command words ("approve", "reject"). */
  public static DecisionKind parse(String word) {
    return switch (word.toLowerCase(Locale.ROOT)) {
      case "approve", "approved" -> APPROVED;
      case "reject", "rejected" -> REJECTED;
      default -> throw new MorphscoutException("unknown decision '" + word + "': use approve or reject");
    };
  }
}
