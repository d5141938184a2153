package org.morphscout.indexer.catalog;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class BlobsTest {
  private static final long SEED = 4004;

  @Test
  void halfFloatsUseTheBinary16BitPatterns() {
    // IEEE 754-2008 binary16 encodings (from memory, and the standard's layout: 1 sign, 5 exponent bits with bias 15,
    // 10 fraction bits): 1.0 = 0x3C00, -2.0 = 0xC000, 0.5 = 0x3800, 65504 (largest finite) = 0x7BFF, 0 = 0x0000.
    byte[] b = Blobs.halfFloats(new float[] {1f, -2f, 0.5f, 65504f, 0f});
    assertThat(b).containsExactly(0x00, 0x3C, 0x00, 0xC0, 0x00, 0x38, 0xFF, 0x7B, 0x00, 0x00);
    assertThat(Blobs.fromHalfFloats(b)).containsExactly(1f, -2f, 0.5f, 65504f, 0f);
  }

  @Test
  void halfFloatsRoundTripWithinTheirPrecision() {
    SplittableRandom rnd = new SplittableRandom(SEED);
    float[] v = new float[1024];
    for (int i = 0; i < v.length; i++) {
      v[i] = (float) (rnd.nextGaussian() * 2); // z-scores, like the pixel fingerprint
    }
    float[] back = Blobs.fromHalfFloats(Blobs.halfFloats(v));
    assertThat(Blobs.halfFloats(v)).hasSize(2 * v.length);
    for (int i = 0; i < v.length; i++) {
      // 10 fraction bits: round to nearest keeps the relative error within 2^-11 (normal numbers); below 2^-14 the
      // spacing is absolute, 2^-24.
      double tolerance = Math.max(Math.abs(v[i]) * Math.pow(2, -11), Math.pow(2, -25));
      assertThat((double) Math.abs(back[i] - v[i])).as("value %d of seed %d", i, SEED).isLessThanOrEqualTo(tolerance);
    }
  }

  @Test
  void aTruncatedHalfFloatBlobIsRefused() {
    assertThatThrownBy(() -> Blobs.fromHalfFloats(new byte[3])).hasMessageContaining("3 bytes");
  }
}
