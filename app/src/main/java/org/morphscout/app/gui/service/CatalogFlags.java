package org.morphscout.app.gui.service;

import java.sql.ResultSet;
import java.sql.Statement;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.catalog.ImageStatus;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.silhouette.Silhouette;

/**
 * Reads every image's flags in one query (the grid filters 100,000 images, so loading each analysis would be far too
 * slow). Reads the {@code features} columns directly because the feature store has no bulk flag query yet.
 */
public final class CatalogFlags {
  /** Below this mask confidence a silhouette is uncertain: the library's threshold, as in the pair reasons. */
  public static final double LOW_CONFIDENCE = org.morphscout.indexer.silhouette.Silhouette.UNCERTAIN_BELOW;

  private CatalogFlags() {}

  /** Flags of one silhouette. */
  public static Set<ImageFlag> of(Silhouette s) {
    return of(s.components(), s.touchesFrame(), s.confidence());
  }

  static Set<ImageFlag> of(int components, boolean touchesFrame, double confidence) {
    Set<ImageFlag> flags = EnumSet.noneOf(ImageFlag.class);
    if (touchesFrame) {
      flags.add(ImageFlag.CUT_OFF);
    }
    if (components > 1) {
      flags.add(ImageFlag.SEVERAL_OBJECTS);
    }
    if (confidence < LOW_CONFIDENCE) {
      flags.add(ImageFlag.LOW_CONFIDENCE);
    }
    return flags;
  }

  /** Flags of every image that has any, by id. Failed images get {@link ImageFlag#FAILED}. */
  public static Map<Long, Set<ImageFlag>> load(Library library, Iterable<ImageRow> rows) {
    Map<Long, Set<ImageFlag>> result = new HashMap<>();
    library.catalog().read(c -> {
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT image_id, components, touches_frame, confidence FROM features")) {
        while (rs.next()) {
          Set<ImageFlag> f = of(rs.getInt(2), rs.getInt(3) == 1, rs.getDouble(4));
          if (!f.isEmpty()) {
            result.put(rs.getLong(1), f);
          }
        }
      }
      return null;
    });
    for (ImageRow r : rows) {
      if (r.status() == ImageStatus.FAILED) {
        result.computeIfAbsent(r.id(), k -> EnumSet.noneOf(ImageFlag.class)).add(ImageFlag.FAILED);
      }
    }
    return result;
  }
}
