package org.morphscout.indexer.pairing;

/**
 * What a pair search looks for. Validated on construction.
 *
 * @param candidatesPerImage candidates asked of the {@link CandidateSource} per image, 1..1000 (default 20); more
 *     finds pairs the appearance index ranks lower, at linear cost
 * @param topN most pairs returned, at least 1 (default 50)
 * @param minScore pairs below this score (0..100) are dropped (default 40, the default warn threshold)
 */
public record PairQuery(int candidatesPerImage, int topN, double minScore) {
  public static final PairQuery DEFAULTS = new PairQuery(20, 50, 40);

  public PairQuery {
    if (candidatesPerImage < 1 || candidatesPerImage > 1000) {
      throw new IllegalArgumentException("candidates per image must be 1..1000, got " + candidatesPerImage);
    }
    if (topN < 1) {
      throw new IllegalArgumentException("topN must be at least 1, got " + topN);
    }
    if (!(minScore >= 0 && minScore <= 100)) {
      throw new IllegalArgumentException("minScore must be in [0, 100], got " + minScore);
    }
  }
}
