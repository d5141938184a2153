package org.morphscout.indexer.library;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.vector.VectorIndex;

/**
 * The pair candidates of an image: its nearest catalog images by shape first (what morphs well), then by appearance,
 * without repeats. One definition for pairs measured live and pairs stored by {@code index}, so both see the same
 * candidates.
 */
final class PairCandidates {
  private PairCandidates() {}

  static List<Long> of(VectorIndex index, ImageAnalysis a, int k, Set<Long> exclude) {
    try {
      Set<Long> ids = new LinkedHashSet<>();
      if (VectorSync.nonZeroOrNull(a.shape().shapeVector()) != null) {
        index.search(VectorIndex.Field.SHAPE, a.shape().shapeVector(), k, exclude).forEach(h -> ids.add(h.id()));
      }
      index.search(VectorIndex.Field.APPEARANCE, a.appearance(), k, exclude).forEach(h -> ids.add(h.id()));
      return new ArrayList<>(ids);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
