package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.warp.WarpEstimator;
import org.morphscout.indexer.warp.WarpResult;

/**
 * Scores how well image A morphs into image B (0..100) and says why.
 *
 * <p>Combination: each available sub-score {@code c_i} in [0, 1] (see {@link ScoreConfig} for how each is derived)
 * enters a weighted geometric mean, {@code exp(sum w_i ln max(c_i, 0.01) / sum w_i)}, so one very poor aspect (no
 * overlap, a huge colour gap) drags the whole score down instead of being averaged away; the floor of 0.01 keeps a
 * single zero from erasing every other difference. The mean is multiplied by a penalty factor for each framing
 * fault (object cut off by the frame, several objects, a tiny image; per image), then by 100. The verdict comes from
 * {@link ScoreConfig#passScore()} and {@link ScoreConfig#warnScore()}; a framing fault, or frames of clearly different
 * aspect ratios ({@link ScoreConfig#passMaxAspectGap()}), or an uncertain silhouette
 * ({@link org.morphscout.indexer.silhouette.Silhouette#uncertain()}, named first among the reasons) cap it at WARN. A pair where
 * either image has no silhouette scores 0 with verdict FAIL.
 *
 * <p>Immutable and thread-safe.
 */
public final class PairScorer {
  private static final double FLOOR = 0.01;

  private final ScoreConfig config;
  private final ColourDifference colour;
  private final WarpEstimator warps;

  public PairScorer(ScoreConfig config, ColourDifference colour, WarpEstimator warps) {
    this.config = config;
    this.colour = colour;
    this.warps = warps;
  }

  public ScoreConfig config() {
    return config;
  }

  public ColourDifference colourDifference() {
    return colour;
  }

  public PairScore score(ImageAnalysis a, ImageAnalysis b) {
    List<String> empty = new ArrayList<>();
    if (a.silhouette().isEmpty()) {
      empty.add("no object found in A");
    }
    if (b.silhouette().isEmpty()) {
      empty.add("no object found in B");
    }
    if (!empty.isEmpty()) {
      return new PairScore(0, Verdict.FAIL, Map.of(), Map.of(), empty, Optional.empty());
    }
    WarpResult warp = warps.estimate(a.silhouette().mask(), b.silhouette().mask());
    PairMeasures m = PairMeasures.of(a, b, warp, colour);
    Map<String, Double> components = components(m);
    Map<String, Double> measures = measures(m);

    double logSum = 0;
    double weightSum = 0;
    for (Map.Entry<String, Double> e : components.entrySet()) {
      double w = weight(e.getKey());
      logSum += w * Math.log(Math.max(FLOOR, e.getValue()));
      weightSum += w;
    }
    double mean = weightSum > 0 ? Math.exp(logSum / weightSum) : 0;

    List<String> faults = PairReasons.framingFaults(a, b, config);
    double penalty = 1;
    for (String label : new String[] {"A", "B"}) {
      var x = label.equals("A") ? a : b;
      if (x.silhouette().touchesFrame()) {
        penalty *= config.cutOffPenalty();
      }
      if (x.silhouette().components() > 1) {
        penalty *= config.severalObjectsPenalty();
      }
      if (Math.max(x.width(), x.height()) < config.tinyLongSide()) {
        penalty *= config.tinyPenalty();
      }
    }
    double score = Math.max(0, Math.min(100, 100 * mean * penalty));
    Verdict verdict = score >= config.passScore() ? Verdict.PASS
        : score >= config.warnScore() ? Verdict.WARN : Verdict.FAIL;
    List<String> doubts = PairReasons.uncertainSilhouettes(a, b);
    if (verdict == Verdict.PASS
        && (!faults.isEmpty() || !doubts.isEmpty() || m.aspectRatioGap() > config.passMaxAspectGap())) {
      verdict = Verdict.WARN;
    }
    List<String> reasons = new ArrayList<>(doubts);
    List<String> measured = PairReasons.measured(a, b, m, config);
    // Overlap first: it is the main reason a morph fails; then framing faults, then the rest.
    if (!measured.isEmpty() && measured.get(0).startsWith("silhouettes overlap")) {
      reasons.add(measured.remove(0));
    }
    reasons.addAll(faults);
    reasons.addAll(measured);
    return new PairScore(score, verdict, components, measures, reasons, Optional.of(warp));
  }

  private Map<String, Double> components(PairMeasures m) {
    WarpResult w = m.warp();
    Map<String, Double> c = new LinkedHashMap<>();
    c.put("overlap", clamp((w.iouAligned() - config.iouZero()) / (config.iouFull() - config.iouZero())));
    c.put("warpEffort", Math.exp(-w.meanDisplacement() / config.effortScale()));
    c.put("foldSafety", clamp(1 - w.foldFraction() / config.foldTolerance()));
    putIfKnown(c, "appearance", 1 - m.appearanceDistance() / config.appearanceScale());
    putIfKnown(c, "colour", 1 - m.deltaE00() / config.deltaEScale());
    putIfKnown(c, "lightness", 1 - Math.abs(m.lightnessA() - m.lightnessB()) / config.lightnessScale());
    putIfKnown(c, "contrast", m.stdRatio());
    c.put("aspect", clamp(1 - m.aspectRatioGap() / config.aspectScale()));
    c.put("resolution", clamp(m.resolutionRatio() / config.resolutionFull()));
    c.put("objectScale", clamp(m.scaleRatio() / config.scaleFull()));
    c.put("placement", clamp(1 - m.offset() / config.offsetScale()));
    putIfKnown(c, "background", 1 - m.backgroundDeltaE() / config.backgroundScale());
    return c;
  }

  private static Map<String, Double> measures(PairMeasures m) {
    WarpResult w = m.warp();
    Map<String, Double> r = new LinkedHashMap<>();
    r.put("iouBefore", w.iouBefore());
    r.put("alignedIou", w.iouAligned());
    r.put("warpedIou", w.iouWarped());
    r.put("meanDisplacement", w.meanDisplacement());
    r.put("maxDisplacement", w.maxDisplacement());
    r.put("foldFraction", w.foldFraction());
    putIfKnown(r, "appearanceDistance", m.appearanceDistance(), false);
    putIfKnown(r, "deltaE00", m.deltaE00(), false);
    putIfKnown(r, "lightnessGap", Math.abs(m.lightnessA() - m.lightnessB()), false);
    putIfKnown(r, "exposureGap", Math.abs(m.exposureA() - m.exposureB()), false);
    putIfKnown(r, "stdRatio", m.stdRatio(), false);
    r.put("aspectRatioGap", m.aspectRatioGap());
    r.put("resolutionRatio", m.resolutionRatio());
    r.put("scaleRatio", m.scaleRatio());
    r.put("offset", m.offset());
    putIfKnown(r, "backgroundDeltaE00", m.backgroundDeltaE(), false);
    return r;
  }

  private double weight(String component) {
    return switch (component) {
      case "overlap" -> config.overlapWeight();
      case "warpEffort" -> config.warpEffortWeight();
      case "foldSafety" -> config.foldSafetyWeight();
      case "appearance" -> config.appearanceWeight();
      case "colour" -> config.colourWeight();
      case "lightness" -> config.lightnessWeight();
      case "contrast" -> config.contrastWeight();
      case "aspect" -> config.aspectWeight();
      case "resolution" -> config.resolutionWeight();
      case "objectScale" -> config.objectScaleWeight();
      case "placement" -> config.placementWeight();
      case "background" -> config.backgroundWeight();
      default -> throw new IllegalStateException("no weight for " + component);
    };
  }

  private static void putIfKnown(Map<String, Double> map, String key, double value) {
    putIfKnown(map, key, value, true);
  }

  private static void putIfKnown(Map<String, Double> map, String key, double value, boolean clamp) {
    if (!Double.isNaN(value)) {
      map.put(key, clamp ? clamp(value) : value);
    }
  }

  private static double clamp(double v) {
    return v < 0 ? 0 : (v > 1 ? 1 : v);
  }
}
