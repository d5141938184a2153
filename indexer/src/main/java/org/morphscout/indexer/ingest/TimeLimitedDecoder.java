package org.morphscout.indexer.ingest;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Wraps a decoder so that one pathological file cannot stall indexing: each decode runs on a worker thread and is
 * given up after the time limit, reported as {@link ReadFailure#TIMED_OUT}. The worker is interrupted, which makes
 * {@link ImageIoDecoder} abort its reader at the next progress callback; a decoder that ignores interrupts keeps
 * its (daemon) thread until it finishes, but the caller moves on.
 *
 * <p>Thread-safe. Worker threads are daemons named {@code morphscout-decode-N}. Close to stop them.
 */
public final class TimeLimitedDecoder implements ImageDecoder, AutoCloseable {
  private static final AtomicInteger THREAD_NUMBER = new AtomicInteger();

  private final ImageDecoder delegate;
  private final Duration limit;
  private final ExecutorService workers;

  /**
   * @param limit wall-clock limit per file; {@link Duration#ZERO} decodes on the caller's thread without a limit
   */
  public TimeLimitedDecoder(ImageDecoder delegate, Duration limit) {
    this.delegate = Objects.requireNonNull(delegate, "delegate");
    this.limit = Objects.requireNonNull(limit, "limit");
    if (limit.isNegative()) {
      throw new IllegalArgumentException("limit must not be negative, got " + limit);
    }
    ThreadFactory factory = r -> {
      Thread t = new Thread(r, "morphscout-decode-" + THREAD_NUMBER.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
    this.workers = Executors.newCachedThreadPool(factory);
  }

  /**
   * The default decoder ({@link OpenCvJpegDecoder#create}: fast JPEGs, ImageIO for the rest) with {@code options},
   * limited to {@link DecodeOptions#perFileTimeLimit()}.
   */
  public TimeLimitedDecoder(DecodeOptions options) {
    this(OpenCvJpegDecoder.create(options), options.perFileTimeLimit());
  }

  @Override
  public DecodedImage decode(Path file) throws IOException {
    if (limit.isZero()) {
      return delegate.decode(file);
    }
    Future<DecodedImage> future = workers.submit(() -> delegate.decode(file));
    try {
      return future.get(limit.toMillis(), TimeUnit.MILLISECONDS);
    } catch (TimeoutException e) {
      future.cancel(true);
      throw new ImageReadException(
          file, ReadFailure.TIMED_OUT, "decoding took longer than the " + describe(limit) + " limit", e);
    } catch (InterruptedException e) {
      future.cancel(true);
      Thread.currentThread().interrupt();
      throw new ImageReadException(file, ReadFailure.TIMED_OUT, "decoding stopped (time limit or cancel)", e);
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof IOException io) {
        throw io;
      }
      if (cause instanceof RuntimeException re) {
        throw re;
      }
      if (cause instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(cause);
    }
  }

  private static String describe(Duration d) {
    long ms = d.toMillis();
    return ms % 1000 == 0 ? (ms / 1000) + " s" : ms + " ms";
  }

  /** Stops the worker threads (interrupting decodes in progress). */
  @Override
  public void close() {
    workers.shutdownNow();
  }
}
