package org.morphscout.app.gui.service;

import java.util.EnumSet;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.values.SilhouetteTraits;

/**
 * Reads every image's findings in one query (the grid filters 100,000 images, so loading each analysis would be far too
 * slow): the library's notable silhouettes, plus the failed and missing images.
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
    for (SilhouetteTraits t : library.notableSilhouettes()) {
      result.put(t.imageId(), of(t.components(), t.touchesFrame(), t.uncertain()));
    }
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
