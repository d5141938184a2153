package org.morphscout.app.gui.library;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.Map;
import org.morphscout.indexer.values.ImageRow;

/** Comparators for the grid's sort keys; ties fall back to the path, so the order is total and stable. */
final class ImageOrdering {
  private ImageOrdering() {}

  static Comparator<ImageRow> by(SortKey key, Map<Long, Double> distances) {
    Comparator<ImageRow> byPath = Comparator.comparing(ImageRow::path);
    return switch (key) {
      case NAME -> Comparator.comparing(ImageOrdering::name).thenComparing(byPath);
      case FOLDER -> Comparator.comparing(ImageOrdering::folder).thenComparing(ImageOrdering::name)
          .thenComparing(byPath);
      case SIZE -> Comparator.comparingLong(ImageRow::size).reversed().thenComparing(byPath);
      case SCORE -> Comparator.<ImageRow>comparingDouble(r -> distances.getOrDefault(r.id(), Double.MAX_VALUE))
          .thenComparing(byPath);
    };
  }

  static String name(ImageRow r) {
    Path p = Path.of(r.path()).getFileName();
    return p == null ? r.path() : p.toString().toLowerCase(Locale.ROOT);
  }

  static String folder(ImageRow r) {
    Path p = Path.of(r.path()).getParent();
    return p == null ? "" : p.toString();
  }
}
