package org.morphscout.indexer.walk;

/**
 * Improves a closed tour with 2-opt (Croes, "A method for solving traveling-salesman problems", Operations Research
 * 1958) and Or-opt (Or, PhD thesis, Northwestern University 1976: move a segment of 1 to 3 consecutive items,
 * possibly reversed, between two other neighbours) until neither finds an improving move. Moves are only tried
 * towards each item's candidate neighbours ({@link WeightMatrix#candidates}), the usual neighbour-list speed-up.
 *
 * <p>The tour is an array with an inverse position index; a 2-opt move reverses the shorter of the two sides, an
 * Or-opt move rebuilds the array (O(m), fine for the m &lt;= a few thousand this package allows). Not thread-safe.
 */
final class LocalSearch {
  private static final double EPS = 1e-9;

  private final WeightMatrix wm;
  private final int m;
  private int[] tour;
  private final int[] pos;

  LocalSearch(WeightMatrix wm, int[] tour) {
    this.wm = wm;
    this.m = tour.length;
    this.tour = tour.clone();
    this.pos = new int[m];
    index();
  }

  int[] tour() {
    return tour.clone();
  }

  double length() {
    double sum = 0;
    for (int i = 0; i < m; i++) {
      sum += wm.w(tour[i], tour[(i + 1) % m]);
    }
    return sum;
  }

  /** Runs both neighbourhoods to a local optimum. */
  void run() {
    if (m < 4) {
      return; // every tour of three or fewer items has the same length
    }
    boolean improved = true;
    while (improved) {
      improved = twoOpt();
      improved |= orOpt();
    }
  }

  private int succ(int v) {
    return tour[(pos[v] + 1) % m];
  }

  private int pred(int v) {
    return tour[(pos[v] - 1 + m) % m];
  }

  /** One sweep of 2-opt over all items; true if anything changed. */
  boolean twoOpt() {
    boolean any = false;
    boolean improved = true;
    while (improved) {
      improved = false;
      for (int a = 0; a < m; a++) {
        for (int dir = 0; dir < 2; dir++) {
          int b = dir == 0 ? succ(a) : pred(a);
          double ab = wm.w(a, b);
          for (int c : wm.candidates[a]) {
            double ac = wm.w(a, c);
            if (ac >= ab) {
              break; // candidates are sorted: no later one can make the new edge shorter
            }
            int d = dir == 0 ? succ(c) : pred(c);
            if (c == b || d == a) {
              continue;
            }
            double delta = ac + wm.w(b, d) - ab - wm.w(c, d);
            if (delta < -EPS) {
              if (dir == 0) {
                reverse(pos[b], pos[c]); // a b ... c d  ->  a c ... b d
              } else {
                reverse(pos[c], pos[b]); // d c ... b a  ->  d b ... c a
              }
              improved = true;
              any = true;
              break;
            }
          }
        }
      }
    }
    return any;
  }

  /** One sweep of Or-opt (segments of 3, 2, 1); true if anything changed. */
  boolean orOpt() {
    boolean any = false;
    for (int len = 3; len >= 1; len--) {
      if (m < len + 3) {
        continue;
      }
      boolean improved = true;
      while (improved) {
        improved = false;
        for (int start = 0; start < m; start++) {
          if (tryMove(start, len)) {
            improved = true;
            any = true;
          }
        }
      }
    }
    return any;
  }

  private boolean tryMove(int first, int len) {
    int i = pos[first];
    int last = tour[(i + len - 1) % m];
    int p = pred(first);
    int q = succ(last);
    double gain = wm.w(p, first) + wm.w(last, q) - wm.w(p, q);
    if (gain <= EPS) {
      return false;
    }
    for (int end = 0; end < 2; end++) {
      int anchor = end == 0 ? first : last;
      for (int c : wm.candidates[anchor]) {
        if (inSegment(c, i, len)) {
          continue;
        }
        for (int side = 0; side < 2; side++) {
          int x = side == 0 ? c : pred(c);
          int y = side == 0 ? succ(c) : c;
          if (inSegment(x, i, len) || inSegment(y, i, len)) {
            continue;
          }
          double xy = wm.w(x, y);
          double keep = wm.w(x, first) + wm.w(last, y) - xy;
          double flip = wm.w(x, last) + wm.w(first, y) - xy;
          double add = Math.min(keep, flip);
          if (gain - add > EPS) {
            move(i, len, x, flip < keep);
            return true;
          }
        }
      }
    }
    return false;
  }

  private boolean inSegment(int v, int start, int len) {
    return ((pos[v] - start + m) % m) < len;
  }

  /** Moves the segment at positions start..start+len-1 between x and its successor, reversed if asked. */
  private void move(int start, int len, int x, boolean reversed) {
    int[] seg = new int[len];
    for (int k = 0; k < len; k++) {
      seg[k] = tour[(start + k) % m];
    }
    int[] out = new int[m];
    int o = 0;
    for (int k = 0; k < m - len; k++) {
      int v = tour[(start + len + k) % m];
      out[o++] = v;
      if (v == x) {
        for (int s = 0; s < len; s++) {
          out[o++] = seg[reversed ? len - 1 - s : s];
        }
      }
    }
    tour = out;
    index();
  }

  /** Reverses the cyclic stretch from position i to position j (inclusive), or equivalently its complement. */
  private void reverse(int i, int j) {
    int inside = ((j - i + m) % m) + 1;
    if (inside * 2 > m) {
      // Reversing the complement gives the same cycle read the other way: do the shorter side.
      int ni = (j + 1) % m;
      int nj = (i - 1 + m) % m;
      i = ni;
      j = nj;
      inside = m - inside;
    }
    for (int s = 0; s < inside / 2; s++) {
      int a = (i + s) % m;
      int b = (j - s + m) % m;
      int t = tour[a];
      tour[a] = tour[b];
      tour[b] = t;
      pos[tour[a]] = a;
      pos[tour[b]] = b;
    }
  }

  private void index() {
    for (int k = 0; k < m; k++) {
      pos[tour[k]] = k;
    }
  }
}
