package org.morphscout.app.gui.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class TileRowsTest {
  @Test
  void splitsIntoFullRowsAndARemainder() {
    List<Integer> items = IntStream.range(0, 100_003).boxed().toList();
    List<List<Integer>> rows = TileRows.split(items, 7);
    assertThat(rows).hasSize(14_287); // ceil(100003 / 7)
    assertThat(rows.get(0)).containsExactly(0, 1, 2, 3, 4, 5, 6);
    assertThat(rows.get(rows.size() - 1)).containsExactly(100_002);
  }

  @Test
  void columnsFitTheWidth() {
    // n tiles of t px with gaps g need n*t + (n-1)*g px
    assertThat(TileRows.columns(132 * 5 + 10 * 4, 132, 10)).isEqualTo(5);
    assertThat(TileRows.columns(132 * 5 + 10 * 4 - 1, 132, 10)).isEqualTo(4);
    assertThat(TileRows.columns(20, 132, 10)).isEqualTo(1);
  }
}
