package org.morphscout.app.bench;

import java.nio.file.Path;

/**
 * A child process for {@link StoredPairsMemoryIT}: fills a synthetic catalog of stored pairs and asks it for the best
 * 30 pairs, in whatever heap the parent gives it. Prints the number of stored pairs on success.
 *
 * <p>Usage: {@code StoredPairsChild <catalog> <images>}.
 */
public final class StoredPairsChild {
  private StoredPairsChild() {}

  public static void main(String[] args) throws Exception {
    StoredPairsBenchmark.Result r = StoredPairsBenchmark.run(Path.of(args[0]), Integer.parseInt(args[1]), 20261204L, 1);
    System.out.println("pairs " + r.pairs());
  }
}
