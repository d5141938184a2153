package org.morphscout.indexer.screen;

import java.util.List;

/**
 * One pair to screen, as the user listed it.
 *
 * @param pathA the image the morph starts from
 * @param pathB the image it ends on
 * @param extras the row's other columns, kept as they are
 */
public record ScreenRow(String pathA, String pathB, List<String> extras) {
  public ScreenRow {
    if (pathA == null || pathB == null) {
      throw new IllegalArgumentException("a screening row needs two image paths");
    }
    extras = List.copyOf(extras);
  }
}
