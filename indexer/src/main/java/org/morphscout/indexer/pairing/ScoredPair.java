package org.morphscout.indexer.pairing;

/**
 * A scored pair of catalog images; {@code a} is the image the morph starts from.
 */
public record ScoredPair(long a, long b, PairScore score) {}
