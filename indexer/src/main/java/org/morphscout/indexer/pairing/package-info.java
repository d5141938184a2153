/**
 * Pair scoring: how well one image morphs into another, in a 0..100 score with a pass/warn/fail verdict and
 * plain-language reasons, and the search for the best pairs of a library.
 *
 * <p>{@link org.morphscout.indexer.pairing.PairScorer} combines shape (silhouette match: the IoU after a similarity alignment; warp
 * effort and fold risk from {@link org.morphscout.indexer.warp}), appearance (cosine distance of appearance
 * vectors), colour and style (colour difference of the foreground means — CIEDE2000 in production, Sharma, Wu and
 * Dalal 2005, Color Research and Application 30(1) — lightness gap, ratio of standard deviations) and framing
 * (aspect ratios, resolution, object scale and placement, object cut off, several objects, background) as a weighted
 * geometric mean of sub-scores with penalty factors for framing faults. Each sub-score is defined once, in
 * {@link org.morphscout.indexer.pairing.PairComponent} (key, column title, measure, settings with defaults and
 * ranges, formula, reason); {@link org.morphscout.indexer.pairing.ScoreSettings} lists every
 * {@link org.morphscout.indexer.pairing.ScoreSetting} and reads them into a validated
 * {@link org.morphscout.indexer.pairing.ScoreConfig}. {@link org.morphscout.indexer.pairing.NearDuplicates} keeps
 * the same picture twice out of the pairs. {@link org.morphscout.indexer.pairing.PairFinder} proposes candidates
 * through a {@link org.morphscout.indexer.pairing.CandidateSource} (the appearance index) and re-scores them
 * exactly in parallel.
 *
 * <p>This package is API for the command line and the desktop browser. All classes are immutable and thread-safe.
 */
package org.morphscout.indexer.pairing;
