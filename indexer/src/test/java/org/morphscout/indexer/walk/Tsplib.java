package org.morphscout.indexer.walk;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Reads the TSPLIB95 test resources (our '#' header lines are skipped). */
final class Tsplib {
  final double[] x;
  final double[] y;

  private Tsplib(double[] x, double[] y) {
    this.x = x;
    this.y = y;
  }

  int size() {
    return x.length;
  }

  /**
   * TSPLIB95 EUC_2D distance: nint(sqrt(dx^2 + dy^2)) (Reinelt, "TSPLIB 95" documentation, section 2.1), where
   * nint rounds to the nearest integer, implemented there as (int) (d + 0.5).
   */
  double euc2d(int i, int j) {
    double dx = x[i] - x[j];
    double dy = y[i] - y[j];
    return (int) (Math.sqrt(dx * dx + dy * dy) + 0.5);
  }

  static Tsplib load(String resource) throws IOException {
    List<double[]> nodes = new ArrayList<>();
    boolean inCoords = false;
    for (String line : lines(resource)) {
      if (line.equals("NODE_COORD_SECTION")) {
        inCoords = true;
      } else if (line.equals("EOF")) {
        break;
      } else if (inCoords) {
        String[] f = line.split("\\s+");
        nodes.add(new double[] {Double.parseDouble(f[1]), Double.parseDouble(f[2])});
      }
    }
    double[] x = new double[nodes.size()];
    double[] y = new double[nodes.size()];
    for (int i = 0; i < x.length; i++) {
      x[i] = nodes.get(i)[0];
      y[i] = nodes.get(i)[1];
    }
    return new Tsplib(x, y);
  }

  /** A tour file as 0-based indices. */
  static int[] tour(String resource) throws IOException {
    return lines(resource).stream().mapToInt(s -> Integer.parseInt(s) - 1).toArray();
  }

  private static List<String> lines(String resource) throws IOException {
    List<String> out = new ArrayList<>();
    try (InputStream in = Tsplib.class.getResourceAsStream(resource)) {
      if (in == null) {
        throw new IOException("missing test resource " + resource);
      }
      BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
      for (String line = r.readLine(); line != null; line = r.readLine()) {
        String t = line.strip();
        if (!t.isEmpty() && !t.startsWith("#")) {
          out.add(t);
        }
      }
    }
    return out;
  }
}
