package org.morphscout.indexer.values;

/**
 * How a catalog's vector index is split into segments, each a graph that every search visits.
 *
 * @param count segments in the last commit
 * @param images live images in all segments
 * @param outsideLargest live images outside the largest segment
 * @param deleted replaced or removed images whose space a merge would reclaim
 */
public record VectorSegments(int count, int images, int outsideLargest, int deleted) {}
