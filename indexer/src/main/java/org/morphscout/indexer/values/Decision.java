package org.morphscout.indexer.values;

/**
 * The user's decision on a pair, with the images that now hold its pictures.
 *
 * @param imageA the catalog image holding picture A (one not missing when there is one), or -1 when none does
 * @param pathA that image's path, or A's path at decision time when no image holds the picture any more
 */
public record Decision(long imageA, String pathA, long imageB, String pathB, DecisionKind kind, String note,
    String decidedAt) {}
