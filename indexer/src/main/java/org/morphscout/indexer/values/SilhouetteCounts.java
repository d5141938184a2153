package org.morphscout.indexer.values;

import java.util.SortedMap;

/**
 * Silhouettes of the ready images, counted by what made them ("alpha", "classical", "learned"), and how many of
 * them are uncertain (an object was found, with a confidence below
 * {@link org.morphscout.indexer.silhouette.Silhouette#UNCERTAIN_BELOW}).
 *
 * @param bySource counts by extractor, sorted by name
 * @param uncertain how many are uncertain
 */
public record SilhouetteCounts(SortedMap<String, Integer> bySource, int uncertain) {}
