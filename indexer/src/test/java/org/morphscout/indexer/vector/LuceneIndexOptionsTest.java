package org.morphscout.indexer.vector;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.morphscout.indexer.vector.LuceneIndexOptions.Quantization;

class LuceneIndexOptionsTest {

  @Test
  void defaultsAreTheDocumentedOnes() {
    LuceneIndexOptions d = LuceneIndexOptions.defaults();
    // M = 16 and efConstruction (beamWidth) = 100 are Lucene's own defaults (Lucene99HnswVectorsFormat).
    assertThat(d.maxConn()).isEqualTo(16);
    assertThat(d.beamWidth()).isEqualTo(100);
    assertThat(d.quantization()).isEqualTo(Quantization.NONE);
    // 100 candidates for a top-10 query: where recall on embedding-like vectors is 1.000 (docs/BENCHMARKS.md)
    assertThat(d.candidates(10)).isEqualTo(100);
    assertThat(d.candidates(24)).as("the neighbour graph's k").isEqualTo(120);
  }

  @Test
  void candidatesAreKTimesTheFanOutButAtLeastTheMinimum() {
    LuceneIndexOptions o = LuceneIndexOptions.defaults().withFanOut(3, 50);
    assertThat(o.candidates(1)).isEqualTo(50);
    assertThat(o.candidates(10)).isEqualTo(50);
    assertThat(o.candidates(40)).isEqualTo(120);
    assertThat(o.candidates(5_000)).as("capped").isEqualTo(LuceneIndexOptions.MAX_CANDIDATES);
    assertThat(o.candidates(20_000)).as("never fewer than k").isEqualTo(20_000);
    assertThatThrownBy(() -> o.candidates(0)).isInstanceOf(IllegalArgumentException.class);
  }

  @Test
  void outOfRangeValuesAreRejected() {
    LuceneIndexOptions d = LuceneIndexOptions.defaults();
    assertThatThrownBy(() -> d.withGraph(0, 100)).hasMessageContaining("maxConn");
    assertThatThrownBy(() -> d.withGraph(513, 100)).hasMessageContaining("maxConn");
    assertThatThrownBy(() -> d.withGraph(16, 0)).hasMessageContaining("beamWidth");
    assertThatThrownBy(() -> d.withFanOut(0, 10)).hasMessageContaining("fanOutMultiplier");
    assertThatThrownBy(() -> d.withQuantization(null)).isInstanceOf(NullPointerException.class);
  }
}
