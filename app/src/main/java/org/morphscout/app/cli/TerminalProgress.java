package org.morphscout.app.cli;

import java.io.PrintStream;
import java.lang.reflect.Method;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.morphscout.indexer.progress.ProgressListener;

/**
 * A progress bar on stderr (count, rate, ETA) for interactive terminals; one bar per phase. Use {@link #forTerminal}
 * to get a silent listener when output is not a terminal or is JSON.
 */
final class TerminalProgress implements ProgressListener {
  private final PrintStream err;
  private ProgressBar bar;

  private TerminalProgress(PrintStream err) {
    this.err = err;
  }

  /** A bar when stderr is an interactive terminal and {@code quiet} is false, else a listener that does nothing. */
  static ProgressListener forTerminal(boolean quiet) {
    return !quiet && isTerminal() ? new TerminalProgress(System.err) : ProgressListener.NONE;
  }

  /** Whether the process talks to a terminal (Console.isTerminal() on Java 22+, console presence on 21). */
  static boolean isTerminal() {
    java.io.Console console = System.console();
    if (console == null) {
      return false;
    }
    try {
      Method m = java.io.Console.class.getMethod("isTerminal");
      return (Boolean) m.invoke(console);
    } catch (ReflectiveOperationException e) {
      return true;
    }
  }

  @Override
  public synchronized void phase(String name, long total) {
    closeBar();
    bar = new ProgressBarBuilder()
        .setTaskName(name)
        .setInitialMax(total)
        .setStyle(ProgressBarStyle.COLORFUL_UNICODE_BLOCK)
        .setConsumer(new ConsoleProgressBarConsumer(err))
        .setUnit(" img", 1)
        .showSpeed()
        .setUpdateIntervalMillis(200)
        .build();
  }

  @Override
  public synchronized void progressed(long done, String item) {
    if (bar != null) {
      bar.stepTo(done);
    }
  }

  @Override
  public synchronized void finished() {
    closeBar();
  }

  private void closeBar() {
    if (bar != null) {
      bar.close();
      bar = null;
    }
  }
}
