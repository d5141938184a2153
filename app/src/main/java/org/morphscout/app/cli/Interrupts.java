package org.morphscout.app.cli;

import java.io.PrintWriter;
import org.morphscout.indexer.progress.CancellationToken;
import sun.misc.Signal;
import sun.misc.SignalHandler;

/**
 * Turns Ctrl-C into a clean cancellation while long work runs: the first press cancels the token (finished work is
 * kept, the command returns normally with exit code 130); a second press ends the process at once.
 *
 * <p>Why not a shutdown hook: on SIGINT the JVM runs every shutdown hook at the same time, and the native inference
 * engine's own hooks free their sessions while a worker may still be inside one, which crashes the process. Handling
 * the signal ourselves keeps the JVM alive until the work has stopped.
 */
final class Interrupts implements AutoCloseable {
  private static final Signal INT = new Signal("INT");

  private final SignalHandler previous;

  private Interrupts(CancellationToken token, PrintWriter err) {
    previous = Signal.handle(INT, signal -> {
      if (token.isCancelled()) {
        Runtime.getRuntime().halt(ExitCodes.CANCELLED);
      }
      err.println();
      err.println("stopping after the images in progress (press Ctrl-C again to quit at once) ...");
      err.flush();
      token.cancel();
    });
  }

  /** Cancels {@code token} on Ctrl-C until closed. */
  static Interrupts cancelOnCtrlC(CancellationToken token, PrintWriter err) {
    return new Interrupts(token, err);
  }

  @Override
  public void close() {
    Signal.handle(INT, previous);
  }
}
