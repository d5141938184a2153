package org.morphscout.indexer.vector;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.apache.lucene.store.MMapDirectory;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * How the vector index's files are opened: memory-mapped, and loaded into memory when they are opened if the index
 * fits comfortably in the machine's memory.
 *
 * <p>Why load them: a graph search reads vectors all over the file, and the first read of each page of a fresh
 * mapping costs a page fault even when the page is already in the operating system's cache. At 1024 dimensions every
 * vector is a page of its own, so a query on a freshly opened index of a million vectors paid about one fault per
 * vector it compared: about 2 ms instead of 0.5 to 0.8 (docs/BENCHMARKS.md, "1,000,000 x 1024"). Loading at open
 * costs a fraction of a second per gigabyte once, and is skipped when the index would take more than
 * {@link #MEMORY_SHARE} of the machine's memory, where it would push other data out.
 */
final class MappedIndexFiles {
  private static final Logger LOG = LoggerFactory.getLogger(MappedIndexFiles.class);
  /** The largest share of physical memory an index may take and still be loaded at open. */
  static final double MEMORY_SHARE = 0.5;

  private MappedIndexFiles() {}

  /** The directory for {@code dir}: memory-mapped, every file loaded at open when {@link #loads} says so. */
  static MMapDirectory open(Path dir) throws IOException {
    MMapDirectory directory = new MMapDirectory(dir);
    long bytes = folderBytes(dir);
    long memory = physicalMemory();
    if (loads(bytes, memory)) {
      directory.setPreload(MMapDirectory.ALL_FILES);
    } else {
      LOG.info("Vector index {} ({} MiB) is more than half of this machine's memory ({} MiB): its files are read "
          + "as searches need them", dir, bytes >> 20, memory >> 20);
    }
    return directory;
  }

  /** Whether the index in {@code dir} is loaded at open on a machine with {@code memoryBytes} of physical memory. */
  static boolean loadsAtOpen(Path dir, long memoryBytes) throws IOException {
    return loads(folderBytes(dir), memoryBytes);
  }

  /**
   * Whether an index of {@code indexBytes} is loaded at open on a machine with {@code memoryBytes} of physical memory
   * (unknown, 0 or less: not loaded).
   */
  static boolean loads(long indexBytes, long memoryBytes) {
    return memoryBytes > 0 && indexBytes <= memoryBytes * MEMORY_SHARE;
  }

  private static long physicalMemory() {
    if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
      return os.getTotalMemorySize();
    }
    return 0;
  }

  private static long folderBytes(Path dir) throws IOException {
    try (Stream<Path> files = Files.list(dir)) {
      return files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
    }
  }
}
