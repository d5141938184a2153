package org.morphscout.indexer.vector;

import java.util.Arrays;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.vector.VectorIndex.Field;

/**
 * The vector length of each field, fixed by the first vector written to it and checked for every later one, so a
 * model change shows up as a clear message instead of a silently meaningless index. Thread-safe (synchronised).
 */
final class FieldDimensions {
  /** Per {@link Field#ordinal()}; 0 = no vector seen yet. */
  private final int[] dims = new int[Field.values().length];

  synchronized int get(Field field) {
    return dims[field.ordinal()];
  }

  synchronized void set(Field field, int dimension) {
    dims[field.ordinal()] = dimension;
  }

  synchronized void reset() {
    Arrays.fill(dims, 0);
  }

  synchronized int[] snapshot() {
    return dims.clone();
  }

  /**
   * Checks both vectors of one image before fixing either dimension, so a rejected upsert changes nothing.
   *
   * @throws MorphscoutException naming the image, the field, and the expected and actual dimension
   */
  synchronized void admit(long id, float[] appearance, float[] shape) {
    check(id, Field.APPEARANCE, appearance);
    check(id, Field.SHAPE, shape);
    if (appearance != null && dims[Field.APPEARANCE.ordinal()] == 0) {
      dims[Field.APPEARANCE.ordinal()] = appearance.length;
    }
    if (shape != null && dims[Field.SHAPE.ordinal()] == 0) {
      dims[Field.SHAPE.ordinal()] = shape.length;
    }
  }

  private void check(long id, Field field, float[] vector) {
    int expected = dims[field.ordinal()];
    if (vector != null && expected != 0 && vector.length != expected) {
      throw new MorphscoutException(
          "Image " + id + ": " + label(field) + " vector has " + vector.length
              + " dimensions but the vector index expects " + expected
              + " (fixed by the first image indexed); the feature model probably changed, so re-index the catalog.");
    }
  }

  /** The message for a query whose length differs from the indexed vectors. */
  static MorphscoutException queryMismatch(Field field, int expected, int actual) {
    return new MorphscoutException(
        "The " + label(field) + " query vector has " + actual + " dimensions but the vector index holds "
            + expected + "-dimensional " + label(field) + " vectors; the feature model probably changed, "
            + "so re-index the catalog.");
  }

  static String label(Field field) {
    return field == Field.APPEARANCE ? "appearance" : "shape";
  }
}
