package org.morphscout.app.cli;

import java.util.Locale;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/**
 * Range checks for option values. A value out of range is a usage error (exit 2) whose message names the option, the
 * range and the value the user typed, and nothing else (no internal ids or class names). Commands call these before
 * they open the catalog, so a bad option never touches anything.
 */
final class OptionCheck {
  private final CommandSpec spec;

  private OptionCheck(CommandSpec spec) {
    this.spec = spec;
  }

  /** Checks for the command described by {@code spec}. */
  static OptionCheck of(CommandSpec spec) {
    return new OptionCheck(spec);
  }

  /** Requires {@code min <= value <= max}. */
  OptionCheck between(String option, long value, long min, long max) {
    if (value < min || value > max) {
      throw fail(option + " must be " + (max == Long.MAX_VALUE || max == Integer.MAX_VALUE ? "at least " + min
          : "from " + min + " to " + max) + ", got " + value);
    }
    return this;
  }

  /** Requires a finite {@code min <= value <= max} (NaN and infinities are refused). */
  OptionCheck between(String option, double value, double min, double max) {
    if (!Double.isFinite(value) || value < min || value > max) {
      throw fail(option + " must be a number from " + plain(min) + " to " + plain(max) + ", got " + plain(value));
    }
    return this;
  }

  /** Requires a finite {@code 0 < value <= max}. */
  OptionCheck positive(String option, double value, double max) {
    if (!Double.isFinite(value) || value <= 0 || value > max) {
      throw fail(option + " must be a number above 0 and at most " + plain(max) + ", got " + plain(value));
    }
    return this;
  }

  /** A usage error naming the command line, for checks that are not a plain range. */
  ParameterException fail(String message) {
    return new ParameterException(spec.commandLine(), message);
  }

  private static String plain(double v) {
    if (Double.isNaN(v) || Double.isInfinite(v)) {
      return String.valueOf(v);
    }
    return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.format(Locale.ROOT, "%s", v);
  }
}
