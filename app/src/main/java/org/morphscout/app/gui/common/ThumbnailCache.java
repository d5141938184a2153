package org.morphscout.app.gui.common;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.LinkedBlockingDeque;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.LongFunction;
import javafx.application.Platform;
import javafx.scene.image.Image;
import org.morphscout.app.gui.task.FxTaskRunner;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Decoded thumbnails for the grid and filmstrips. Decoding happens on two named daemon threads; requests are served
 * newest first (a LIFO queue), so while the user scrolls the rows now on screen load before the ones scrolled past,
 * and a request whose tile already shows another image is dropped before decoding. At most {@code capacity} images
 * are kept (at 144 px about 80 KB each, so 1,500 take ~120 MB).
 */
public final class ThumbnailCache implements AutoCloseable {
  private static final Logger LOG = LoggerFactory.getLogger(ThumbnailCache.class);

  private final LruCache<Long, Image> cache;
  private final LongFunction<Optional<Path>> files;
  private final double size;
  private final ThreadPoolExecutor pool;

  /**
   * @param files where the thumbnail file of an image id is (called on the loader threads)
   * @param size decoded long side in pixels
   */
  public ThumbnailCache(LongFunction<Optional<Path>> files, double size, int capacity) {
    this.cache = new LruCache<>(capacity);
    this.files = files;
    this.size = size;
    this.pool = new ThreadPoolExecutor(2, 2, 30, TimeUnit.SECONDS, new LifoQueue(),
        FxTaskRunner.namedDaemons("morphscout-thumbs-"));
  }

  /** The cached image, if decoded already. */
  public Optional<Image> cached(long id) {
    return cache.get(id);
  }

  /**
   * Delivers the thumbnail of {@code id} to {@code sink} on the UI thread: at once when cached, else after decoding,
   * unless {@code stillWanted} (checked on the loader thread) says the requester moved on.
   */
  public void load(long id, BooleanSupplier stillWanted, Consumer<Image> sink) {
    Optional<Image> hit = cache.get(id);
    if (hit.isPresent()) {
      sink.accept(hit.get());
      return;
    }
    pool.execute(() -> {
      if (!stillWanted.getAsBoolean()) {
        return;
      }
      Optional<Image> img = decode(id);
      img.ifPresent(i -> {
        cache.put(id, i);
        Platform.runLater(() -> sink.accept(i));
      });
    });
  }

  private Optional<Image> decode(long id) {
    Optional<Path> file = files.apply(id);
    if (file.isEmpty()) {
      return Optional.empty();
    }
    try (InputStream in = Files.newInputStream(file.get())) {
      Image img = new Image(in, size, size, true, true);
      return img.isError() ? Optional.empty() : Optional.of(img);
    } catch (IOException e) {
      LOG.debug("cannot read thumbnail {}: {}", file.get(), e.getMessage());
      return Optional.empty();
    }
  }

  /** Drops every cached image (after another catalog was opened). */
  public void clear() {
    pool.getQueue().clear();
    cache.clear();
  }

  @Override
  public void close() {
    pool.shutdownNow();
  }

  /** A blocking queue that hands out the newest task first. */
  private static final class LifoQueue extends LinkedBlockingDeque<Runnable> {
    private static final long serialVersionUID = 1L;

    @Override
    public boolean offer(Runnable r) {
      return offerFirst(r);
    }
  }
}
