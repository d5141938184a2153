package org.morphscout.indexer.pairing;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** The pair's verdict; written lower-case ("pass", "warn", "fail") wherever it is output. */
public enum Verdict {
  /** Likely to morph well. */
  PASS,
  /** Usable with care; see the reasons. */
  WARN,
  /** Unlikely to morph well, or could not be judged. */
  FAIL;

  /** The lower-case label used in output. */
  @JsonValue
  public String label() {
    return name().toLowerCase(Locale.ROOT);
  }

  @Override
  public String toString() {
    return label();
  }
}
