package org.morphscout.indexer.pairing;

import java.util.Optional;
import java.util.function.ToDoubleFunction;

/**
 * The sub-scores a pair score combines: one definition of each (its key in JSON, settings and the browser, its
 * column title, its weight, and how it is derived from the {@link PairFacts}), in the fixed order they are reported
 * in. Every sub-score is in [0, 1], higher is better; NaN means its inputs are missing and it is left out. See
 * {@link ScoreConfig} for the formulas' defaults.
 */
public enum PairComponent {
  /** How well the silhouettes cover each other after alignment: the aligned IoU (measure {@code alignedIou}). */
  SILHOUETTE_MATCH("silhouetteMatch", "Silhouette", true, ScoreConfig::silhouetteMatchWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp((f.warp().iouAligned() - c.iouZero()) / (c.iouFull() - c.iouZero()));
    }
  },
  WARP_EFFORT("warpEffort", "Warp", true, ScoreConfig::warpEffortWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return Math.exp(-f.warp().meanDisplacement() / c.effortScale());
    }
  },
  FOLD_SAFETY("foldSafety", "Folds", true, ScoreConfig::foldSafetyWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.warp().foldFraction() / c.foldTolerance());
    }
  },
  APPEARANCE("appearance", "Appearance", false, ScoreConfig::appearanceWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.measures().appearanceDistance() / c.appearanceScale());
    }
  },
  COLOUR("colour", "Colour", false, ScoreConfig::colourWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.measures().deltaE00() / c.deltaEScale());
    }
  },
  LIGHTNESS("lightness", "Lightness", false, ScoreConfig::lightnessWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      PairMeasures m = f.measures();
      return clamp(1 - Math.abs(m.lightnessA() - m.lightnessB()) / c.lightnessScale());
    }
  },
  CONTRAST("contrast", "Contrast", false, ScoreConfig::contrastWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(f.measures().stdRatio());
    }
  },
  ASPECT("aspect", "Aspect", false, ScoreConfig::aspectWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.measures().aspectRatioGap() / c.aspectScale());
    }
  },
  RESOLUTION("resolution", "Resolution", false, ScoreConfig::resolutionWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(f.measures().resolutionRatio() / c.resolutionFull());
    }
  },
  OBJECT_SCALE("objectScale", "Scale", false, ScoreConfig::objectScaleWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(f.measures().scaleRatio() / c.scaleFull());
    }
  },
  PLACEMENT("placement", "Placement", false, ScoreConfig::placementWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.measures().offset() / c.offsetScale());
    }
  },
  BACKGROUND("background", "Background", false, ScoreConfig::backgroundWeight) {
    @Override
    double subScore(PairFacts f, ScoreConfig c) {
      return clamp(1 - f.measures().backgroundDeltaE() / c.backgroundScale());
    }
  };

  private static final PairComponent[] ALL = values();

  private final String key;
  private final String title;
  private final boolean fromWarp;
  private final ToDoubleFunction<ScoreConfig> weight;

  PairComponent(String key, String title, boolean fromWarp, ToDoubleFunction<ScoreConfig> weight) {
    this.key = key;
    this.title = title;
    this.fromWarp = fromWarp;
    this.weight = weight;
  }

  /** The name used in JSON and CSV keys, settings ({@code <key>Weight}) and the browser. */
  public String key() {
    return key;
  }

  /** The short column title in the browser's pairs table (one word, so the column stays narrow). */
  public String title() {
    return title;
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

  public double weight(ScoreConfig config) {
    return weight.applyAsDouble(config);
  }

  /**
   * The sub-score in [0, 1] of a measurable pair ({@link PairFacts#measurable()}), NaN when its inputs are missing.
   * A warp sub-score needs {@link PairFacts#warped()}.
   */
  abstract double subScore(PairFacts f, ScoreConfig config);

  /** All components in their reporting order (a shared array: do not modify). */
  static PairComponent[] all() {
    return ALL;
  }

  /** NaN stays NaN (a missing input); everything else is clamped to [0, 1]. */
  private static double clamp(double v) {
    return Double.isNaN(v) ? v : v < 0 ? 0 : (v > 1 ? 1 : v);
  }
}
