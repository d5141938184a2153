package org.morphscout.indexer.pairing;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;
import org.morphscout.indexer.pairing.ScoreSetting.Bounds;

/**
 * Every number of the pair score: the settings of each {@link PairComponent} (weight, reason threshold, the
 * formula's own numbers) and the general settings below (penalties, verdict scores, reasons not tied to one
 * component). Immutable; validated on construction (each value within its {@link ScoreSetting}'s range, weights with
 * a positive sum, each component's settings consistent, warn score at most the pass score). {@link #DEFAULTS} holds
 * the documented defaults; {@link ScoreSettings} lists every setting with its default and accepted values.
 *
 * <p>Penalty factors multiply the score for framing faults of each picture; the verdict is PASS at or above the pass
 * score, WARN at or above the warn score, FAIL below; a framing fault caps it at WARN, and so do frames whose aspect
 * ratios differ by more than {@link #PASS_MAX_ASPECT_GAP} (|ln ratio| 0.2, about 22%: 3:2 against 4:3 passes, 4:3
 * against 16:9 does not), because the morph must crop or pad one of them.
 */
public final class ScoreConfig {
  private static final List<ScoreSetting> GENERAL = new ArrayList<>();

  public static final ScoreSetting CUT_OFF_PENALTY = general("cutOffPenalty", 0.6, Bounds.aboveZeroToOne(), false,
      "factor of the score for each picture whose object touches the frame");
  public static final ScoreSetting SEVERAL_OBJECTS_PENALTY = general("severalObjectsPenalty", 0.75,
      Bounds.aboveZeroToOne(), false, "factor of the score for each picture with several objects");
  public static final ScoreSetting TINY_PENALTY = general("tinyPenalty", 0.7, Bounds.aboveZeroToOne(), false,
      "factor of the score for each tiny picture");
  public static final ScoreSetting TINY_LONG_SIDE = general("tinyLongSide", 320, Bounds.atLeastZero(), true,
      "a picture whose long side is below this many pixels is tiny");
  public static final ScoreSetting PASS_SCORE = general("passScore", 65, Bounds.between(0, 100), false,
      "the score (0 to 100) from which a pair passes");
  public static final ScoreSetting WARN_SCORE = general("warnScore", 40, Bounds.between(0, 100), false,
      "the score from which a pair is a warning rather than a failure (at most passScore)");
  public static final ScoreSetting PASS_MAX_ASPECT_GAP = general("passMaxAspectGap", 0.2, Bounds.positive(), false,
      "frames whose aspect ratios differ by more than this (|ln ratio|) cannot pass, since the morph must crop "
          + "or pad one");
  public static final ScoreSetting REASON_TURN_GAIN = general("reasonTurnGain", 0.15, Bounds.between(0, 1), false,
      "a reason is written when turning the second object beyond the alignment's rotation limit (laying it on its "
          + "side) would gain more aligned IoU than this");
  public static final ScoreSetting REASON_EXPOSURE = general("reasonExposure", 30, Bounds.positive(), false,
      "a reason is written when the whole pictures' mean L* (object and background) differ by more than this");

  /** The documented defaults. */
  public static final ScoreConfig DEFAULTS = defaults();

  /** Values by component ordinal, then slot. */
  private final double[][] components;
  /** General values by slot. */
  private final double[] general;

  private ScoreConfig(double[][] components, double[] general) {
    this.components = components;
    this.general = general;
    String problem = problem();
    if (problem != null) {
      throw new IllegalArgumentException(problem);
    }
  }

  /** The value of a setting. */
  public double value(ScoreSetting s) {
    return s.row() == ScoreSetting.GENERAL ? general[s.slot()] : components[s.row()][s.slot()];
  }

  /** The weight of a sub-score. */
  public double weight(PairComponent c) {
    return value(c.weightSetting());
  }

  /** The threshold at which a sub-score's reason is written. */
  public double reason(PairComponent c) {
    return value(c.reasonSetting());
  }

  public double cutOffPenalty() {
    return value(CUT_OFF_PENALTY);
  }

  public double severalObjectsPenalty() {
    return value(SEVERAL_OBJECTS_PENALTY);
  }

  public double tinyPenalty() {
    return value(TINY_PENALTY);
  }

  /** Long side in pixels below which a picture is tiny. */
  public int tinyLongSide() {
    return (int) value(TINY_LONG_SIDE);
  }

  public double passScore() {
    return value(PASS_SCORE);
  }

  public double warnScore() {
    return value(WARN_SCORE);
  }

  public double passMaxAspectGap() {
    return value(PASS_MAX_ASPECT_GAP);
  }

  public double reasonTurnGain() {
    return value(REASON_TURN_GAIN);
  }

  public double reasonExposure() {
    return value(REASON_EXPOSURE);
  }

  /**
   * These settings with one replaced.
   *
   * @throws IllegalArgumentException when the value is not accepted or does not fit the others
   */
  public ScoreConfig with(ScoreSetting s, double v) {
    return with(Map.of(s, v));
  }

  /**
   * These settings with some replaced, e.g. from command-line options {@code silhouetteMatch.weight=2} (earlier
   * flat names such as {@code silhouetteMatchWeight} or {@code iouZero} are still read).
   *
   * @throws org.morphscout.indexer.MorphscoutException naming the unknown key or the invalid value
   */
  public ScoreConfig withOverrides(Map<String, String> overrides) {
    return ScoreSettings.apply(this, overrides, "command-line options");
  }

  /**
   * The defaults with the settings of a {@code .json} or {@code .properties} file applied. A JSON file may group a
   * component's settings ({@code {"silhouetteMatch": {"weight": 3}}}) or give dotted keys; earlier flat names are
   * still read, so settings files written for earlier releases load unchanged.
   *
   * @throws org.morphscout.indexer.MorphscoutException for unknown keys or invalid values, naming the file
   */
  public static ScoreConfig load(Path file) throws IOException {
    return ScoreSettings.apply(DEFAULTS, SettingsFiles.read(file), file.toString());
  }

  /** The general settings (those not tied to one component), in their documented order. */
  static List<ScoreSetting> generalSettings() {
    return Collections.unmodifiableList(GENERAL);
  }

  /** The settings with these values replaced; validated as a whole. */
  ScoreConfig with(Map<ScoreSetting, Double> values) {
    double[][] c = new double[components.length][];
    for (int i = 0; i < c.length; i++) {
      c[i] = components[i].clone();
    }
    double[] g = general.clone();
    values.forEach((s, v) -> {
      if (s.row() == ScoreSetting.GENERAL) {
        g[s.slot()] = v;
      } else {
        c[s.row()][s.slot()] = v;
      }
    });
    return new ScoreConfig(c, g);
  }

  /** Why the values do not fit together, or null. Each value is checked against its range first. */
  private String problem() {
    List<ScoreSetting> settings = new ArrayList<>(GENERAL);
    for (PairComponent c : PairComponent.all()) {
      settings.addAll(c.settings());
    }
    for (ScoreSetting s : settings) {
      String p = s.problem(value(s));
      if (p != null) {
        return s.key() + " " + p;
      }
    }
    double sum = 0;
    for (PairComponent c : PairComponent.all()) {
      sum += weight(c);
    }
    if (!(sum > 0)) {
      return "at least one sub-score weight must be positive";
    }
    for (PairComponent c : PairComponent.all()) {
      String p = c.problem(this);
      if (p != null) {
        return p;
      }
    }
    if (warnScore() > passScore()) {
      return WARN_SCORE.key() + " must be at most " + PASS_SCORE.key() + ", got " + ScoreSetting.number(warnScore())
          + " and " + ScoreSetting.number(passScore());
    }
    return null;
  }

  private static ScoreConfig defaults() {
    PairComponent[] all = PairComponent.all();
    double[][] c = new double[all.length][];
    for (PairComponent p : all) {
      List<ScoreSetting> settings = p.settings();
      c[p.ordinal()] = new double[settings.size()];
      for (ScoreSetting s : settings) {
        c[p.ordinal()][s.slot()] = s.defaultValue();
      }
    }
    double[] g = new double[GENERAL.size()];
    for (ScoreSetting s : GENERAL) {
      g[s.slot()] = s.defaultValue();
    }
    return new ScoreConfig(c, g);
  }

  private static ScoreSetting general(String key, double defaultValue, Bounds bounds, boolean whole, String meaning) {
    ScoreSetting s = new ScoreSetting(key, defaultValue, bounds, whole, meaning, List.of(), ScoreSetting.GENERAL,
        GENERAL.size());
    GENERAL.add(s);
    return s;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof ScoreConfig other && Arrays.deepEquals(components, other.components)
        && Arrays.equals(general, other.general);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.deepHashCode(components) + Arrays.hashCode(general);
  }

  @Override
  public String toString() {
    StringJoiner j = new StringJoiner(", ", "ScoreConfig[", "]");
    for (ScoreSetting s : ScoreSettings.all()) {
      j.add(s.key() + "=" + ScoreSetting.number(value(s)));
    }
    return j.toString();
  }
}
