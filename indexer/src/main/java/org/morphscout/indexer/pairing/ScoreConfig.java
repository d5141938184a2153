package org.morphscout.indexer.pairing;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.morphscout.indexer.MorphscoutException;

/**
 * Every weight, scale and threshold of the pair score. Immutable; validated on construction (weights &gt;= 0 with a
 * positive sum, scales positive, fractions in range, warn &lt;= pass). Keys in files and on the command line are the
 * component names below. {@link #DEFAULTS} holds the documented defaults.
 *
 * <p>Sub-scores, each in [0, 1] (1 best), and their weights (defaults in brackets):
 *
 * <ul>
 *   <li>silhouetteMatch [3.0]: the aligned IoU (how much the silhouettes cover each other after a similarity
 *       alignment) mapped linearly from {@code iouZero} [0.3] (scores 0) to {@code iouFull} [0.95] (scores 1). The
 *       most telling single measure of a morph. Its weight was called {@code overlapWeight} before; that key is
 *       still read, so earlier settings files load unchanged.
 *   <li>warpEffort [1.5]: exp(-meanDisplacement / {@code effortScale} [0.15]); displacement as a fraction of object
 *       size.
 *   <li>foldSafety [1.0]: 1 - foldFraction / {@code foldTolerance} [0.05], floored at 0.
 *   <li>appearance [1.5]: 1 - (1 - cosine) / {@code appearanceScale} [0.6], floored at 0.
 *   <li>colour [1.0]: 1 - deltaE00(foreground means) / {@code deltaEScale} [40].
 *   <li>lightness [0.75]: 1 - |L*A - L*B| / {@code lightnessScale} [50].
 *   <li>contrast [0.5]: ratio of the foreground L* standard deviations (smaller over larger).
 *   <li>aspect [0.5]: 1 - |ln(aspect A / aspect B)| / {@code aspectScale} [0.7].
 *   <li>resolution [0.25]: sqrt(pixels ratio) / {@code resolutionFull} [0.5], capped at 1.
 *   <li>objectScale [0.5]: sqrt(area fraction ratio) / {@code scaleFull} [0.8], capped at 1.
 *   <li>placement [0.25]: 1 - centroid distance (image fractions) / {@code offsetScale} [0.5].
 *   <li>background [0.25]: 1 - deltaE00(background means) / {@code backgroundScale} [50].
 * </ul>
 *
 * <p>Penalty factors multiply the score for framing faults: object touching the frame {@code cutOffPenalty} [0.6],
 * several objects {@code severalObjectsPenalty} [0.75], an image whose long side is below {@code tinyLongSide}
 * [320 px] {@code tinyPenalty} [0.7]. Verdict: PASS at or above {@code passScore} [65], WARN at or above
 * {@code warnScore} [40], FAIL below; a framing fault caps the verdict at WARN, and so do frames whose aspect ratios
 * differ by more than {@code passMaxAspectGap} [0.2] (|ln ratio|, about 22%: 3:2 against 4:3 passes, 4:3 against
 * 16:9 does not), because the morph must crop or pad one of them.
 *
 * <p>Reason thresholds (a reason is written when a measure crosses them): {@code reasonIou} [0.6],
 * {@code reasonEffort} [0.15], {@code reasonFold} [0.01], {@code reasonAppearance} [0.5] (1 - cosine),
 * {@code reasonDeltaE} [20], {@code reasonLightness} [40] (L* gap), {@code reasonContrast} [0.4] (std ratio),
 * {@code reasonAspect} [0.1] (|ln ratio|, about 10%), {@code reasonScale} [0.5], {@code reasonOffset} [0.25],
 * {@code reasonResolution} [0.25], {@code reasonBackground} [25] (deltaE00), {@code reasonTurnGain} [0.15] (IoU a
 * pose beyond the alignment's rotation limit, an object laid on its side, would gain over the upright alignment),
 * {@code reasonExposure} [30] (gap of the whole pictures' mean L*, object and background together: an overall
 * exposure difference, which a morph shows as a fade through a brightness change).
 */
public record ScoreConfig(
    double silhouetteMatchWeight,
    double warpEffortWeight,
    double foldSafetyWeight,
    double appearanceWeight,
    double colourWeight,
    double lightnessWeight,
    double contrastWeight,
    double aspectWeight,
    double resolutionWeight,
    double objectScaleWeight,
    double placementWeight,
    double backgroundWeight,
    double iouZero,
    double iouFull,
    double effortScale,
    double foldTolerance,
    double appearanceScale,
    double deltaEScale,
    double lightnessScale,
    double aspectScale,
    double resolutionFull,
    double scaleFull,
    double offsetScale,
    double backgroundScale,
    double cutOffPenalty,
    double severalObjectsPenalty,
    double tinyPenalty,
    int tinyLongSide,
    double passScore,
    double warnScore,
    double reasonIou,
    double reasonEffort,
    double reasonFold,
    double reasonAppearance,
    double reasonDeltaE,
    double reasonLightness,
    double reasonContrast,
    double reasonAspect,
    double reasonScale,
    double reasonOffset,
    double reasonResolution,
    double reasonBackground,
    double reasonTurnGain,
    double reasonExposure,
    double passMaxAspectGap) {

  public static final ScoreConfig DEFAULTS = new ScoreConfig(
      3.0, 1.5, 1.0, 1.5, 1.0, 0.75, 0.5, 0.5, 0.25, 0.5, 0.25, 0.25,
      0.3, 0.95, 0.15, 0.05, 0.6, 40, 50, 0.7, 0.5, 0.8, 0.5, 50,
      0.6, 0.75, 0.7, 320,
      65, 40,
      0.6, 0.15, 0.01, 0.5, 20, 40, 0.4, 0.1, 0.5, 0.25, 0.25, 25, 0.15,
      30, 0.2);

  public ScoreConfig {
    double[] weights = {silhouetteMatchWeight, warpEffortWeight, foldSafetyWeight, appearanceWeight, colourWeight,
        lightnessWeight, contrastWeight, aspectWeight, resolutionWeight, objectScaleWeight, placementWeight,
        backgroundWeight};
    double sum = 0;
    for (double w : weights) {
      if (!(w >= 0) || !Double.isFinite(w)) {
        throw new IllegalArgumentException("score weights must be >= 0, got " + w);
      }
      sum += w;
    }
    if (!(sum > 0)) {
      throw new IllegalArgumentException("at least one score weight must be positive");
    }
    if (!(iouZero >= 0 && iouZero < iouFull && iouFull <= 1)) {
      throw new IllegalArgumentException(
          "need 0 <= iouZero < iouFull <= 1, got iouZero " + iouZero + ", iouFull " + iouFull);
    }
    positive("effortScale", effortScale);
    unit("foldTolerance", foldTolerance);
    positive("appearanceScale", appearanceScale);
    positive("deltaEScale", deltaEScale);
    positive("lightnessScale", lightnessScale);
    positive("aspectScale", aspectScale);
    unit("resolutionFull", resolutionFull);
    unit("scaleFull", scaleFull);
    positive("offsetScale", offsetScale);
    positive("backgroundScale", backgroundScale);
    unit("cutOffPenalty", cutOffPenalty);
    unit("severalObjectsPenalty", severalObjectsPenalty);
    unit("tinyPenalty", tinyPenalty);
    if (tinyLongSide < 0) {
      throw new IllegalArgumentException("tinyLongSide must be >= 0 pixels, got " + tinyLongSide);
    }
    if (!(warnScore >= 0 && warnScore <= passScore && passScore <= 100)) {
      throw new IllegalArgumentException(
          "need 0 <= warnScore <= passScore <= 100, got warnScore " + warnScore + ", passScore " + passScore);
    }
    range("reasonIou", reasonIou, 0, 1);
    positive("reasonEffort", reasonEffort);
    range("reasonFold", reasonFold, 0, 1);
    range("reasonAppearance", reasonAppearance, 0, 2);
    positive("reasonDeltaE", reasonDeltaE);
    positive("reasonLightness", reasonLightness);
    range("reasonContrast", reasonContrast, 0, 1);
    positive("reasonAspect", reasonAspect);
    range("reasonScale", reasonScale, 0, 1);
    positive("reasonOffset", reasonOffset);
    range("reasonResolution", reasonResolution, 0, 1);
    positive("reasonBackground", reasonBackground);
    range("reasonTurnGain", reasonTurnGain, 0, 1);
    positive("reasonExposure", reasonExposure);
    positive("passMaxAspectGap", passMaxAspectGap);
  }

  /**
   * These settings with some replaced, e.g. from command-line options {@code silhouetteMatchWeight=2}.
   *
   * @throws org.morphscout.indexer.MorphscoutException naming the unknown key or the invalid value
   */
  public ScoreConfig withOverrides(Map<String, String> overrides) {
    return RecordSettings.apply(this, renamed(overrides, "command-line options"), "command-line options");
  }

  /**
   * The defaults with the settings of a {@code .json} (one flat object) or {@code .properties} file applied.
   *
   * @throws org.morphscout.indexer.MorphscoutException for unknown keys or invalid values, naming the file
   */
  public static ScoreConfig load(Path file) throws IOException {
    return RecordSettings.apply(DEFAULTS, renamed(SettingsFiles.read(file), file.toString()), file.toString());
  }

  /**
   * Earlier names of settings, still read (never listed among the known settings), with the name they have now.
   * {@code overlapWeight}: the silhouette match sub-score was called overlap, a word that also
   * named the images two chains share.
   */
  static final Map<String, String> EARLIER_NAMES = Map.of("overlapWeight", "silhouetteMatchWeight");

  /** The settings with earlier names replaced by the current ones; giving both names of one setting is an error. */
  private static Map<String, String> renamed(Map<String, String> settings, String source) {
    Map<String, String> out = new LinkedHashMap<>(settings);
    EARLIER_NAMES.forEach((earlier, now) -> {
      if (out.containsKey(earlier)) {
        if (out.containsKey(now)) {
          throw new MorphscoutException("settings " + earlier + " and " + now + " in " + source + " are one setting "
              + "(" + earlier + " is its earlier name): give only " + now);
        }
        out.put(now, out.remove(earlier));
      }
    });
    return out;
  }

  private static void positive(String name, double v) {
    if (!(v > 0) || !Double.isFinite(v)) {
      throw new IllegalArgumentException(name + " must be positive, got " + v);
    }
  }

  private static void unit(String name, double v) {
    if (!(v > 0 && v <= 1)) {
      throw new IllegalArgumentException(name + " must be in (0, 1], got " + v);
    }
  }

  private static void range(String name, double v, double lo, double hi) {
    if (!(v >= lo && v <= hi)) {
      throw new IllegalArgumentException(name + " must be in [" + lo + ", " + hi + "], got " + v);
    }
  }
}
