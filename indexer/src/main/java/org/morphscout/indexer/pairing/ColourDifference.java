package org.morphscout.indexer.pairing;

/**
 * A colour difference between two CIELAB colours {L*, a*, b*}. The pair scorer is written against this role so the
 * formula can be chosen by the caller: production wires CIEDE2000 (Sharma, Wu and Dalal 2005, "The CIEDE2000
 * color-difference formula", Color Research and Application 30(1)); tests may use CIE76 (Euclidean distance in
 * CIELAB). Implementations must be thread-safe.
 */
@FunctionalInterface
public interface ColourDifference {
  /** The difference in delta-E units; 0 for equal colours, about 2.3 a just noticeable difference. */
  double deltaE(double[] lab1, double[] lab2);

  /** CIE76: Euclidean distance in CIELAB (CIE 1976). Simple and adequate for tests; CIEDE2000 is preferred. */
  static ColourDifference cie76() {
    return (p, q) -> Math.sqrt((p[0] - q[0]) * (p[0] - q[0]) + (p[1] - q[1]) * (p[1] - q[1])
        + (p[2] - q[2]) * (p[2] - q[2]));
  }
}
