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
 * Reads every image's findings in one query (the grid filters 100,000 images, so loading each analysis would be far too
 * slow). Reads the {@code features} columns directly because the feature store has no bulk finding query yet.
 */
public final class CatalogFindings {
  private CatalogFindings() {}

  /** Findings of one silhouette. */
  public static Set<ImageFinding> of(Silhouette s) {
    return of(s.components(), s.touchesFrame(), s.uncertain());
  }

  static Set<ImageFinding> of(int components, boolean touchesFrame, boolean uncertain) {
    Set<ImageFinding> findings = EnumSet.noneOf(ImageFinding.class);
    if (touchesFrame) {
      findings.add(ImageFinding.CUT_OFF);
    }
    if (components > 1) {
      findings.add(ImageFinding.SEVERAL_OBJECTS);
    }
    if (uncertain) {
      findings.add(ImageFinding.UNCERTAIN);
    }
    return findings;
  }

  /**
   * Findings of every image that has any, by id. Failed images get {@link ImageFinding#FAILED}, images whose file is
   * gone {@link ImageFinding#MISSING}.
   */
  public static Map<Long, Set<ImageFinding>> load(Library library, Iterable<ImageRow> rows) {
    Map<Long, Set<ImageFinding>> result = new HashMap<>();
    library.catalog().read(c -> {
      try (Statement s = c.createStatement();
          ResultSet rs = s.executeQuery("SELECT image_id, components, touches_frame, confidence, coverage FROM features")) {
        while (rs.next()) {
          // Silhouette.uncertain(), as status counts it: an object found, confidence below the library's threshold
          Set<ImageFinding> f = of(rs.getInt(2), rs.getInt(3) == 1, rs.getDouble(5) > 0
              && rs.getDouble(4) < Silhouette.UNCERTAIN_BELOW);
          if (!f.isEmpty()) {
            result.put(rs.getLong(1), f);
          }
        }
      }
      return null;
    });
    for (ImageRow r : rows) {
      if (r.status() == ImageStatus.FAILED) {
        result.computeIfAbsent(r.id(), k -> EnumSet.noneOf(ImageFinding.class)).add(ImageFinding.FAILED);
      } else if (r.status() == ImageStatus.MISSING) {
        result.computeIfAbsent(r.id(), k -> EnumSet.noneOf(ImageFinding.class)).add(ImageFinding.MISSING);
      }
    }
    return result;
  }
}
