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
 * Scores how well the first picture morphs into the second (0..100) and says why.
 *
 * <p>Combination: each available sub-score {@code c_i} in [0, 1] (the {@link PairComponent}s, each
 * defining its formula and settings) enters a weighted geometric mean,
 * {@code exp(sum w_i ln max(c_i, 0.01) / sum w_i)}, so one very poor aspect (silhouettes that do not match, a huge colour gap) drags the
 * whole score down instead of being averaged away; the floor of 0.01 keeps a single zero from erasing every other
 * difference. The mean is multiplied by a penalty factor for each framing fault (object cut off by the frame, several
 * objects, a tiny image; per image), then by 100. The verdict comes from {@link ScoreConfig#passScore()} and
 * {@link ScoreConfig#warnScore()}; a framing fault, or frames of clearly different aspect ratios
 * ({@link ScoreConfig#passMaxAspectGap()}), or an uncertain silhouette ({@link ImageFacts#uncertain()}, named first
 * among the reasons) cap it at WARN. A pair where either image has no silhouette scores 0 with verdict FAIL.
 *
 * <p>The score is a pure function of the pair's {@link PairFacts} and the configuration: {@link #score(PairFacts)}
 * gives the number alone (cheap enough to rank millions of stored pairs), {@link #explain} the whole
 * {@link PairScore}, and {@link #upperBound} the best score a pair could reach whatever its warp, from the cheap
 * measures alone. Immutable and thread-safe.
 */
public final class PairScorer {
  private static final double FLOOR = 0.01;

  private final ScoreConfig config;
  private final ColourDifference colour;
  private final PairMeasurer measurer;
  /** The components' weights under this configuration, by ordinal (read once: scoring runs per stored pair). */
  private final double[] weights;

  public PairScorer(ScoreConfig config, ColourDifference colour, WarpEstimator warps) {
    this.config = config;
    this.colour = colour;
    this.measurer = new PairMeasurer(colour, warps);
    PairComponent[] all = PairComponent.all();
    this.weights = new double[all.length];
    for (PairComponent c : all) {
      weights[c.ordinal()] = c.weight(config);
    }
  }

  public ScoreConfig config() {
    return config;
  }

  public ColourDifference colourDifference() {
    return colour;
  }

  public PairMeasurer measurer() {
    return measurer;
  }

  /** Measures and scores one pair of analysed pictures, the warp included. */
  public PairScore score(ImageAnalysis a, ImageAnalysis b) {
    PairFacts cheap = measurer.cheap(a, b);
    if (!cheap.measurable()) {
      return explain(cheap, Optional.empty());
    }
    WarpResult warp = measurer.warp(a, b);
    return explain(cheap.withWarp(WarpMeasures.of(warp)), Optional.of(warp));
  }

  /** The score alone, 0..100, of facts with their warp (or of a pair without an object, which scores 0). */
  public double score(PairFacts f) {
    if (f.measurable() && !f.warped()) {
      throw new IllegalArgumentException("the pair's warp is not measured yet: only an upper bound is known");
    }
    return combine(f, false);
  }

  /**
   * The highest score the pair could reach whatever its warp turns out to be (every warp sub-score taken as 1): a
   * pair whose bound is below what could be shown need not be warped at all. Exact for warped facts' cheap part.
   */
  public double upperBound(PairFacts f) {
    return combine(f, true);
  }

  /** The whole score of facts with their warp: sub-scores, measures, verdict and reasons. */
  public PairScore explain(PairFacts f) {
    return explain(f, Optional.empty());
  }

  private PairScore explain(PairFacts f, Optional<WarpResult> warp) {
    if (!f.measurable()) {
      return new PairScore(0, Verdict.FAIL, Map.of(), Map.of(), PairReasons.noObject(f.first(), f.second()),
          Optional.empty());
    }
    double score = score(f);
    Map<String, Double> components = new LinkedHashMap<>();
    for (PairComponent c : PairComponent.all()) {
      double v = c.subScore(f, config);
      if (!Double.isNaN(v)) {
        components.put(c.key(), v);
      }
    }
    Verdict verdict = score >= config.passScore() ? Verdict.PASS
        : score >= config.warnScore() ? Verdict.WARN : Verdict.FAIL;
    List<String> faults = PairReasons.framingFaults(f.first(), f.second(), config);
    List<String> doubts = PairReasons.uncertainSilhouettes(f.first(), f.second());
    if (verdict == Verdict.PASS
        && (!faults.isEmpty() || !doubts.isEmpty() || f.measures().aspectRatioGap() > config.passMaxAspectGap())) {
      verdict = Verdict.WARN;
    }
    // Doubtful silhouettes first, then a poor silhouette match (the main reason a morph fails) and whether only a
    // turned object would match, then framing faults, then the other sub-scores' reasons in their order, then the
    // exposure of the whole pictures.
    List<String> reasons = new ArrayList<>(doubts);
    List<String> later = new ArrayList<>();
    for (PairComponent c : PairComponent.all()) {
      c.reason(f, config).ifPresent((c == PairComponent.SILHOUETTE_MATCH ? reasons : later)::add);
    }
    reasons.addAll(PairReasons.turned(f, config));
    reasons.addAll(faults);
    reasons.addAll(later);
    reasons.addAll(PairReasons.exposure(f, config));
    return new PairScore(score, verdict, components, measures(f), reasons, warp);
  }

  private double combine(PairFacts f, boolean bound) {
    if (!f.measurable()) {
      return 0;
    }
    double logSum = 0;
    double weightSum = 0;
    for (PairComponent c : PairComponent.all()) {
      double v = bound && c.fromWarp() ? 1 : c.subScore(f, config);
      if (!Double.isNaN(v)) {
        double w = weights[c.ordinal()];
        logSum += w * Math.log(Math.max(FLOOR, v));
        weightSum += w;
      }
    }
    double mean = weightSum > 0 ? Math.exp(logSum / weightSum) : 0;
    double penalty = penalty(f.first()) * penalty(f.second());
    return Math.max(0, Math.min(100, 100 * mean * penalty));
  }

  private double penalty(ImageFacts x) {
    double p = 1;
    if (x.touchesFrame()) {
      p *= config.cutOffPenalty();
    }
    if (x.components() > 1) {
      p *= config.severalObjectsPenalty();
    }
    if (Math.max(x.width(), x.height()) < config.tinyLongSide()) {
      p *= config.tinyPenalty();
    }
    return p;
  }

  /** Each sub-score's measure (known ones), then the other measures worth showing. */
  private static Map<String, Double> measures(PairFacts f) {
    WarpMeasures w = f.warp();
    PairMeasures m = f.measures();
    Map<String, Double> r = new LinkedHashMap<>();
    for (PairComponent c : PairComponent.all()) {
      putIfKnown(r, c.measure().key(), c.measure(f));
    }
    r.put("iouBefore", w.iouBefore());
    r.put("warpedIou", w.iouWarped());
    r.put("maxDisplacement", w.maxDisplacement());
    putIfKnown(r, "exposureGap", Math.abs(m.exposureA() - m.exposureB()));
    return r;
  }

  private static void putIfKnown(Map<String, Double> map, String key, double value) {
    if (!Double.isNaN(value)) {
      map.put(key, value);
    }
  }
}
