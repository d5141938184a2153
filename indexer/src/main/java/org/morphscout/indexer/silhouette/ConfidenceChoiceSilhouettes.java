package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;
import java.util.Objects;
import java.util.function.Supplier;

/**
 * Chooses, per image, between the classical silhouette (alpha cut-out, else the border background model) and the
 * learned salient-object one, by a trust computed from what the image shows:
 *
 * <ul>
 *   <li>each extractor's own confidence (separation of object and border statistics for the classical one, how
 *       decisive, that is how bimodal, the learned map is);
 *   <li>lowered when the mask touches the frame, when it is in several pieces, and when it covers almost nothing or
 *       almost everything;
 *   <li>raised when the mask is in one piece, clear of the frame and left-right mirror-symmetric
 *       ({@link Mask#mirrorSymmetry()}): a mask that found only part of an object (its lit side, one glaze, the
 *       body without the neck) is rarely symmetric, while whole vessels, bottles, fruit and most product shots are.
 *       On the demo library every classical mask raised so (17 of the 88 that reached the model before) agreed with
 *       the learned one (IoU 0.81 to 0.99, most above 0.95), and on the real photographs of the test suite the two
 *       wrong classical masks the model must replace (an orange's lit half, a blurred clock's core) are below the
 *       symmetry limit (0.81 and 0.77);
 *   <li>raised for both when the two masks agree (IoU), lowered for both when they disagree.
 * </ul>
 *
 * <p>The learned model runs only where the classical trust is below {@link Options#learnedBelow()}, which keeps the
 * cost near the classical one on clean pictures. The answer carries the winning trust as its confidence; below
 * {@link Silhouette#UNCERTAIN_BELOW} the silhouette counts as uncertain. Thread-safe when the learned extractor is.
 */
public final class ConfidenceChoiceSilhouettes implements SilhouetteExtractor {
  /**
   * Settings.
   *
   * @param learnedBelow classical trust under which the learned model is also run, in [0, 1]
   * @param framePenalty factor on the trust of a mask touching the frame, in [0, 1]
   * @param piecesPenalty factor on the trust of a mask in several pieces, in [0, 1]
   * @param extremeCoverage a mask covering less than this fraction, or more than 1 minus it, gets half the trust
   * @param symmetricAbove mirror symmetry from which a mask in one piece and clear of the frame counts as whole, in
   *     [0, 1] (default 0.9)
   * @param symmetryBonus trust added to such a mask, in [0, 1] (default 0.15: lifts the classical masks of trust 0.6
   *     and more over {@code learnedBelow})
   */
  public record Options(double learnedBelow, double framePenalty, double piecesPenalty, double extremeCoverage,
      double symmetricAbove, double symmetryBonus) {
    public static final Options DEFAULTS = new Options(0.75, 0.75, 0.85, 0.02, 0.9, 0.15);

    public Options {
      for (double v : new double[] {learnedBelow, framePenalty, piecesPenalty, symmetricAbove, symmetryBonus}) {
        if (!(v >= 0 && v <= 1)) {
          throw new IllegalArgumentException("silhouette choice factors must be in [0, 1], got " + v);
        }
      }
      if (!(extremeCoverage >= 0 && extremeCoverage < 0.5)) {
        throw new IllegalArgumentException("extremeCoverage must be in [0, 0.5), got " + extremeCoverage);
      }
    }
  }

  private final SilhouetteExtractor classical;
  private final Supplier<SilhouetteExtractor> learned;
  private final Options options;

  /**
   * @param classical the classical extractor
   * @param learned the learned extractor, asked for only when needed (so the model loads on first use)
   */
  public ConfidenceChoiceSilhouettes(SilhouetteExtractor classical, Supplier<SilhouetteExtractor> learned,
      Options options) {
    this.classical = Objects.requireNonNull(classical, "classical");
    this.learned = Objects.requireNonNull(learned, "learned");
    this.options = Objects.requireNonNull(options, "options");
  }

  @Override
  public Silhouette extract(BufferedImage image) {
    Silhouette c = classical.extract(image);
    double ct = trust(c);
    if (ct >= options.learnedBelow() || "alpha".equals(c.source())) {
      return withConfidence(c, ct);
    }
    Silhouette l = learned.get().extract(image);
    double lt = trust(l);
    if (!c.isEmpty() && !l.isEmpty() && c.mask().width() == l.mask().width()
        && c.mask().height() == l.mask().height()) {
      // Agreement is evidence for both; IoU 0.7 is neutral.
      double shift = 0.5 * (c.mask().iou(l.mask()) - 0.7);
      ct = clamp(ct + shift);
      lt = clamp(lt + shift);
    }
    return lt > ct ? withConfidence(l, lt) : withConfidence(c, ct);
  }

  /** The trust of one extractor's answer, in [0, 1]. */
  double trust(Silhouette s) {
    if (s.isEmpty()) {
      return 0;
    }
    double t = s.confidence();
    if (s.touchesFrame()) {
      t *= options.framePenalty();
    }
    if (s.components() > 1) {
      t *= options.piecesPenalty();
    }
    if (s.coverage() < options.extremeCoverage() || s.coverage() > 1 - options.extremeCoverage()) {
      t *= 0.5;
    } else if (!s.touchesFrame() && s.components() == 1 && s.mask().mirrorSymmetry() >= options.symmetricAbove()) {
      t += options.symmetryBonus();
    }
    return clamp(t);
  }

  private static Silhouette withConfidence(Silhouette s, double confidence) {
    return new Silhouette(s.mask(), s.components(), s.touchesFrame(), s.coverage(), confidence, s.source());
  }

  private static double clamp(double v) {
    return Math.max(0, Math.min(1, v));
  }

  @Override
  public String name() {
    return "choice-of-" + classical.name() + "-or-learned";
  }
}
