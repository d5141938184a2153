package org.morphscout.app.cli;

import picocli.CommandLine;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;

/**
 * Prints a usage error (unknown option, missing argument, option value out of range) as one line naming the command
 * and pointing to its {@code --help}, and exits {@link ExitCodes#USAGE}. The full usage text is not repeated: it hides
 * the one line that says what was wrong.
 */
final class UsageErrorHandler implements IParameterExceptionHandler {
  @Override
  public int handleParseException(ParameterException e, String[] args) {
    CommandLine cmd = e.getCommandLine();
    String path = cmd.getCommandSpec().qualifiedName(" ");
    cmd.getErr().println(cmd.getCommandName() + ": " + Terminal.safe(e.getMessage()) + " (see '" + path
        + " --help')");
    return ExitCodes.USAGE;
  }
}
