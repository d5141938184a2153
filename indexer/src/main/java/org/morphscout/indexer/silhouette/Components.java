package org.morphscout.indexer.silhouette;

/**
 * Connected components of row-major 0/1 masks: labelling, keeping the largest, counting sizeable ones, filling holes.
 *
 * <p>Foreground is 8-connected; background is then 4-connected (the usual dual pairing, so that a diagonal line of
 * object pixels closes a hole). Labelling is the classic two-pass scan with a union-find table (Rosenfeld and Pfaltz,
 * "Sequential operations in digital picture processing", JACM 13(4), 1966). Stateless and thread-safe.
 */
public final class Components {
  /**
   * Labelled components.
   *
   * @param labels per pixel: 0 for pixels not in any component, else the component label 1..count
   * @param sizes pixel count per label, index 0 unused
   * @param count number of components
   */
  public record Labels(int[] labels, int[] sizes, int count) {
    /** The label with most pixels (the lowest such label on ties); 0 when there is none. */
    public int largest() {
      int best = 0;
      for (int i = 1; i <= count; i++) {
        if (best == 0 || sizes[i] > sizes[best]) {
          best = i;
        }
      }
      return best;
    }
  }

  private Components() {}

  /** Labels the 8-connected components of the object (non-zero) pixels. */
  public static Labels label(byte[] mask, int width, int height) {
    return label(mask, width, height, true, true);
  }

  /**
   * Labels connected components of the pixels whose value is {@code object ? 1 : 0}.
   *
   * @param eight 8-connectivity when true, 4-connectivity otherwise
   */
  static Labels label(byte[] mask, int width, int height, boolean object, boolean eight) {
    if (mask.length != width * height) {
      throw new IllegalArgumentException("mask of " + mask.length + " bytes does not match " + width + "x" + height);
    }
    int[] labels = new int[mask.length];
    int[] parent = new int[mask.length / 2 + 2];
    int next = 1;
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        int i = y * width + x;
        if ((mask[i] != 0) != object) {
          continue;
        }
        int l = 0;
        // Already-visited neighbours: W, and N (plus NW, NE for 8-connectivity).
        if (x > 0) {
          l = join(parent, l, labels[i - 1]);
        }
        if (y > 0) {
          l = join(parent, l, labels[i - width]);
          if (eight && x > 0) {
            l = join(parent, l, labels[i - width - 1]);
          }
          if (eight && x < width - 1) {
            l = join(parent, l, labels[i - width + 1]);
          }
        }
        if (l == 0) {
          if (next >= parent.length) {
            parent = java.util.Arrays.copyOf(parent, parent.length * 2);
          }
          parent[next] = next;
          l = next++;
        }
        labels[i] = l;
      }
    }
    // Second pass: resolve to roots and renumber densely.
    int[] dense = new int[next];
    int count = 0;
    for (int l = 1; l < next; l++) {
      int r = find(parent, l);
      if (dense[r] == 0) {
        dense[r] = ++count;
      }
      dense[l] = dense[r];
    }
    int[] sizes = new int[count + 1];
    for (int i = 0; i < labels.length; i++) {
      if (labels[i] != 0) {
        labels[i] = dense[labels[i]];
        sizes[labels[i]]++;
      }
    }
    return new Labels(labels, sizes, count);
  }

  /** The largest 8-connected object component alone (an empty mask stays empty). */
  public static byte[] keepLargest(byte[] mask, int width, int height) {
    Labels labels = label(mask, width, height);
    int keep = labels.largest();
    byte[] out = new byte[mask.length];
    if (keep == 0) {
      return out;
    }
    int[] l = labels.labels();
    for (int i = 0; i < out.length; i++) {
      out[i] = (byte) (l[i] == keep ? 1 : 0);
    }
    return out;
  }

  /**
   * Number of components holding at least {@code minFraction} (in [0, 1]) of the largest one's pixels, so that specks
   * do not count as objects.
   */
  public static int countSizeable(Labels labels, double minFraction) {
    if (!(minFraction >= 0 && minFraction <= 1)) {
      throw new IllegalArgumentException("minFraction must be in [0, 1], got " + minFraction);
    }
    int largest = labels.largest();
    if (largest == 0) {
      return 0;
    }
    double min = minFraction * labels.sizes()[largest];
    int n = 0;
    for (int i = 1; i <= labels.count(); i++) {
      if (labels.sizes()[i] >= min) {
        n++;
      }
    }
    return n;
  }

  /** Sets every background pixel that is not 4-connected to the image border (a hole) to object. */
  public static byte[] fillHoles(byte[] mask, int width, int height) {
    Labels bg = label(mask, width, height, false, false);
    boolean[] touches = new boolean[bg.count() + 1];
    int[] l = bg.labels();
    for (int x = 0; x < width; x++) {
      touches[l[x]] = true;
      touches[l[(height - 1) * width + x]] = true;
    }
    for (int y = 0; y < height; y++) {
      touches[l[y * width]] = true;
      touches[l[y * width + width - 1]] = true;
    }
    byte[] out = new byte[mask.length];
    for (int i = 0; i < out.length; i++) {
      out[i] = (byte) (mask[i] != 0 || !touches[l[i]] ? 1 : 0);
    }
    return out;
  }

  private static int join(int[] parent, int current, int neighbour) {
    if (neighbour == 0) {
      return current;
    }
    int rn = find(parent, neighbour);
    if (current == 0) {
      return rn;
    }
    int rc = find(parent, current);
    if (rc == rn) {
      return rc;
    }
    // The smaller root wins, keeping the tree shallow enough for scan order.
    int root = Math.min(rc, rn);
    parent[Math.max(rc, rn)] = root;
    return root;
  }

  private static int find(int[] parent, int l) {
    while (parent[l] != l) {
      parent[l] = parent[parent[l]];
      l = parent[l];
    }
    return l;
  }
}
