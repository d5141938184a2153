package org.morphscout.indexer.pairing;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.morphscout.indexer.pairing.ScoreSetting.Bounds;

/**
 * The sub-scores a pair score combines, in the fixed order they are reported in: the one definition of each. A
 * component carries its key (in JSON, CSV, settings and the browser), its column title, the measure it is made from
 * (key, unit, and whether lower or higher is better), its settings (weight, reason threshold and its formula's own
 * numbers, each with default and accepted values, keys {@code <key>.weight}, {@code <key>.reason},
 * {@code <key>.<name>}), its sub-score formula and the reason written when its measure crosses the threshold.
 * Every sub-score is in [0, 1], higher is better; NaN means its inputs are missing and it is left out.
 *
 * <p>Adding a sub-score means adding one constant here, plus its measure in {@link PairMeasures} or
 * {@link WarpMeasures} (and the stored pairs' columns, with a new {@code PairMeasurer.VERSION}); the scorer, the
 * settings, the reasons, JSON, CSV, the documentation and the browser follow from it.
 */
public enum PairComponent {
  /**
   * How well the silhouettes cover each other after a similarity alignment: the aligned IoU mapped linearly from
   * {@code zero} (scores 0) to {@code full} (scores 1). The most telling single measure of a morph. Its weight was
   * called {@code overlapWeight} before.
   */
  SILHOUETTE_MATCH("silhouetteMatch", "Silhouette", true, 3.0, List.of("overlapWeight"),
      new Measure("alignedIou", "aligned IoU, 0 to 1", Direction.SIMILARITY), 0.6, Bounds.between(0, 1),
      "reasonIou") {
    private final ScoreSetting zero = param("zero", 0.3, Bounds.between(0, 1), "iouZero",
        "the aligned IoU that scores 0");
    private final ScoreSetting full = param("full", 0.95, Bounds.between(0, 1), "iouFull",
        "the aligned IoU that scores 1 (above silhouetteMatch.zero)");

    @Override
    double measure(PairFacts f) {
      return f.warp().iouAligned();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp((measure(f) - c.value(zero)) / (c.value(full) - c.value(zero)));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("silhouettes match poorly after alignment (aligned IoU %.2f)", measure(f));
    }

    @Override
    String problem(ScoreConfig c) {
      return c.value(zero) < c.value(full) ? null : zero.key() + " must be below " + full.key() + ", got "
          + ScoreSetting.number(c.value(zero)) + " and " + ScoreSetting.number(c.value(full));
    }
  },
  /** How far the outline must move to match: exp(-mean displacement / {@code scale}). */
  WARP_EFFORT("warpEffort", "Warp", true, 1.5, List.of(),
      new Measure("meanDisplacement", "mean displacement, fraction of the object's size", Direction.DISTANCE),
      0.15, Bounds.positive(), "reasonEffort") {
    private final ScoreSetting scale = param("scale", 0.15, Bounds.positive(), "effortScale",
        "the mean displacement (fraction of the object's size) at which the sub-score falls to 1/e");

    @Override
    double measure(PairFacts f) {
      return f.warp().meanDisplacement();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return Math.exp(-measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("the outline must move a lot to match (on average %.0f%% of the object's size)", 100 * measure(f));
    }
  },
  /** How little of the picture the warp folds over itself: 1 - fold fraction / {@code tolerance}, floored at 0. */
  FOLD_SAFETY("foldSafety", "Folds", true, 1.0, List.of(),
      new Measure("foldFraction", "fraction of the object folded over, where the Jacobian determinant is <= 0", Direction.DISTANCE),
      0.01, Bounds.between(0, 1), "reasonFold") {
    private final ScoreSetting tolerance = param("tolerance", 0.05, Bounds.aboveZeroToOne(), "foldTolerance",
        "the fold fraction that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.warp().foldFraction();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(tolerance));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("the warp would fold the picture over itself (%.0f%% of the object)", 100 * measure(f));
    }
  },
  /** How alike the pictures look: 1 - (1 - cosine of the appearance vectors) / {@code scale}, floored at 0. */
  APPEARANCE("appearance", "Appearance", false, 1.5, List.of(),
      new Measure("appearanceDistance", "1 - cosine of the appearance vectors, 0 to 2", Direction.DISTANCE),
      0.5, Bounds.between(0, 2), "reasonAppearance") {
    private final ScoreSetting scale = param("scale", 0.6, Bounds.positive(), "appearanceScale",
        "the appearance distance that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.measures().appearanceDistance();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("the pictures look different (appearance distance %.2f)", measure(f));
    }
  },
  /** How close the objects' colours are: 1 - ΔE00 of the foreground means / {@code scale}. */
  COLOUR("colour", "Colour", false, 1.0, List.of(),
      new Measure("deltaE00", "CIEDE2000 of the objects' mean colours", Direction.DISTANCE),
      20, Bounds.positive(), "reasonDeltaE") {
    private final ScoreSetting scale = param("scale", 40, Bounds.positive(), "deltaEScale",
        "the colour difference (ΔE00) that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.measures().deltaE00();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("large colour gap (ΔE00 %.0f)", measure(f));
    }
  },
  /** How close the objects' lightness is: 1 - |L* first - L* second| / {@code scale}. */
  LIGHTNESS("lightness", "Lightness", false, 0.75, List.of(),
      new Measure("lightnessGap", "difference of the objects' mean L*, 0 to 100", Direction.DISTANCE),
      40, Bounds.positive(), "reasonLightness") {
    private final ScoreSetting scale = param("scale", 50, Bounds.positive(), "lightnessScale",
        "the lightness gap (L*) that scores 0");

    @Override
    double measure(PairFacts f) {
      return Math.abs(f.measures().lightnessA() - f.measures().lightnessB());
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      PairMeasures m = f.measures();
      String words = m.lightnessA() < m.lightnessB() ? "dark vs bright" : "bright vs dark";
      return fmt(words + " (L* %.0f vs %.0f)", m.lightnessA(), m.lightnessB());
    }
  },
  /** How alike the objects' contrast is: the ratio of their L* standard deviations, smaller over larger. */
  CONTRAST("contrast", "Contrast", false, 0.5, List.of(),
      new Measure("stdRatio", "smaller over larger L* standard deviation of the objects, 0 to 1",
          Direction.SIMILARITY),
      0.4, Bounds.between(0, 1), "reasonContrast") {
    @Override
    double measure(PairFacts f) {
      return f.measures().stdRatio();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(measure(f));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("contrast differs (L* spread %.0f vs %.0f)", f.measures().stdA(), f.measures().stdB());
    }
  },
  /** How alike the frames' shapes are: 1 - |ln(aspect first / aspect second)| / {@code scale}. */
  ASPECT("aspect", "Aspect", false, 0.5, List.of(),
      new Measure("aspectRatioGap", "|ln| of the ratio of the pictures' aspect ratios", Direction.DISTANCE),
      0.1, Bounds.positive(), "reasonAspect") {
    private final ScoreSetting scale = param("scale", 0.7, Bounds.positive(), "aspectScale",
        "the aspect ratio gap (|ln ratio|) that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.measures().aspectRatioGap();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return "aspect ratios differ (" + AspectRatios.describe(f.first().width(), f.first().height()) + " vs "
          + AspectRatios.describe(f.second().width(), f.second().height()) + ")";
    }
  },
  /** How alike the pictures' sizes are: sqrt(pixel count ratio) / {@code full}, capped at 1. */
  RESOLUTION("resolution", "Resolution", false, 0.25, List.of(),
      new Measure("resolutionRatio", "sqrt of smaller over larger pixel count, 0 to 1", Direction.SIMILARITY),
      0.25, Bounds.between(0, 1), "reasonResolution") {
    private final ScoreSetting full = param("full", 0.5, Bounds.aboveZeroToOne(), "resolutionFull",
        "the resolution ratio that scores 1");

    @Override
    double measure(PairFacts f) {
      return f.measures().resolutionRatio();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(measure(f) / c.value(full));
    }

    @Override
    String reasonText(PairFacts f) {
      ImageFacts a = f.first();
      ImageFacts b = f.second();
      return "resolutions differ a lot (" + a.width() + "x" + a.height() + " vs " + b.width() + "x" + b.height()
          + " px)";
    }
  },
  /** How alike the objects' sizes in their frames are: sqrt(area fraction ratio) / {@code full}, capped at 1. */
  OBJECT_SCALE("objectScale", "Scale", false, 0.5, List.of(),
      new Measure("scaleRatio", "sqrt of smaller over larger share of the picture the object fills, 0 to 1",
          Direction.SIMILARITY),
      0.5, Bounds.between(0, 1), "reasonScale") {
    private final ScoreSetting full = param("full", 0.8, Bounds.aboveZeroToOne(), "scaleFull",
        "the object scale ratio that scores 1");

    @Override
    double measure(PairFacts f) {
      return f.measures().scaleRatio();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(measure(f) / c.value(full));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("object sizes differ (the object fills %.0f%% vs %.0f%% of the picture)",
          100 * f.first().areaFraction(), 100 * f.second().areaFraction());
    }
  },
  /** How alike the objects' places in their frames are: 1 - centroid distance / {@code scale}. */
  PLACEMENT("placement", "Placement", false, 0.25, List.of(),
      new Measure("offset", "distance of the objects' centroids, in picture fractions", Direction.DISTANCE),
      0.25, Bounds.positive(), "reasonOffset") {
    private final ScoreSetting scale = param("scale", 0.5, Bounds.positive(), "offsetScale",
        "the centroid distance (picture fractions) that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.measures().offset();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return "objects sit in different places of the frame";
    }
  },
  /** How alike the backdrops' colours are: 1 - ΔE00 of the background means / {@code scale}. */
  BACKGROUND("background", "Background", false, 0.25, List.of(),
      new Measure("backgroundDeltaE00", "CIEDE2000 of the backgrounds' mean colours", Direction.DISTANCE),
      25, Bounds.positive(), "reasonBackground") {
    private final ScoreSetting scale = param("scale", 50, Bounds.positive(), "backgroundScale",
        "the background colour difference (ΔE00) that scores 0");

    @Override
    double measure(PairFacts f) {
      return f.measures().backgroundDeltaE();
    }

    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - measure(f) / c.value(scale));
    }

    @Override
    String reasonText(PairFacts f) {
      return fmt("backgrounds differ (ΔE00 %.0f)", measure(f));
    }
  };

  /** Whether lower or higher values of a measure are better. */
  public enum Direction {
    /** Lower is better (a distance, a gap, an effort); its reason is written above the threshold. */
    DISTANCE,
    /** Higher is better (an IoU, a ratio); its reason is written below the threshold. */
    SIMILARITY;

    /** Whether a measure has crossed a reason threshold (never for a missing, NaN, measure). */
    boolean crosses(double measure, double threshold) {
      return this == DISTANCE ? measure > threshold : measure < threshold;
    }
  }

  /**
   * The raw value a sub-score is made from, as the {@code measures} of a pair name it.
   *
   * @param key its key in the {@code measures} object of JSON output
   * @param unit what it is and its unit, for the documentation
   * @param direction whether lower or higher is better
   */
  public record Measure(String key, String unit, Direction direction) {}

  private static final PairComponent[] ALL = values();

  private final String key;
  private final String title;
  private final boolean fromWarp;
  private final Measure measure;
  private final List<ScoreSetting> settings = new ArrayList<>();
  private final ScoreSetting weight;
  private final ScoreSetting reason;

  PairComponent(String key, String title, boolean fromWarp, double weight, List<String> earlierWeightNames,
      Measure measure, double reason, Bounds reasonBounds, String earlierReasonName) {
    this.key = key;
    this.title = title;
    this.fromWarp = fromWarp;
    this.measure = measure;
    List<String> weightNames = new ArrayList<>(List.of(key + "Weight"));
    weightNames.addAll(earlierWeightNames);
    this.weight = add("weight", weight, Bounds.atLeastZero(), weightNames,
        "weight of the " + key + " sub-score in the score (0 leaves it out)");
    this.reason = add("reason", reason, reasonBounds, List.of(earlierReasonName),
        "a reason is written when the " + measure.key() + " measure is "
            + (measure.direction() == Direction.DISTANCE ? "above" : "below") + " this (" + measure.unit() + ")");
  }

  /** The name used in JSON keys, settings ({@code <key>.weight}) and the browser. */
  public String key() {
    return key;
  }

  /** The column of this sub-score in CSV output: the key in snake case, as every CSV header ({@code warp_effort}). */
  public String csvColumn() {
    return key.replaceAll("([A-Z])", "_$1").toLowerCase(Locale.ROOT);
  }

  /** The short column title in the browser's pairs table (one word, so the column stays narrow). */
  public String title() {
    return title;
  }

  /** The measure this sub-score is made from. */
  public Measure measure() {
    return measure;
  }

  /** The component with this {@link #key()}, if any. */
  public static Optional<PairComponent> byKey(String key) {
    for (PairComponent c : ALL) {
      if (c.key.equals(key)) {
        return Optional.of(c);
      }
    }
    return Optional.empty();
  }

  /** Whether the sub-score needs the warp (the costly measure); the others come from cheap measures. */
  public boolean fromWarp() {
    return fromWarp;
  }

  /** This component's settings: weight, reason threshold, then its formula's own numbers. */
  public List<ScoreSetting> settings() {
    return Collections.unmodifiableList(settings);
  }

  /** The setting of this component's weight ({@code <key>.weight}). */
  public ScoreSetting weightSetting() {
    return weight;
  }

  /** The setting of the threshold at which this component's reason is written ({@code <key>.reason}). */
  public ScoreSetting reasonSetting() {
    return reason;
  }

  public double weight(ScoreConfig config) {
    return config.value(weight);
  }

  /** The value of this component's measure (NaN when its inputs are missing). A warp measure needs the warp. */
  abstract double measure(PairFacts f);

  /**
   * The sub-score in [0, 1] of a measurable pair ({@link PairFacts#measurable()}), NaN when its inputs are missing.
   * A warp sub-score needs {@link PairFacts#warped()}.
   */
  abstract double subScore(PairFacts f, ScoreConfig config);

  /** The reason, in words for a photographer with the measure's value, when the measure crossed its threshold. */
  abstract String reasonText(PairFacts f);

  /** The reason of a warped pair, when its measure crossed the threshold. */
  final Optional<String> reason(PairFacts f, ScoreConfig config) {
    return measure.direction().crosses(measure(f), config.value(reason))
        ? Optional.of(reasonText(f)) : Optional.empty();
  }

  /** Why these settings of the component do not fit together, or null when they do. */
  String problem(ScoreConfig config) {
    return null;
  }

  /** Declares one number of the sub-score's formula (in a constant's field, so the formula can read it). */
  final ScoreSetting param(String name, double defaultValue, Bounds bounds, String earlierName, String meaning) {
    return add(name, defaultValue, bounds, List.of(earlierName), meaning);
  }

  private ScoreSetting add(String name, double defaultValue, Bounds bounds, List<String> earlierNames,
      String meaning) {
    ScoreSetting s = new ScoreSetting(key + "." + name, defaultValue, bounds, false, meaning, earlierNames,
        ordinal(), settings.size());
    settings.add(s);
    return s;
  }

  /** All components in their reporting order (a shared array: do not modify). */
  static PairComponent[] all() {
    return ALL;
  }

  /** NaN stays NaN (a missing input); everything else is clamped to [0, 1]. */
  private static double clamp(double v) {
    return Double.isNaN(v) ? v : v < 0 ? 0 : (v > 1 ? 1 : v);
  }

  private static String fmt(String pattern, Object... args) {
    return String.format(Locale.ROOT, pattern, args);
  }
}
