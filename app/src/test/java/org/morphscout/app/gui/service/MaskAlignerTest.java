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
    // centroid + area normalisation removes translation and scale (Hu 1962); only pixel rounding remains
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

  @Test
  void emptyMaskStaysEmpty() {
    AlignedMasks a = MaskAligner.align(Mask.empty(10, 10), rect(10, 10, 2, 2, 4, 4), 32);
    assertThat(a.a().area()).isZero();
    assertThat(a.iou()).isZero();
  }
}
