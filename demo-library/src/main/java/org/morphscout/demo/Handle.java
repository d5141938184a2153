package org.morphscout.demo;

/**
 * A pulled handle on one side of a vessel, seen in profile: a C-shaped strap from an upper to a lower attachment.
 *
 * @param upperFraction where the strap leaves the body, as a fraction of the vessel height, in (0, 1]
 * @param lowerFraction where it rejoins the body, fraction of height, in [0, upperFraction)
 * @param reachCm how far the strap stands out from the widest attachment point, centimetres, &gt;= 0
 * @param thicknessCm strap thickness in centimetres, &gt;= 0; below {@link #MIN_THICKNESS_CM} there is no handle
 */
public record Handle(double upperFraction, double lowerFraction, double reachCm, double thicknessCm) {
  /** Straps thinner than this (cm) are not drawn: it is how a handle fades out in a blend. */
  public static final double MIN_THICKNESS_CM = 0.2;

  /** No handle. */
  public static final Handle NONE = new Handle(0.8, 0.4, 0, 0);

  public Handle {
    if (!(upperFraction > 0 && upperFraction <= 1)) {
      throw new IllegalArgumentException("handle upperFraction must be in (0, 1]: " + upperFraction);
    }
    if (!(lowerFraction >= 0 && lowerFraction < upperFraction)) {
      throw new IllegalArgumentException("handle lowerFraction must be in [0, upperFraction): " + lowerFraction);
    }
    if (!(reachCm >= 0) || !(thicknessCm >= 0) || Double.isInfinite(reachCm) || Double.isInfinite(thicknessCm)) {
      throw new IllegalArgumentException("handle reach and thickness must be finite and >= 0");
    }
  }

  public boolean present() {
    return thicknessCm >= MIN_THICKNESS_CM;
  }

  /**
   * Station-wise mix of two handles, {@code t} in [0, 1]. When only one side has a handle, its strap keeps its
   * attachment points while reach and thickness shrink with its weight, so the handle melts into the body instead
   * of popping away: silhouettes stay continuous in {@code t} (up to the last {@link #MIN_THICKNESS_CM} strap).
   */
  static Handle blend(Handle a, Handle b, double t) {
    if (a.present() && b.present()) {
      return new Handle(lerp(a.upperFraction, b.upperFraction, t), lerp(a.lowerFraction, b.lowerFraction, t),
          lerp(a.reachCm, b.reachCm, t), lerp(a.thicknessCm, b.thicknessCm, t));
    }
    Handle h = NONE;
    if (a.present()) {
      h = faded(a, 1 - t);
    } else if (b.present()) {
      h = faded(b, t);
    }
    return h.present() ? h : NONE;
  }

  /** Reach shrinks with the weight, thickness with its square root, so a fading strap stays sturdy. */
  private static Handle faded(Handle h, double weight) {
    return new Handle(h.upperFraction, h.lowerFraction, h.reachCm * weight, h.thicknessCm * Math.sqrt(weight));
  }

  Handle scaled(double factor) {
    return new Handle(upperFraction, lowerFraction, reachCm * factor, thicknessCm * factor);
  }

  /** Linear mix written so that t = 0 and t = 1 return a and b exactly. */
  static double lerp(double a, double b, double t) {
    return (1 - t) * a + t * b;
  }
}
