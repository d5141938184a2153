package org.morphscout.indexer.pairing;

import java.util.List;

/**
 * One number of the pair score a user may set: its key in settings files and {@code --set}, its default, the values
 * it accepts and what it means. The settings of a sub-score are made by its {@link PairComponent} (keys
 * {@code <component>.weight}, {@code <component>.reason} and the formula's own, e.g. {@code silhouetteMatch.zero});
 * the rest are the general ones of {@link ScoreConfig}. {@link ScoreSettings} lists them all. Immutable.
 *
 * <p>A setting's value lives in a {@link ScoreConfig} at {@code (row, slot)}: the row of its component (its ordinal)
 * or {@link #GENERAL}, the slot its place among that row's settings.
 */
public final class ScoreSetting {
  /** The row of the general settings, after the components' rows. */
  static final int GENERAL = -1;

  private final String key;
  private final double defaultValue;
  private final Bounds bounds;
  private final boolean whole;
  private final String meaning;
  private final List<String> earlierNames;
  private final int row;
  private final int slot;

  ScoreSetting(String key, double defaultValue, Bounds bounds, boolean whole, String meaning,
      List<String> earlierNames, int row, int slot) {
    this.key = key;
    this.defaultValue = defaultValue;
    this.bounds = bounds;
    this.whole = whole;
    this.meaning = meaning;
    this.earlierNames = List.copyOf(earlierNames);
    this.row = row;
    this.slot = slot;
    if (problem(defaultValue) != null) {
      throw new IllegalStateException("the default of " + key + " " + problem(defaultValue));
    }
  }

  /** The key in settings files and on the command line, e.g. {@code silhouetteMatch.weight} or {@code passScore}. */
  public String key() {
    return key;
  }

  public double defaultValue() {
    return defaultValue;
  }

  /** Whether only whole numbers are accepted (a size in pixels). */
  public boolean whole() {
    return whole;
  }

  /** What the setting does, one sentence for a user, with its unit. */
  public String meaning() {
    return meaning;
  }

  /** Earlier keys of this setting, still read but never listed. */
  public List<String> earlierNames() {
    return earlierNames;
  }

  /** The default as the documentation writes it ({@code 3}, {@code 0.95}, {@code 320}). */
  public String defaultText() {
    return number(defaultValue);
  }

  /** The values accepted, as the documentation writes them ({@code 0 to 1}, {@code > 0}, ...). */
  public String allowedText() {
    return (whole ? "whole number " : "") + bounds.text();
  }

  int row() {
    return row;
  }

  int slot() {
    return slot;
  }

  /** Why the value is not accepted, or null when it is. */
  String problem(double value) {
    if (!Double.isFinite(value)) {
      return "must be a finite number, got " + value;
    }
    if (whole && value != Math.rint(value)) {
      return "must be a whole number, got " + number(value);
    }
    return bounds.contains(value) ? null : "must be " + bounds.text() + ", got " + number(value);
  }

  @Override
  public String toString() {
    return key;
  }

  /** A number as short as it can be written without losing anything (no trailing {@code .0}). */
  static String number(double v) {
    return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
  }

  /**
   * The range a setting accepts: from {@code low} to {@code high}, each end included or not; an infinite end is
   * open.
   */
  record Bounds(double low, boolean lowIncluded, double high, boolean highIncluded) {
    /** Greater than 0 (a scale, a tolerance). */
    static Bounds positive() {
      return new Bounds(0, false, Double.POSITIVE_INFINITY, false);
    }

    /** 0 or more (a weight: 0 leaves the sub-score out). */
    static Bounds atLeastZero() {
      return new Bounds(0, true, Double.POSITIVE_INFINITY, false);
    }

    /** Above 0, at most 1 (a factor, a fraction that must not vanish). */
    static Bounds aboveZeroToOne() {
      return new Bounds(0, false, 1, true);
    }

    /** From low to high, both included. */
    static Bounds between(double low, double high) {
      return new Bounds(low, true, high, true);
    }

    boolean contains(double v) {
      return (lowIncluded ? v >= low : v > low) && (highIncluded ? v <= high : v < high);
    }

    String text() {
      if (Double.isInfinite(high)) {
        return (lowIncluded ? ">= " : "> ") + number(low);
      }
      if (lowIncluded && highIncluded) {
        return number(low) + " to " + number(high);
      }
      return (lowIncluded ? ">= " : "> ") + number(low) + " and " + (highIncluded ? "<= " : "< ") + number(high);
    }
  }
}
