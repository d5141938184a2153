package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.morphscout.indexer.catalog.ImageStore;
import org.morphscout.indexer.ingest.ContentHash;
import org.morphscout.indexer.ingest.FoundFile;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * Compares what a scan found with what the catalog holds and updates the catalog in one transaction: new files are
 * added as pending, changed files set back to pending (counted as replaced: a path that now holds another picture),
 * moved files (same content hash, old path gone) keep their
 * identity, and files no longer found are marked missing. Unchanged files (same size and mtime, or same hash) are left
 * alone.
 */
final class ScanReconciler {
  /** The reason {@code ImageIoDecoder} gives for an image over the pixel cap, with its size. */
  private static final java.util.regex.Pattern TOO_LARGE =
      java.util.regex.Pattern.compile("^image too large: (\\d+)x(\\d+) ");

  private final Library library;
  private final long maxPixels;

  ScanReconciler(Library library) {
    this(library, Long.MAX_VALUE);
  }

  /** @param maxPixels this run's pixel cap: images refused by a lower cap earlier are tried again */
  ScanReconciler(Library library, long maxPixels) {
    this.library = library;
    this.maxPixels = maxPixels;
  }

  /** The outcome: images to analyse, and counts. */
  record Plan(List<ImageRow> toAnalyse, int unchanged, int moved, int replaced, List<Long> nowMissing,
      List<Long> changedReady) {}

  /**
   * @param found per root id, the files found under it
   * @param hashFailures receives files whose hash could not be computed (path, reason)
   */
  /** Removes images from the vector index and commits it (before the catalog stops counting them as ready). */
  @FunctionalInterface
  interface Eviction {
    void evict(List<Long> ids) throws IOException;
  }

  Plan reconcile(Map<Long, List<FoundFile>> found, Map<Path, String> hashFailures) throws IOException {
    return reconcile(found, hashFailures, ids -> { });
  }

  /**
   * @param evict called with the ready images this plan takes out of "ready" (changed or gone), before the catalog
   *     transaction: the vector index lets go of them first, so at no moment (a kill between the two commits) does it
   *     hold an image the catalog does not hold as ready
   */
  Plan reconcile(Map<Long, List<FoundFile>> found, Map<Path, String> hashFailures, Eviction evict)
      throws IOException {
    ImageStore images = library.images();
    Set<String> foundPaths = new HashSet<>();
    found.values().forEach(list -> list.forEach(f -> foundPaths.add(key(f.path()))));

    // Rows that were under a scanned root but are not there any more, or were missing already: move sources.
    Map<String, List<ImageRow>> vanishedByHash = new HashMap<>();
    List<ImageRow> vanished = new ArrayList<>();
    // Every row under the scanned roots, by path: one query per root instead of one per file.
    Map<String, ImageRow> known = new HashMap<>();
    for (long rootId : found.keySet()) {
      for (ImageRow row : images.underRoot(rootId)) {
        known.put(row.path(), row);
        if (!foundPaths.contains(row.path())) {
          vanished.add(row);
        }
      }
    }
    Set<Long> vanishedIds = new HashSet<>();
    vanished.forEach(v -> vanishedIds.add(v.id()));
    for (ImageRow row : images.withStatus(ImageStatus.MISSING)) {
      if (!foundPaths.contains(row.path()) && vanishedIds.add(row.id())) {
        vanished.add(row);
      }
    }
    for (ImageRow row : vanished) {
      if (row.contentHash() != null) {
        vanishedByHash.computeIfAbsent(row.contentHash(), h -> new ArrayList<>()).add(row);
      }
    }

    // Decide per found file (hashing outside the transaction: it reads files).
    List<Runnable> writes = new ArrayList<>();
    List<Long> pendingIds = new ArrayList<>();
    List<Long> changedReady = new ArrayList<>();
    Set<Long> reused = new HashSet<>();
    int unchanged = 0;
    int moved = 0;
    int replaced = 0;
    Map<String, Object[]> inserts = new LinkedHashMap<>();
    for (Map.Entry<Long, List<FoundFile>> e : found.entrySet()) {
      long rootId = e.getKey();
      for (FoundFile f : e.getValue()) {
        String path = key(f.path());
        long mtime = f.mtime().toEpochMilli();
        // A path under overlapping roots may be registered under another root: look it up then.
        ImageRow row = known.containsKey(path) ? known.get(path) : images.byPath(path).orElse(null);
        if (row != null && row.status() != ImageStatus.MISSING && row.size() == f.size() && row.mtimeMs() == mtime
            && row.status() != ImageStatus.PENDING) {
          if (row.status() == ImageStatus.FAILED && transientFailure(row.id())) {
            // A time-out, a lack of memory or a lower pixel cap says more about the run than the file: try again.
            long id = row.id();
            writes.add(() -> images.setStatus(id, ImageStatus.PENDING));
            pendingIds.add(id);
            continue;
          }
          unchanged++;
          continue;
        }
        String hash;
        try {
          hash = ContentHash.sha256Hex(f.path());
        } catch (IOException ex) {
          hashFailures.put(f.path(), "cannot read the file: " + ex.getMessage());
          continue;
        }
        if (row != null) {
          if (row.contentHash() != null && !hash.equals(row.contentHash())) {
            // The path now holds another picture (edited, or another file put in its place): the decisions made on
            // the old picture stay with that picture's content hash and do not pass to this one.
            replaced++;
          }
          boolean same = hash.equals(row.contentHash()) && row.status() != ImageStatus.PENDING;
          ImageStatus status = same && row.status() != ImageStatus.MISSING ? row.status()
              : same ? ImageStatus.READY : ImageStatus.PENDING;
          if (status == ImageStatus.READY && !library.features().has(row.id())) {
            status = ImageStatus.PENDING;
          }
          ImageStatus next = status;
          writes.add(() -> images.updateFile(row.id(), rootId, path, f.size(), mtime, hash, next));
          if (next == ImageStatus.PENDING) {
            pendingIds.add(row.id());
            if (row.status() == ImageStatus.READY) {
              changedReady.add(row.id());
            }
          } else {
            unchanged++;
          }
          continue;
        }
        List<ImageRow> sources = vanishedByHash.getOrDefault(hash, List.of());
        ImageRow source = sources.stream().filter(s -> !reused.contains(s.id())).findFirst().orElse(null);
        if (source != null) {
          reused.add(source.id());
          boolean hasFeatures = library.features().has(source.id());
          ImageStatus next = hasFeatures ? ImageStatus.READY : ImageStatus.PENDING;
          writes.add(() -> images.updateFile(source.id(), rootId, path, f.size(), mtime, hash, next));
          if (next == ImageStatus.PENDING) {
            pendingIds.add(source.id());
          }
          moved++;
          continue;
        }
        inserts.put(path, new Object[] {rootId, f.size(), mtime, hash});
      }
    }
    List<Long> nowMissing = new ArrayList<>();
    for (ImageRow row : vanished) {
      if (!reused.contains(row.id()) && row.status() != ImageStatus.MISSING) {
        nowMissing.add(row.id());
      }
    }
    List<Long> leaving = new ArrayList<>(changedReady);
    for (ImageRow row : vanished) {
      if (!reused.contains(row.id()) && row.status() == ImageStatus.READY) {
        leaving.add(row.id());
      }
    }
    if (!leaving.isEmpty()) {
      evict.evict(leaving);
    }
    library.catalog().inTransaction(c -> {
      writes.forEach(Runnable::run);
      inserts.forEach((path, v) -> pendingIds.add(
          images.insertPending((Long) v[0], path, (Long) v[1], (Long) v[2], (String) v[3])));
      nowMissing.forEach(id -> images.setStatus(id, ImageStatus.MISSING));
      return null;
    });
    List<ImageRow> toAnalyse = new ArrayList<>();
    for (long id : pendingIds) {
      images.byId(id).ifPresent(toAnalyse::add);
    }
    // Also pick up images left pending by an earlier, interrupted run.
    Set<Long> queued = new HashSet<>(pendingIds);
    for (ImageRow row : images.withStatus(ImageStatus.PENDING)) {
      if (!queued.contains(row.id()) && foundPaths.contains(row.path())) {
        toAnalyse.add(row);
      }
    }
    return new Plan(toAnalyse, unchanged, moved, replaced, nowMissing, changedReady);
  }

  private boolean transientFailure(long id) {
    ImageStore.StoredFailure failure = library.images().failureOf(id).orElse(null);
    if (failure == null) {
      return false;
    }
    if (failure.kind() != null) {
      FailureKind kind;
      try {
        kind = FailureKind.valueOf(failure.kind());
      } catch (IllegalArgumentException e) {
        return false; // a kind written by a later release: leave the file as it is
      }
      return FailureKind.worthRetrying(kind, failure.declaredPixels() == null ? 0 : failure.declaredPixels(),
          maxPixels);
    }
    // Recorded before failures had a kind (layout step 08): read the reason as that release wrote it.
    String reason = failure.reason();
    java.util.regex.Matcher large = TOO_LARGE.matcher(reason);
    if (large.find()) {
      // Refused by the pixel cap of an earlier run: worth another try once the cap admits it.
      return Long.parseLong(large.group(1)) * Long.parseLong(large.group(2)) <= maxPixels;
    }
    return reason.startsWith("timed out") || reason.contains("took longer than")
        || reason.contains("not enough memory");
  }

  static String key(Path p) {
    return p.toAbsolutePath().normalize().toString();
  }
}
