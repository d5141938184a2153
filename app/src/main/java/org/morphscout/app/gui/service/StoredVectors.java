package org.morphscout.app.gui.service;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;
import org.morphscout.indexer.catalog.FeatureStore;

/**
 * The stored appearance and shape vectors of every ready image, held in memory for the interim backends. Loaded once
 * (about 6 KB an image for a 512-d model and a 32x32 shape grid, so ~600 MB at 100,000 images: fine for a preview,
 * which is why the lead's vector-index services replace it). Immutable after loading; thread-safe.
 */
public final class StoredVectors {
  private final Map<Long, FeatureStore.Vectors> byId;

  private StoredVectors(Map<Long, FeatureStore.Vectors> byId) {
    this.byId = byId;
  }

  public static StoredVectors load(FeatureStore features) {
    Map<Long, FeatureStore.Vectors> map = new HashMap<>();
    features.forEachVector(v -> map.put(v.imageId(), v));
    return new StoredVectors(map);
  }

  public Optional<FeatureStore.Vectors> get(long id) {
    return Optional.ofNullable(byId.get(id));
  }

  public Iterable<FeatureStore.Vectors> all() {
    return byId.values();
  }

  public int size() {
    return byId.size();
  }

  /** 1 - cosine of the two vectors, in [0, 2]; vectors of different length (another model) count as unrelated (1). */
  public static double cosineDistance(float[] x, float[] y) {
    if (x.length != y.length || x.length == 0) {
      return 1;
    }
    double dot = 0;
    double nx = 0;
    double ny = 0;
    for (int i = 0; i < x.length; i++) {
      dot += x[i] * y[i];
      nx += x[i] * x[i];
      ny += y[i] * y[i];
    }
    if (nx == 0 || ny == 0) {
      return 1;
    }
    return Math.max(0, Math.min(2, 1 - dot / Math.sqrt(nx * ny)));
  }

  /** Appearance and shape distance between two ready images ({1, 1} when either has no vectors). */
  public double[] distances(long a, long b) {
    FeatureStore.Vectors va = byId.get(a);
    FeatureStore.Vectors vb = byId.get(b);
    if (va == null || vb == null) {
      return new double[] {1, 1};
    }
    return new double[] {cosineDistance(va.appearance(), vb.appearance()), cosineDistance(va.shape(), vb.shape())};
  }

  /** The weighted step size: {@code (1 - w) * appearance + w * shape}, w in [0, 1]. */
  public double distance(long a, long b, double shapeWeight) {
    double[] d = distances(a, b);
    return (1 - shapeWeight) * d[0] + shapeWeight * d[1];
  }
}
