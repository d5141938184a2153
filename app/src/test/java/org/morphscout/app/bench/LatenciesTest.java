package org.morphscout.app.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class LatenciesTest {

  @Test
  void nearestRankPercentilesMatchTheWorkedExample() {
    // Source: Wikipedia, "Percentile", nearest-rank method, first worked example: for the ordered list
    // {15, 20, 35, 40, 50} the 30th percentile is 20, the 40th is 20, the 50th is 35 and the 100th is 50.
    long[] sorted = {15, 20, 35, 40, 50};
    assertThat(Latencies.rank(sorted, 0.30)).isEqualTo(20);
    assertThat(Latencies.rank(sorted, 0.40)).isEqualTo(20);
    assertThat(Latencies.rank(sorted, 0.50)).isEqualTo(35);
    assertThat(Latencies.rank(sorted, 1.00)).isEqualTo(50);
  }

  @Test
  void summarisesUnsortedNanosInMilliseconds() {
    // Worked example above, in milliseconds and shuffled: p50 35 ms, p99 = the maximum below 100 values, mean 32 ms.
    long[] nanos = {50_000_000L, 15_000_000L, 40_000_000L, 20_000_000L, 35_000_000L};
    Latencies l = Latencies.ofNanos(nanos);
    assertThat(l.count()).isEqualTo(5);
    assertThat(l.p50Ms()).isCloseTo(35, within(1e-9));
    assertThat(l.p99Ms()).isCloseTo(50, within(1e-9));
    assertThat(l.meanMs()).isCloseTo(32, within(1e-9));
    assertThat(nanos[0]).as("input left unsorted").isEqualTo(50_000_000L);
  }

  @Test
  void rejectsAnEmptySeries() {
    assertThatThrownBy(() -> Latencies.ofNanos(new long[0])).isInstanceOf(IllegalArgumentException.class);
  }
}
