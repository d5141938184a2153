package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.morphscout.indexer.MorphscoutException;

class VectorMathTest {

  @Test
  void dotAndNormMatchHandComputedValues() {
    // (1,2,3).(4,-5,6) = 4 - 10 + 18 = 12; |(3,4)| = 5 (Pythagorean triple): textbook arithmetic.
    assertThat(VectorMath.dot(new float[] {1, 2, 3}, new float[] {4, -5, 6})).isEqualTo(12f);
    assertThat(VectorMath.norm(new float[] {3, 4})).isEqualTo(5.0);
  }

  @Test
  void unitCopyScalesToLengthOneWithoutTouchingTheInput() {
    float[] v = {3, 4};
    float[] u = VectorMath.unitCopy(v, "v");
    assertThat(u[0]).isCloseTo(0.6f, within(1e-7f));
    assertThat(u[1]).isCloseTo(0.8f, within(1e-7f));
    assertThat(v).containsExactly(3f, 4f);
  }

  @Test
  void vectorsWithoutDirectionAreRejectedWithTheirName() {
    assertThatThrownBy(() -> VectorMath.unitCopy(new float[3], "Image 9: shape vector"))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageStartingWith("Image 9: shape vector has zero length");
    assertThatThrownBy(() -> VectorMath.unitCopy(new float[] {1, Float.POSITIVE_INFINITY}, "q"))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("NaN or infinite");
    assertThatThrownBy(() -> VectorMath.unitCopy(new float[0], "q"))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("empty");
  }

  @Test
  void dotRejectsVectorsOfDifferentLengths() {
    assertThatThrownBy(() -> VectorMath.dot(new float[2], new float[3]))
        .isInstanceOf(IllegalArgumentException.class);
  }
}
