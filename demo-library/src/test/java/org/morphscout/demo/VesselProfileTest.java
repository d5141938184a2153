package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class VesselProfileTest {
  private static final long SEED = 0x5EED_0001L;

  @Test
  void interpolantPassesThroughEveryStation() {
    // Hermite interpolation reproduces the data at the nodes (Fritsch and Carlson 1980, eq. 2).
    for (Archetype a : Archetype.values()) {
      double[] h = a.profile().heightsCm();
      double[] r = a.profile().radiiCm();
      for (int i = 0; i < h.length; i++) {
        assertThat(a.profile().radiusAt(h[i])).as("%s station %d", a, i).isCloseTo(r[i], within(1e-12));
      }
    }
  }

  @Test
  void interpolantStaysMonotoneAndWithinItsStationsOnEveryInterval() {
    // Fritsch and Carlson (1980): with their tangent limits the interpolant is monotone on each interval where the
    // data are, and never leaves the interval's data range. Checked on archetypes and seeded random blends.
    SplittableRandom rnd = new SplittableRandom(SEED);
    Archetype[] all = Archetype.values();
    for (int trial = 0; trial < 60; trial++) {
      VesselProfile p = trial < all.length ? all[trial].profile()
          : VesselProfile.blend(all[rnd.nextInt(all.length)].profile(), all[rnd.nextInt(all.length)].profile(),
              rnd.nextDouble()).varied(rnd.nextLong(), 0.2);
      double[] h = p.heightsCm();
      double[] r = p.radiiCm();
      for (int k = 0; k + 1 < h.length; k++) {
        double lo = Math.min(r[k], r[k + 1]);
        double hi = Math.max(r[k], r[k + 1]);
        double prev = r[k];
        for (int s = 1; s <= 50; s++) {
          double v = p.radiusAt(h[k] + (h[k + 1] - h[k]) * s / 50.0);
          assertThat(v).as("seed %d trial %d interval %d", SEED, trial, k).isBetween(lo - 1e-9, hi + 1e-9);
          if (r[k + 1] >= r[k]) {
            assertThat(v).as("seed %d trial %d rising interval %d", SEED, trial, k).isGreaterThanOrEqualTo(prev - 1e-9);
          } else {
            assertThat(v).as("seed %d trial %d falling interval %d", SEED, trial, k).isLessThanOrEqualTo(prev + 1e-9);
          }
          prev = v;
        }
      }
    }
  }

  @Test
  void slopeMatchesCentralDifferences() {
    // Common practice: an analytic derivative checked against a central finite difference.
    for (Archetype a : Archetype.values()) {
      VesselProfile p = a.profile();
      for (int i = 1; i < 200; i++) {
        double h = p.heightCm() * i / 200.0;
        double e = 1e-5;
        double numeric = (p.radiusAt(h + e) - p.radiusAt(h - e)) / (2 * e);
        assertThat(p.slopeAt(h)).as("%s at h=%f", a, h).isCloseTo(numeric, within(1e-4));
      }
    }
  }

  @Test
  void sideAreaOfCylinderAndConeMatchesGeometry() {
    // Cylinder: 2 r H. Cone frustum seen from the side: a trapezoid, (r0 + r1) H. Monotone Hermite reproduces
    // linear data exactly (all secants equal, tangents = secant), so the areas are exact up to rounding.
    double[] h = {0, 1, 2, 4, 6, 8, 10};
    VesselProfile cylinder = new VesselProfile(h, new double[] {3, 3, 3, 3, 3, 3, 3}, Handle.NONE, Handle.NONE);
    assertThat(cylinder.sideAreaCm2()).isCloseTo(60.0, within(1e-9));
    double[] r = new double[7];
    for (int i = 0; i < 7; i++) {
      r[i] = 2 + 0.3 * h[i];
    }
    VesselProfile cone = new VesselProfile(h, r, Handle.NONE, Handle.NONE);
    assertThat(cone.sideAreaCm2()).isCloseTo((2 + 5) * 10.0, within(1e-9));
  }

  @Test
  void blendEndpointsAreTheArchetypesAndMidpointIsBetween() {
    for (Archetype a : Archetype.values()) {
      for (Archetype b : Archetype.values()) {
        assertThat(VesselProfile.blend(a.profile(), b.profile(), 0)).as("%s->%s at 0", a, b).isEqualTo(a.profile());
        assertThat(VesselProfile.blend(a.profile(), b.profile(), 1)).as("%s->%s at 1", a, b).isEqualTo(b.profile());
        VesselProfile mid = VesselProfile.blend(a.profile(), b.profile(), 0.5);
        assertThat(mid.heightCm()).isCloseTo((a.profile().heightCm() + b.profile().heightCm()) / 2, within(1e-9));
      }
    }
  }

  @Test
  void handleFadesContinuouslyInABlend() {
    VesselProfile jug = Archetype.JUG.profile();
    VesselProfile vase = Archetype.VASE.profile();
    double previous = Double.MAX_VALUE;
    for (int i = 0; i <= 20; i++) {
      Handle h = VesselProfile.blend(jug, vase, i / 20.0).rightHandle();
      double reach = h.present() ? h.reachCm() : 0;
      assertThat(reach).as("t=%f", i / 20.0).isLessThanOrEqualTo(previous + 1e-12);
      previous = reach;
    }
    assertThat(VesselProfile.blend(jug, vase, 1).rightHandle()).isEqualTo(Handle.NONE);
  }

  @Test
  void variedStaysWithinItsAmountAndIsSeeded() {
    VesselProfile p = Archetype.JAR.profile();
    VesselProfile v1 = p.varied(SEED, 0.05);
    VesselProfile v2 = p.varied(SEED, 0.05);
    assertThat(v1).isEqualTo(v2);
    assertThat(p.varied(SEED + 1, 0.05)).isNotEqualTo(v1);
    for (int i = 0; i < VesselProfile.STATIONS; i++) {
      assertThat(v1.radiiCm()[i] / p.radiiCm()[i]).as("seed %d station %d", SEED, i).isBetween(0.95, 1.05);
    }
  }

  @Test
  void rejectsBrokenStations() {
    double[] r = {1, 1, 1, 1, 1, 1, 1};
    assertThatThrownBy(() -> new VesselProfile(new double[] {0, 1, 1, 2, 3, 4, 5}, r, Handle.NONE, Handle.NONE))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("increase");
    assertThatThrownBy(() -> new VesselProfile(new double[] {0, 1, 2, 3, 4, 5, 6},
        new double[] {1, 1, -1, 1, 1, 1, 1}, Handle.NONE, Handle.NONE))
        .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("radius");
    assertThatThrownBy(() -> VesselProfile.blend(Archetype.CUP.profile(), Archetype.BOWL.profile(), 1.5))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
