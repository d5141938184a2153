package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.testing.CommentedCsv;

class Ciede2000Test {
  /** Rows of L1 a1 b1 L2 a2 b2 dE00 from Sharma, Wu and Dalal (2005), Table 1 (source named in the CSV). */
  private static List<double[]> table() throws IOException {
    List<double[]> rows = new ArrayList<>();
    for (String[] f : CommentedCsv.rows(Ciede2000Test.class, "ciede2000-sharma-2005.csv")) {
      double[] row = new double[7];
      for (int i = 0; i < 7; i++) {
        row[i] = Double.parseDouble(f[i]);
      }
      rows.add(row);
    }
    return rows;
  }

  @Test
  void matchesAllPairsOfSharmaWuDalalTable1() throws IOException {
    // Source: Sharma, Wu and Dalal 2005, Table 1 (34 pairs, dE00 printed to 4 decimals, hence the 1e-4 tolerance).
    List<double[]> rows = table();
    assertThat(rows).hasSize(34);
    for (int i = 0; i < rows.size(); i++) {
      double[] r = rows.get(i);
      double d = Ciede2000.difference(r[0], r[1], r[2], r[3], r[4], r[5]);
      assertThat(d).as("pair %d", i + 1).isCloseTo(r[6], within(1e-4));
    }
  }

  @Test
  void isSymmetricAndZeroOnEqualColours() {
    // Common practice: a colour difference is a distance-like, symmetric function.
    long seed = 20051;
    SplittableRandom rnd = new SplittableRandom(seed);
    for (int i = 0; i < 1000; i++) {
      double[] a = {rnd.nextDouble(0, 100), rnd.nextDouble(-100, 100), rnd.nextDouble(-100, 100)};
      double[] b = {rnd.nextDouble(0, 100), rnd.nextDouble(-100, 100), rnd.nextDouble(-100, 100)};
      assertThat(Ciede2000.difference(a, b)).as("seed %d", seed).isCloseTo(Ciede2000.difference(b, a), within(1e-9));
      assertThat(Ciede2000.difference(a, a)).as("seed %d", seed).isZero();
    }
  }
}
