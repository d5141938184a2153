package org.morphscout.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class TestFamiliesTest {
  private static final long SEED = 0x5EED_0003L;

  @Test
  void familyIsOrderedByTAndSharesBackdrop() {
    List<FamilyItem> f = TestFamilies.silhouetteFamily(SEED, 6, Archetype.BOTTLE, Archetype.VASE);
    assertThat(f).hasSize(6);
    for (int i = 0; i < f.size(); i++) {
      assertThat(f.get(i).t()).isEqualTo(i / 5.0);
      assertThat(f.get(i).image().getWidth()).isEqualTo(TestFamilies.SIZE);
    }
    // Same backdrop seed and light: a corner far from the vessel is the same pixel in every member.
    int corner = f.get(0).image().getRGB(2, 2);
    for (FamilyItem item : f) {
      assertThat(item.image().getRGB(2, 2)).as("seed %d %s", SEED, item.label()).isEqualTo(corner);
    }
  }

  @Test
  void widthFollowsTheLargestStationWhenBothArchetypesPeakAtTheSameStation() {
    // Radii are linear in t station by station and the monotone interpolant peaks at a station
    // (Fritsch and Carlson 1980), so when both profiles peak at the same station the width is linear in t.
    assertWidthTrend(Archetype.BOTTLE, Archetype.VASE);
    assertWidthTrend(Archetype.JAR, Archetype.BOTTLE);
  }

  @Test
  void areaFollowsTheProfileAreaWhenThatIsMonotone() {
    for (Archetype[] pair : new Archetype[][] {{Archetype.CUP, Archetype.BOWL}, {Archetype.BOTTLE, Archetype.JAR},
        {Archetype.VASE, Archetype.BOTTLE}}) {
      Archetype a = pair[0];
      Archetype b = pair[1];
      List<FamilyItem> f = TestFamilies.silhouetteFamily(SEED, 7, a, b);
      double[] profileArea = new double[f.size()];
      for (int i = 0; i < f.size(); i++) {
        profileArea[i] = VesselProfile.blend(a.profile(), b.profile(), f.get(i).t()).sideAreaCm2();
      }
      int sign = (int) Math.signum(profileArea[profileArea.length - 1] - profileArea[0]);
      for (int i = 1; i < profileArea.length; i++) {
        // Precondition from the profile maths alone: the side area moves one way.
        assertThat(Math.signum(profileArea[i] - profileArea[i - 1])).as("%s->%s profile area", a, b).isEqualTo(sign);
        int step = f.get(i).mask().area() - f.get(i - 1).mask().area();
        assertThat(Integer.signum(step)).as("seed %d %s->%s mask area step %d", SEED, a, b, i).isEqualTo(sign);
      }
    }
  }

  private static void assertWidthTrend(Archetype a, Archetype b) {
    int peakA = argmax(a.profile().radiiCm());
    int peakB = argmax(b.profile().radiiCm());
    assertThat(peakA).as("precondition: %s and %s peak at the same station", a, b).isEqualTo(peakB);
    int sign = (int) Math.signum(b.profile().maxRadiusCm() - a.profile().maxRadiusCm());
    List<FamilyItem> f = TestFamilies.silhouetteFamily(SEED, 8, a, b);
    for (int i = 1; i < f.size(); i++) {
      int step = f.get(i).mask().boxWidth() - f.get(i - 1).mask().boxWidth();
      assertThat(Integer.signum(step)).as("seed %d %s->%s width step %d", SEED, a, b, i).isEqualTo(sign);
    }
  }

  private static int argmax(double[] v) {
    int best = 0;
    for (int i = 1; i < v.length; i++) {
      if (v[i] > v[best]) {
        best = i;
      }
    }
    return best;
  }

  @Test
  void distractorsAreDistinctNonEmptyPictures() {
    List<DemoImage> d = TestFamilies.distractors(SEED, 5);
    assertThat(d).hasSize(5);
    Set<String> labels = new HashSet<>();
    for (DemoImage img : d) {
      assertThat(labels.add(img.label())).isTrue();
      assertThat(img.mask().area()).as("seed %d %s", SEED, img.label()).isGreaterThan(1000);
      assertThat(img.mask().touchesFrame()).isFalse();
    }
  }

  @Test
  void plantedTwinIsEachMembersBestMaskMatch() {
    // The planted pairs are built as near-copies: after both are fitted to the frame the twin must be every
    // member's highest-IoU partner (IoU as in the Jaccard index, common practice for mask overlap).
    PlantedPairs pp = TestFamilies.plantedPairs(SEED);
    assertThat(pp.pairs()).hasSize(4);
    assertThat(pp.images()).hasSize(13);
    for (PlantedPairs.Pair pair : pp.pairs()) {
      for (int member : new int[] {pair.first(), pair.second()}) {
        int twin = member == pair.first() ? pair.second() : pair.first();
        int best = -1;
        double bestIou = -1;
        for (int j = 0; j < pp.images().size(); j++) {
          if (j == member) {
            continue;
          }
          double iou = pp.images().get(member).mask().iou(pp.images().get(j).mask());
          if (iou > bestIou) {
            bestIou = iou;
            best = j;
          }
        }
        assertThat(best).as("seed %d best match of %s", SEED, pp.images().get(member).label()).isEqualTo(twin);
        assertThat(bestIou).isGreaterThan(0.9);
      }
    }
  }

  @Test
  void nearDuplicatesAreCloserToTheOriginalThanAnyUnrelatedPicture() throws Exception {
    NearDuplicateSet set = TestFamilies.nearDuplicates(SEED);
    BufferedImage original = set.original().image();
    assertThat(set.copies()).hasSize(5);
    double worstCopy = 0;
    for (EncodedImage copy : set.copies()) {
      assertThat(ImageCodec.decode(copy.bytes()).getWidth()).isEqualTo(copy.image().getWidth());
      worstCopy = Math.max(worstCopy, signatureDistance(original, copy.image()));
    }
    double bestUnrelated = Double.MAX_VALUE;
    for (EncodedImage other : set.unrelated()) {
      bestUnrelated = Math.min(bestUnrelated, signatureDistance(original, other.image()));
    }
    assertThat(worstCopy).as("seed %d: farthest copy vs nearest unrelated", SEED).isLessThan(bestUnrelated / 2);
    byte[] jpeg = set.original().bytes();
    // JPEG files begin with SOI (FF D8) and end with EOI (FF D9): ITU-T T.81, Annex B.
    assertThat(jpeg[0] & 0xFF).isEqualTo(0xFF);
    assertThat(jpeg[1] & 0xFF).isEqualTo(0xD8);
    assertThat(jpeg[jpeg.length - 1] & 0xFF).isEqualTo(0xD9);
  }

  /**
   * Distance of small brightness-normalised luma thumbnails (32 x 24, Rec. 601 luma weights, zero mean and unit
   * variance): the idea behind average-hash style duplicate finders (common practice), insensitive to size,
   * recompression and exposure.
   */
  static double signatureDistance(BufferedImage a, BufferedImage b) {
    double[] sa = signature(a);
    double[] sb = signature(b);
    double sum = 0;
    for (int i = 0; i < sa.length; i++) {
      sum += Math.abs(sa[i] - sb[i]);
    }
    return sum / sa.length;
  }

  private static double[] signature(BufferedImage img) {
    BufferedImage small = ImageCodec.resize(img, 32, 24);
    double[] v = new double[32 * 24];
    double mean = 0;
    for (int i = 0; i < v.length; i++) {
      int p = small.getRGB(i % 32, i / 32);
      v[i] = 0.299 * ((p >> 16) & 0xFF) + 0.587 * ((p >> 8) & 0xFF) + 0.114 * (p & 0xFF);
      mean += v[i];
    }
    mean /= v.length;
    double var = 0;
    for (double x : v) {
      var += (x - mean) * (x - mean);
    }
    double sd = Math.sqrt(var / v.length) + 1e-9;
    for (int i = 0; i < v.length; i++) {
      v[i] = (v[i] - mean) / sd;
    }
    return v;
  }

}
