package org.morphscout.app.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import org.morphscout.indexer.DiskSpace;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.progress.CancellationToken;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine;

/**
 * Maps exceptions from commands to one message on stderr and an exit code. User errors never print a stack trace;
 * unexpected ones print it only with {@code -v}. Text from outside (paths, messages) is passed through
 * {@link Terminal#safe} so it cannot drive the terminal.
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
    if (DiskSpace.isFull(t) && !(t instanceof MorphscoutException)) {
      cmd.getErr().println(name + ": " + Terminal.safe(DiskSpace.full(catalogDir(cmd))));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    if (t instanceof MorphscoutException) {
      cmd.getErr().println(name + ": " + Terminal.safe(t.getMessage()));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    if (t instanceof java.nio.file.InvalidPathException bad) {
      // A NUL in the name, or (under a non-UTF-8 locale) a character the system's file-name encoding cannot hold.
      cmd.getErr().println(name + ": not a usable path: " + Terminal.safe(bad.getInput()) + " (" + bad.getReason()
          + "; non-ASCII names need a UTF-8 locale, e.g. LC_ALL=C.UTF-8, which the morphscout launcher sets)");
      return ExitCodes.ERROR;
    }
    if (t instanceof NoSuchFileException nsf) {
      cmd.getErr().println(name + ": file not found: " + Terminal.safe(nsf.getFile()));
      return ExitCodes.ERROR;
    }
    if (t instanceof AccessDeniedException denied) {
      cmd.getErr().println(name + ": permission denied: " + Terminal.safe(denied.getFile()));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    if (t instanceof FileSystemException fs) {
      String reason = fs.getReason() == null ? fs.getClass().getSimpleName() : fs.getReason();
      cmd.getErr().println(name + ": " + Terminal.safe(fs.getFile()) + ": " + Terminal.safe(reason));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    if (t instanceof IOException) {
      cmd.getErr().println(name + ": " + t.getClass().getSimpleName() + ": " + Terminal.safe(t.getMessage()));
      LOG.debug("details", t);
      return ExitCodes.ERROR;
    }
    cmd.getErr().println(name + ": unexpected error: " + Terminal.safe(String.valueOf(t))
        + " (run with -v for details)");
    LOG.info("unexpected error", t);
    return ExitCodes.ERROR;
  }

  /** The catalog folder the command line names (the place a full disk most likely concerns). */
  private static java.nio.file.Path catalogDir(CommandLine cmd) {
    CommandLine top = cmd;
    while (top.getParent() != null) {
      top = top.getParent();
    }
    return top.getCommand() instanceof MorphscoutCommand root ? root.catalogDir()
        : java.nio.file.Path.of(".").toAbsolutePath();
  }
}
