package org.morphscout.indexer.library;

import java.io.IOException;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.values.VectorSegments;
import org.morphscout.indexer.vector.LuceneVectorIndex;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Keeps a catalog's vector index close to one graph. Lucene writes a new segment each time its indexing buffer fills
 * and leaves several large segments unmerged; every search visits every segment's graph, so at 1,000,000 images of
 * 1024 dimensions three segments made queries 2.4 times as costly as one (docs/BENCHMARKS.md). After a run that
 * changed the index, the index is merged into one segment when at least {@value #OUTSIDE_SHARE_PERCENT}% of its
 * images lie outside the largest segment.
 *
 * <p>Why a share and not "always": a merge rewrites every vector, so even a small one has a fixed cost that grows with
 * the library (about 40 s at 1,000,000 x 1024 for 1,000 new images), and merging away deletions from the largest
 * segment rebuilds its graph. With the share, the merge's cost stays a small part of the analysis that produced the
 * images outside the largest segment (a merge costs milliseconds per vector; the analysis, a fifth of a second per
 * photo and more).
 */
final class SegmentMerge {
  static final int OUTSIDE_SHARE_PERCENT = 10;
  private static final Logger LOG = LoggerFactory.getLogger(SegmentMerge.class);

  private SegmentMerge() {}

  /** Whether an index split like {@code segments} is worth merging into one. */
  static boolean worthMerging(VectorSegments segments) {
    return segments.count() > 1 && segments.outsideLargest() * 100L >= OUTSIDE_SHARE_PERCENT * (long) segments.images();
  }

  /**
   * Merges {@code index} (committed) into one segment when {@link #worthMerging} says so, and commits. Returns whether
   * it merged.
   *
   * @throws CancellationToken.CancelledException when cancelled during the merge: the merge is abandoned and the index
   *     keeps its last commit, but is closed for writing (the run stops anyway); a process killed during the merge
   *     also leaves the last commit intact
   */
  static boolean mergeIfWorthIt(LuceneVectorIndex index, ProgressListener progress, CancellationToken cancel)
      throws IOException {
    VectorSegments before = index.segments();
    if (!worthMerging(before)) {
      return false;
    }
    progress.phase("merging the vector index", -1);
    long start = System.nanoTime();
    if (!index.mergeIntoOne(cancel::isCancelled)) {
      throw new CancellationToken.CancelledException();
    }
    LOG.info("merged the vector index: {} segments into one ({} images, {} outside the largest segment) in {} s",
        before.count(), before.images(), before.outsideLargest(), (System.nanoTime() - start) / 1_000_000_000L);
    return true;
  }
}
