package org.morphscout.indexer.preview;

import java.awt.image.BufferedImage;
import java.util.List;

/**
 * One sequence on a {@link ContactSheet}.
 *
 * @param caption the row's caption, e.g. "chain 1 · max step 0.31 · evenness 0.12"
 * @param tiles the thumbnails in order, at least one
 * @param stepScores one score per step between consecutive tiles (tiles - 1 values), written between them
 */
public record ContactSheetRow(String caption, List<Tile> tiles, List<Double> stepScores) {

  public ContactSheetRow {
    if (caption == null) {
      throw new IllegalArgumentException("caption must not be null (use an empty string)");
    }
    tiles = List.copyOf(tiles);
    stepScores = List.copyOf(stepScores);
    if (tiles.isEmpty()) {
      throw new IllegalArgumentException("a contact sheet row needs at least one tile");
    }
    if (stepScores.size() != tiles.size() - 1) {
      throw new IllegalArgumentException(
          "need one step score between each pair of tiles: " + tiles.size() + " tiles, " + stepScores.size()
              + " scores");
    }
  }

  /** One thumbnail and its caption (e.g. the file name). */
  public record Tile(BufferedImage thumbnail, String caption) {
    public Tile {
      if (thumbnail == null || caption == null) {
        throw new IllegalArgumentException("thumbnail and caption must not be null");
      }
    }
  }
}
