package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Union-find labelling, keep-largest, sizeable count and hole filling against plain flood-fill references. */
class ComponentsTest {
  private static final long SEED = 4242L;

  /** Flood-fill labelling (breadth first), labels in order of first pixel in scan order. */
  static int[] floodLabels(byte[] m, int w, int h, boolean object, boolean eight) {
    int[] labels = new int[m.length];
    int next = 0;
    ArrayDeque<Integer> queue = new ArrayDeque<>();
    for (int start = 0; start < m.length; start++) {
      if ((m[start] != 0) != object || labels[start] != 0) {
        continue;
      }
      labels[start] = ++next;
      queue.add(start);
      while (!queue.isEmpty()) {
        int p = queue.poll();
        int px = p % w;
        int py = p / w;
        for (int dy = -1; dy <= 1; dy++) {
          for (int dx = -1; dx <= 1; dx++) {
            if ((dx == 0 && dy == 0) || (!eight && dx != 0 && dy != 0)) {
              continue;
            }
            int x = px + dx;
            int y = py + dy;
            if (x < 0 || y < 0 || x >= w || y >= h) {
              continue;
            }
            int q = y * w + x;
            if ((m[q] != 0) == object && labels[q] == 0) {
              labels[q] = next;
              queue.add(q);
            }
          }
        }
      }
    }
    return labels;
  }

  /** Renumbers labels in order of first appearance, so two labellings of the same partition compare equal. */
  static int[] canonical(int[] labels) {
    int max = Arrays.stream(labels).max().orElse(0);
    int[] map = new int[max + 1];
    int next = 0;
    int[] out = new int[labels.length];
    for (int i = 0; i < labels.length; i++) {
      int l = labels[i];
      if (l != 0) {
        if (map[l] == 0) {
          map[l] = ++next;
        }
        out[i] = map[l];
      }
    }
    return out;
  }

  @Test
  void labellingMatchesFloodFill() {
    for (int trial = 0; trial < 30; trial++) {
      long seed = SEED + trial;
      SplittableRandom rnd = new SplittableRandom(seed);
      int w = 10 + rnd.nextInt(90);
      int h = 10 + rnd.nextInt(90);
      byte[] m = MorphologyTest.randomMask(rnd, w, h);
      for (boolean object : new boolean[] {true, false}) {
        for (boolean eight : new boolean[] {true, false}) {
          Components.Labels ours = Components.label(m, w, h, object, eight);
          int[] ref = floodLabels(m, w, h, object, eight);
          assertThat(canonical(ours.labels()))
              .as("seed %d object=%s eight=%s", seed, object, eight)
              .isEqualTo(canonical(ref));
          assertThat(ours.count()).isEqualTo(Arrays.stream(ref).max().orElse(0));
        }
      }
    }
  }

  @Test
  void keepLargestCountAndFillHolesMatchReferences() {
    for (int trial = 0; trial < 30; trial++) {
      long seed = SEED * 3 + trial;
      SplittableRandom rnd = new SplittableRandom(seed);
      int w = 10 + rnd.nextInt(90);
      int h = 10 + rnd.nextInt(90);
      byte[] m = MorphologyTest.randomMask(rnd, w, h);
      int[] ref = floodLabels(m, w, h, true, true);
      int n = Arrays.stream(ref).max().orElse(0);
      int[] sizes = new int[n + 1];
      for (int l : ref) {
        sizes[l]++;
      }
      int largest = 0;
      for (int l = 1; l <= n; l++) {
        if (largest == 0 || sizes[l] > sizes[largest]) {
          largest = l;
        }
      }
      byte[] keep = new byte[m.length];
      for (int i = 0; i < m.length; i++) {
        keep[i] = (byte) (largest != 0 && ref[i] == largest ? 1 : 0);
      }
      assertThat(Components.keepLargest(m, w, h)).as("seed %d", seed).isEqualTo(keep);

      int sizeable = 0;
      for (int l = 1; l <= n; l++) {
        sizeable += sizes[l] >= 0.2 * sizes[largest] ? 1 : 0;
      }
      assertThat(Components.countSizeable(Components.label(m, w, h), 0.2)).as("seed %d", seed).isEqualTo(sizeable);

      // Reference hole filling: flood the 4-connected background from the border; the rest becomes object.
      int[] bg = floodLabels(m, w, h, false, false);
      boolean[] outside = new boolean[Arrays.stream(bg).max().orElse(0) + 1];
      for (int x = 0; x < w; x++) {
        outside[bg[x]] = true;
        outside[bg[(h - 1) * w + x]] = true;
      }
      for (int y = 0; y < h; y++) {
        outside[bg[y * w]] = true;
        outside[bg[y * w + w - 1]] = true;
      }
      byte[] filled = new byte[m.length];
      for (int i = 0; i < m.length; i++) {
        filled[i] = (byte) (m[i] != 0 || !outside[bg[i]] ? 1 : 0);
      }
      assertThat(Components.fillHoles(m, w, h)).as("seed %d", seed).isEqualTo(filled);
    }
  }

  @Test
  void ringHoleIsFilledAndDiagonalLineClosesIt() {
    // 7x7 ring of object pixels around a 3x3 hole.
    int w = 9;
    byte[] m = new byte[w * w];
    for (int y = 1; y < 8; y++) {
      for (int x = 1; x < 8; x++) {
        boolean edge = y == 1 || y == 7 || x == 1 || x == 7;
        m[y * w + x] = (byte) (edge ? 1 : 0);
      }
    }
    byte[] filled = Components.fillHoles(m, w, w);
    assertThat(filled[4 * w + 4]).isEqualTo((byte) 1);
    assertThat(filled[0]).isZero();
  }
}
