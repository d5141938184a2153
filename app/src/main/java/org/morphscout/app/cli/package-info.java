/**
 * The command line: one picocli class per command, each a {@code Callable<Integer>} returning an exit code from
 * {@link org.morphscout.app.cli.ExitCodes}. Data goes to stdout (plain text, or JSON with {@code --json}), progress and
 * diagnostics to stderr. Domain errors become one-line messages through {@link org.morphscout.app.cli.ErrorHandler}.
 */
package org.morphscout.app.cli;
