package org.morphscout.app.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.NoSuchFileException;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;

/**
 * Maps exceptions from commands to one message on stderr and an exit code. User errors never print a stack trace;
 * unexpected ones print it only with {@code -v}.
 */
final class ErrorHandler implements IExecutionExceptionHandler {
  private static final Logger LOG = LoggerFactory.getLogger(ErrorHandler.class);

  @Override
  public int handleExecutionException(Exception e, CommandLine cmd, ParseResult parseResult) {
    String name = cmd.getCommandName();
    Throwable t = e instanceof UncheckedIOException u ? u.getCause() : e;
    if (t instanceof CancellationToken.CancelledException) {
      cmd.getErr().println(name + ": cancelled; finished work is kept.");
      return ExitCodes.CANCELLED;
    }
    if (t instanceof MorphscoutException) {
      cmd.getErr().println(name + ": " + Terminal.safe(t.getMessage()));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    if (t instanceof NoSuchFileException nsf) {
      cmd.getErr().println(name + ": file not found: " + Terminal.safe(nsf.getFile()));
      return ExitCodes.ERROR;
    }
    if (t instanceof IOException) {
      cmd.getErr().println(name + ": " + t.getClass().getSimpleName() + ": " + t.getMessage());
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    cmd.getErr().println(name + ": unexpected error: " + t + " (run with -v for details)");
    LOG.info("unexpected error", t);
    return ExitCodes.ERROR;
  }
}
