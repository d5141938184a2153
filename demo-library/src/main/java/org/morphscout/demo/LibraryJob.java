package org.morphscout.demo;

import java.io.IOException;
import java.util.List;

/**
 * One unit of generation work: the manifest rows it will produce (known when planning, before any drawing) and the
 * code that draws and encodes their files, in row order. Jobs are independent, so they can run on any thread in
 * any order without changing a byte.
 */
record LibraryJob(List<ManifestRow> rows, Producer producer) {
  LibraryJob {
    rows = List.copyOf(rows);
  }

  @FunctionalInterface
  interface Producer {
    /** Encoded files, one per row, in row order. */
    List<byte[]> produce() throws IOException;
  }
}
