package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes the plain-language findings of a pair that are not one sub-score's (those come from their
 * {@link PairComponent}): framing faults, doubtful or missing silhouettes, a match only when turned, an exposure gap.
 * For a photographer rather than an engineer: each names what it saw in everyday words with its value. The pictures
 * are called the first and the second. Stateless.
 */
final class PairReasons {
  private static final String[] COUNT_WORDS = {"no", "one", "two", "three", "four", "five", "six"};
  private static final String[] PICTURES = {"the first picture", "the second picture"};

  private PairReasons() {}

  /** A picture without an object (such a pair scores 0). */
  static List<String> noObject(ImageFacts first, ImageFacts second) {
    List<String> out = new ArrayList<>();
    ImageFacts[] both = {first, second};
    for (int i = 0; i < 2; i++) {
      if (both[i].empty()) {
        out.add("no object found in " + PICTURES[i]);
      }
    }
    return out;
  }

  /** Framing faults that also trigger penalties: object cut off, several objects, tiny picture. */
  static List<String> framingFaults(ImageFacts first, ImageFacts second, ScoreConfig cfg) {
    List<String> out = new ArrayList<>();
    ImageFacts[] both = {first, second};
    for (int i = 0; i < 2; i++) {
      if (both[i].touchesFrame()) {
        out.add("object cut off by the frame in " + PICTURES[i]);
      }
    }
    for (int i = 0; i < 2; i++) {
      int n = both[i].components();
      if (n > 1) {
        out.add((n < COUNT_WORDS.length ? COUNT_WORDS[n] : "" + n) + " objects in " + PICTURES[i]);
      }
    }
    for (int i = 0; i < 2; i++) {
      ImageFacts x = both[i];
      if (Math.max(x.width(), x.height()) < cfg.tinyLongSide()) {
        out.add(PICTURES[i] + " is tiny (" + x.width() + "x" + x.height() + " px)");
      }
    }
    return out;
  }

  /**
   * Silhouettes too doubtful to judge a shape by: the silhouette match, warp and framing figures of such a pair may
   * describe the background or a part of the object rather than the object.
   */
  static List<String> uncertainSilhouettes(ImageFacts first, ImageFacts second) {
    List<String> out = new ArrayList<>();
    ImageFacts[] both = {first, second};
    for (int i = 0; i < 2; i++) {
      if (both[i].uncertain()) {
        out.add(fmt("the silhouette of %s is uncertain (confidence %.2f), so its shape figures may be wrong",
            PICTURES[i], both[i].confidence()));
      }
    }
    return out;
  }

  /** The second object matches the first's outline only laid on its side: why the silhouettes match poorly. */
  static List<String> turned(PairFacts f, ScoreConfig cfg) {
    WarpMeasures w = f.warp();
    if (!(w.turnedIou() - w.iouAligned() > cfg.reasonTurnGain())) { // also when no turned pose was tried (NaN)
      return List.of();
    }
    return List.of(fmt("the second picture matches the first's outline only when turned by %.0f degrees (IoU %.2f "
        + "vs %.2f), which a morph of upright objects avoids", Math.abs(Math.toDegrees(w.turnedRotation())),
        w.turnedIou(), w.iouAligned()));
  }

  /** The whole pictures differ in exposure (object and background together): a morph fades through it. */
  static List<String> exposure(PairFacts f, ScoreConfig cfg) {
    PairMeasures m = f.measures();
    if (!(Math.abs(m.exposureA() - m.exposureB()) > cfg.reasonExposure())) {
      return List.of();
    }
    String words = m.exposureA() < m.exposureB() ? "darker" : "brighter";
    return List.of(fmt("the first picture is exposed much " + words + " than the second (whole-picture mean L* %.0f "
        + "vs %.0f)", m.exposureA(), m.exposureB()));
  }

  private static String fmt(String pattern, Object... args) {
    return String.format(Locale.ROOT, pattern, args);
  }
}
