package org.morphscout.app.cli;

/** The exit codes of every command; listed in each command's {@code --help}. */
public final class ExitCodes {
  /** Everything worked. */
  public static final int OK = 0;
  /** The work finished, but some files failed (index) or some pairs failed screening with --strict. */
  public static final int FINISHED_WITH_FAILURES = 1;
  /** The command line was wrong (unknown option, missing argument). */
  public static final int USAGE = 2;
  /** The work could not be done: catalog in use, damaged or newer, image not found, bad input. */
  public static final int ERROR = 3;
  /** The work was cancelled (Ctrl-C); what was finished is kept. */
  public static final int CANCELLED = 130;

  /** The exit code list shown by {@code --help}, in picocli's "key:description" form. */
  public static final String[] HELP = {
    "0:success",
    "1:finished, but with failures (failed files, or failed pairs with --strict)",
    "2:usage error (wrong options or arguments)",
    "3:could not do the work (catalog in use, damaged or newer; image not found; bad input)",
    "130:cancelled (Ctrl-C); finished work is kept",
  };

  private ExitCodes() {}
}
