package org.morphscout.app.gui.service;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.morphscout.indexer.silhouette.Mask;

class MaskAlignerTest {

  static Mask rect(int w, int h, int x0, int y0, int rw, int rh) {
    byte[] b = new byte[w * h];
    for (int y = y0; y < y0 + rh; y++) {
      for (int x = x0; x < x0 + rw; x++) {
        b[y * w + x] = 1;
      }
    }
    return new Mask(w, h, b);
  }

  @Test
  void sameShapeMovedAndScaledOverlapsFully() {
    Mask small = rect(128, 96, 5, 10, 20, 10);
    Mask big = rect(128, 96, 60, 30, 60, 30);
    AlignedMasks a = MaskAligner.align(small, big, 128);
    // matching centroids and areas removes translation and scale (Hu 1962); only pixel rounding remains
    assertThat(a.iou()).isGreaterThan(0.9);
  }

  @Test
  void crossedBarsOverlapAsTheGeometrySays() {
    // a 4:1 horizontal bar and a 1:4 vertical bar of equal area, centred on each other: intersection b^2,
    // union 2ab - b^2 with a = 4b, so IoU = 1 / 7 (plane geometry)
    Mask horizontal = rect(100, 100, 10, 45, 80, 20);
    Mask vertical = rect(100, 100, 45, 10, 20, 80);
    AlignedMasks a = MaskAligner.align(horizontal, vertical, 200);
    assertThat(a.iou()).isCloseTo(1.0 / 7, within(0.02));
    assertThat(a.a().area()).isCloseTo(a.b().area(), within(a.a().area() / 20));
  }

  /** A w x h bar centred at (cx, cy) turned by {@code degrees}. */
  static Mask bar(int size, double cx, double cy, double w, double h, double degrees) {
    double t = Math.toRadians(degrees);
    byte[] b = new byte[size * size];
    for (int y = 0; y < size; y++) {
      for (int x = 0; x < size; x++) {
        double dx = x + 0.5 - cx;
        double dy = y + 0.5 - cy;
        double u = dx * Math.cos(t) + dy * Math.sin(t);
        double v = -dx * Math.sin(t) + dy * Math.cos(t);
        if (Math.abs(u) <= w / 2 && Math.abs(v) <= h / 2) {
          b[y * size + x] = 1;
        }
      }
    }
    return new Mask(size, size, b);
  }

  @Test
  void theOverlayTurnsAsThePairReasonsDoAndShowsTheirAlignedIou() {
    // the same 4:1 bar, level and tilted by 30 degrees: within the morph's turn limit (45 degrees), so the library's
    // alignment turns it back and the outlines match; a centre-and-area overlay would leave them crossed
    Mask level = bar(100, 50, 50, 80, 20, 0);
    Mask tilted = bar(100, 50, 50, 80, 20, 30);
    AlignedMasks shown = MaskAligner.align(level, tilted, 160);
    assertThat(shown.iou()).isGreaterThan(0.85);
    // exactly the figure behind the reasons and the alignedIou key
    assertThat(shown.iou()).isEqualTo(new org.morphscout.indexer.warp.WarpEstimator().estimate(level, tilted)
        .iouAligned());
    // the drawn grids agree with it: the turned bar covers the level one
    int both = 0;
    int either = 0;
    for (int i = 0; i < 160 * 160; i++) {
      both += shown.a().get(i) && shown.b().get(i) ? 1 : 0;
      either += shown.a().get(i) || shown.b().get(i) ? 1 : 0;
    }
    assertThat((double) both / either).isCloseTo(shown.iou(), within(0.05));
  }

  @Test
  void emptyMaskStaysEmpty() {
    AlignedMasks a = MaskAligner.align(Mask.empty(10, 10), rect(10, 10, 2, 2, 4, 4), 32);
    assertThat(a.a().area()).isZero();
    assertThat(a.iou()).isZero();
  }
}
