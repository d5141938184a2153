package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes the plain-language findings of a pair, for a photographer rather than an engineer: each names the measure
 * in everyday words with its value. The images are called A and B. Stateless.
 */
final class PairReasons {
  private static final String[] COUNT_WORDS = {"no", "one", "two", "three", "four", "five", "six"};

  private PairReasons() {}

  /** Framing faults that also trigger penalties: object cut off, several objects, tiny image. */
  static List<String> framingFaults(ImageFacts a, ImageFacts b, ScoreConfig cfg) {
    List<String> out = new ArrayList<>();
    for (String label : new String[] {"A", "B"}) {
      ImageFacts s = label.equals("A") ? a : b;
      if (s.touchesFrame()) {
        out.add("object cut off by the frame in " + label);
      }
    }
    for (String label : new String[] {"A", "B"}) {
      ImageFacts s = label.equals("A") ? a : b;
      if (s.components() > 1) {
        String n = s.components() < COUNT_WORDS.length ? COUNT_WORDS[s.components()] : "" + s.components();
        out.add(n + " objects in " + label);
      }
    }
    for (String label : new String[] {"A", "B"}) {
      ImageFacts x = label.equals("A") ? a : b;
      if (Math.max(x.width(), x.height()) < cfg.tinyLongSide()) {
        out.add(label + " is tiny (" + x.width() + "x" + x.height() + " px)");
      }
    }
    return out;
  }

  /**
   * Silhouettes too doubtful to judge a shape by: the silhouette match, warp and framing figures of such a pair may describe
   * the background or a part of the object rather than the object.
   */
  static List<String> uncertainSilhouettes(ImageFacts a, ImageFacts b) {
    List<String> out = new ArrayList<>();
    for (String label : new String[] {"A", "B"}) {
      ImageFacts s = label.equals("A") ? a : b;
      if (s.uncertain()) {
        out.add(fmt("the silhouette of %s is uncertain (confidence %.2f), so its shape figures may be wrong", label,
            s.confidence()));
      }
    }
    return out;
  }

  /** How the reason for a poor silhouette match begins (the scorer lists it first). */
  static final String POOR_SILHOUETTE_MATCH = "silhouettes match poorly after alignment";

  /** All other findings, from the measures. */
  static List<String> measured(PairFacts f, ScoreConfig cfg) {
    List<String> out = new ArrayList<>();
    ImageFacts a = f.first();
    ImageFacts b = f.second();
    PairMeasures m = f.measures();
    WarpMeasures w = f.warp();
    if (w.iouAligned() < cfg.reasonIou()) {
      out.add(fmt(POOR_SILHOUETTE_MATCH + " (aligned IoU %.2f)", w.iouAligned()));
    }
    if (w.turnedIou() - w.iouAligned() > cfg.reasonTurnGain()) { // false when no turned pose was tried (NaN)
      out.add(fmt("B matches A's outline only when turned by %.0f degrees (IoU %.2f vs %.2f), which a morph of "
          + "upright objects avoids", Math.abs(Math.toDegrees(w.turnedRotation())), w.turnedIou(), w.iouAligned()));
    }
    if (w.meanDisplacement() > cfg.reasonEffort()) {
      out.add(fmt("the outline must move a lot to match (on average %.0f%% of the object's size)",
          100 * w.meanDisplacement()));
    }
    if (w.foldFraction() > cfg.reasonFold()) {
      out.add(fmt("the warp would fold the picture over itself (%.0f%% of the object)", 100 * w.foldFraction()));
    }
    if (m.aspectRatioGap() > cfg.reasonAspect()) {
      out.add("aspect ratios differ (" + AspectRatios.describe(a.width(), a.height()) + " vs "
          + AspectRatios.describe(b.width(), b.height()) + ")");
    }
    if (m.deltaE00() > cfg.reasonDeltaE()) {
      out.add(fmt("large colour gap (ΔE00 %.0f)", m.deltaE00()));
    }
    if (Math.abs(m.lightnessA() - m.lightnessB()) > cfg.reasonLightness()) {
      String words = m.lightnessA() < m.lightnessB() ? "dark vs bright" : "bright vs dark";
      out.add(fmt(words + " (L* %.0f vs %.0f)", m.lightnessA(), m.lightnessB()));
    }
    if (Math.abs(m.exposureA() - m.exposureB()) > cfg.reasonExposure()) {
      String words = m.exposureA() < m.exposureB() ? "A is exposed much darker than B" : "A is exposed much brighter than B";
      out.add(fmt(words + " (whole-picture mean L* %.0f vs %.0f)", m.exposureA(), m.exposureB()));
    }
    if (m.stdRatio() < cfg.reasonContrast()) {
      out.add(fmt("contrast differs (L* spread %.0f vs %.0f)", m.stdA(), m.stdB()));
    }
    if (m.appearanceDistance() > cfg.reasonAppearance()) {
      out.add(fmt("the pictures look different (appearance distance %.2f)", m.appearanceDistance()));
    }
    if (m.scaleRatio() < cfg.reasonScale()) {
      out.add(fmt("object sizes differ (the object fills %.0f%% vs %.0f%% of the picture)",
          100 * a.areaFraction(), 100 * b.areaFraction()));
    }
    if (m.offset() > cfg.reasonOffset()) {
      out.add("objects sit in different places of the frame");
    }
    if (m.resolutionRatio() < cfg.reasonResolution()) {
      out.add("resolutions differ a lot (" + a.width() + "x" + a.height() + " vs " + b.width() + "x" + b.height()
          + " px)");
    }
    if (m.backgroundDeltaE() > cfg.reasonBackground()) {
      out.add(fmt("backgrounds differ (ΔE00 %.0f)", m.backgroundDeltaE()));
    }
    return out;
  }

  private static String fmt(String pattern, Object... args) {
    return String.format(Locale.ROOT, pattern, args);
  }
}
