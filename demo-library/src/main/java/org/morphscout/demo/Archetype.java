package org.morphscout.demo;

/**
 * The named vessel shapes of the catalogue. Station values (cm) were drawn by eye to read as each kind of pot; they
 * are invented, not measured from any real object. Stations run foot, lower body, belly, shoulder, neck base,
 * neck top, lip.
 */
public enum Archetype {
  /** Baluster vase: full belly, narrow neck, flared lip. */
  VASE("vase", "vases",
      new double[] {0, 2.5, 9, 17, 23, 27, 30},
      new double[] {4.2, 6.0, 8.6, 7.6, 4.4, 3.9, 5.0}, Handle.NONE, Handle.NONE),
  /** Amphora-like vase: small foot, high broad belly, two loop handles. */
  AMPHORA("amphora", "vases",
      new double[] {0, 3, 12, 21, 27, 31, 34},
      new double[] {2.6, 4.2, 9.6, 8.8, 3.8, 3.3, 4.6},
      new Handle(0.86, 0.62, 2.2, 1.0), new Handle(0.86, 0.62, 2.2, 1.0)),
  /** Jug: wide body, short neck, one strap handle. */
  JUG("jug", "jugs",
      new double[] {0, 2, 8, 14, 18.5, 21.5, 23},
      new double[] {5.2, 6.6, 8.0, 7.1, 5.6, 5.5, 6.2}, new Handle(0.84, 0.42, 3.6, 1.3), Handle.NONE),
  /** Bottle: round shoulder, long narrow neck. */
  BOTTLE("bottle", "bottles",
      new double[] {0, 2, 8, 14, 18, 24, 28},
      new double[] {4.6, 5.6, 6.4, 6.0, 2.3, 1.5, 1.9}, Handle.NONE, Handle.NONE),
  /** Flared bowl: small foot, wide open rim. */
  BOWL("bowl", "bowls",
      new double[] {0, 0.8, 2.6, 5, 7.2, 9, 10},
      new double[] {3.6, 4.6, 8.0, 10.8, 12.4, 13.2, 13.5}, Handle.NONE, Handle.NONE),
  /** Cup: near-straight wall, one small handle. */
  CUP("cup", "cups",
      new double[] {0, 0.8, 3, 5.5, 7.8, 9.2, 10},
      new double[] {2.9, 3.5, 4.0, 4.15, 4.3, 4.45, 4.6}, new Handle(0.82, 0.30, 2.4, 0.8), Handle.NONE),
  /** Storage jar: broad shoulders, short wide neck. */
  JAR("jar", "jars",
      new double[] {0, 2.5, 8.5, 14.5, 18, 19.6, 21},
      new double[] {5.8, 8.2, 10.2, 9.6, 6.6, 6.2, 6.7}, Handle.NONE, Handle.NONE);

  private final String noun;
  private final String productLine;
  private final VesselProfile profile;

  Archetype(String noun, String productLine, double[] h, double[] r, Handle right, Handle left) {
    this.noun = noun;
    this.productLine = productLine;
    this.profile = new VesselProfile(h, r, right, left);
  }

  /** Lower-case noun used in file names, e.g. {@code "vase"}. */
  public String noun() {
    return noun;
  }

  /** Folder of the product line this shape is sold under, e.g. {@code "vases"}. */
  public String productLine() {
    return productLine;
  }

  public VesselProfile profile() {
    return profile;
  }
}
