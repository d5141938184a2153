package org.morphscout.indexer.chain;

import java.util.Arrays;

/**
 * A binary min-heap of (double key, int value) pairs in two primitive arrays. Duplicate values are allowed (the
 * search uses lazy deletion and skips stale entries). Not thread-safe.
 */
final class StateHeap {
  private double[] keys;
  private int[] values;
  private int size;

  StateHeap(int capacity) {
    keys = new double[Math.max(16, capacity)];
    values = new int[keys.length];
  }

  boolean isEmpty() {
    return size == 0;
  }

  void clear() {
    size = 0;
  }

  void push(double key, int value) {
    if (size == keys.length) {
      keys = Arrays.copyOf(keys, size * 2);
      values = Arrays.copyOf(values, size * 2);
    }
    int i = size++;
    while (i > 0) {
      int parent = (i - 1) >>> 1;
      if (keys[parent] <= key) {
        break;
      }
      keys[i] = keys[parent];
      values[i] = values[parent];
      i = parent;
    }
    keys[i] = key;
    values[i] = value;
  }

  double topKey() {
    return keys[0];
  }

  int topValue() {
    return values[0];
  }

  void pop() {
    size--;
    if (size == 0) {
      return;
    }
    double key = keys[size];
    int value = values[size];
    int i = 0;
    int half = size >>> 1;
    while (i < half) {
      int child = 2 * i + 1;
      if (child + 1 < size && keys[child + 1] < keys[child]) {
        child++;
      }
      if (keys[child] >= key) {
        break;
      }
      keys[i] = keys[child];
      values[i] = values[child];
      i = child;
    }
    keys[i] = key;
    values[i] = value;
  }
}
