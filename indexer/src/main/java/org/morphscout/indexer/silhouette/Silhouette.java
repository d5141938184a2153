package org.morphscout.indexer.silhouette;

/**
 * The object's silhouette in one image, at analysis resolution.
 *
 * @param mask the kept object (largest component, holes filled)
 * @param components number of sizeable foreground components found before keeping the largest (more than 1 means
 *     several objects)
 * @param touchesFrame whether the kept object touches the image border (likely cut off by the frame)
 * @param coverage object area over image area, in [0, 1]
 * @param confidence how well object and background separate, in [0, 1] (1 = cleanly separated)
 * @param source which extractor made it ("alpha", "border-model", "learned")
 */
public record Silhouette(
    Mask mask, int components, boolean touchesFrame, double coverage, double confidence, String source) {

  public Silhouette {
    if (components < 0) {
      throw new IllegalArgumentException("components must be >= 0");
    }
    if (!(coverage >= 0 && coverage <= 1) || !(confidence >= 0 && confidence <= 1)) {
      throw new IllegalArgumentException("coverage and confidence must be in [0, 1]");
    }
  }

  /** This silhouette with its mask shrunk to at most {@code longSide} pixels (see {@link Mask#shrunk}). */
  public Silhouette shrunk(int longSide) {
    Mask small = mask.shrunk(longSide);
    return small == mask ? this : new Silhouette(small, components, touchesFrame, coverage, confidence, source);
  }

  /**
   * What made a silhouette, in the words people read: the border model's stored name ("border-model") is shown as
   * "classical", the setting that picks it; "learned" and "alpha" as stored. One rule for the command line and the
   * browser.
   */
  public static String sourceWord(String stored) {
    return "border-model".equals(stored) ? "classical" : stored;
  }

  /** Confidence under which a silhouette counts as uncertain: scores and verdicts that use it say so. */
  public static final double UNCERTAIN_BELOW = 0.45;

  /** Whether this silhouette is too doubtful to score a shape by (an empty one is not uncertain: it is absent). */
  public boolean uncertain() {
    return !isEmpty() && confidence < UNCERTAIN_BELOW;
  }

  /** Whether a usable object was found at all. */
  public boolean isEmpty() {
    return mask.area() == 0;
  }
}
