package org.morphscout.app.gui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.morphscout.app.gui.service.GreedyWalkAccess;

class GreedyWalkTest {
  @Test
  void pointsOnALineComeOutSorted() {
    long seed = 20261201L;
    Random rnd = new Random(seed);
    List<Double> xs = new ArrayList<>();
    for (int i = 0; i < 12; i++) {
      xs.add(rnd.nextDouble() * 10);
    }
    Collections.shuffle(xs, rnd);
    double[][] d = new double[xs.size()][xs.size()];
    for (int i = 0; i < xs.size(); i++) {
      for (int j = 0; j < xs.size(); j++) {
        d[i][j] = Math.abs(xs.get(i) - xs.get(j));
      }
    }
    // on a line the shortest open path visiting every point is the sorted order (plane geometry), length max - min
    int[] tour = GreedyWalkAccess.bestTour(d);
    double len = GreedyWalkAccess.length(tour, d);
    double span = Collections.max(xs) - Collections.min(xs);
    assertThat(len).as("seed %d", seed).isCloseTo(span, org.assertj.core.api.Assertions.within(1e-9));
  }
}
