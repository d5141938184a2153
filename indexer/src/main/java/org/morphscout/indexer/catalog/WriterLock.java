package org.morphscout.indexer.catalog;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import org.morphscout.indexer.MorphscoutException;

/**
 * An exclusive, cross-process lock on a catalog folder for work that writes much (indexing). Released on close and,
 * by the operating system, when the process dies, so a crash never leaves a stale lock.
 */
public final class WriterLock implements AutoCloseable {
  private final FileChannel channel;
  private final FileLock lock;

  private WriterLock(FileChannel channel, FileLock lock) {
    this.channel = channel;
    this.lock = lock;
  }

  /**
   * Takes the lock or fails at once.
   *
   * @throws MorphscoutException "catalog in use" when another process (or this one) holds it
   */
  public static WriterLock acquire(Path catalogDir) throws IOException {
    Path file = catalogDir.resolve("writer.lock");
    FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
    FileLock lock;
    try {
      lock = channel.tryLock();
    } catch (OverlappingFileLockException e) {
      lock = null;
    }
    if (lock == null) {
      channel.close();
      throw new MorphscoutException("catalog in use: another Morphscout process is indexing " + catalogDir
          + ". Wait for it to finish, then try again.");
    }
    return new WriterLock(channel, lock);
  }

  @Override
  public void close() throws IOException {
    try {
      lock.release();
    } finally {
      channel.close();
    }
  }
}
