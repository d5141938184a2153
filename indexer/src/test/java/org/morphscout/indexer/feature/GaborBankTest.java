package org.morphscout.indexer.feature;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * Each Gabor channel of the descriptor is tuned to one orientation and one spatial frequency: a sinusoidal grating of
 * that orientation and frequency must excite it more than any other channel, and it must prefer that grating to the
 * gratings of the other channels (the defining property of a Gabor filter bank; Daugman 1985, common practice).
 */
class GaborBankTest {
  private static final int SCALES = GistModelBuilder.SCALES;
  private static final int ORIENTATIONS = GaborBank.ORIENTATIONS;

  @Test
  void eachChannelRespondsMostToItsOwnGrating() {
    int channels = SCALES * ORIENTATIONS;
    double[][] response = new double[channels][channels];
    for (int s = 0; s < SCALES; s++) {
      for (int o = 0; o < ORIENTATIONS; o++) {
        double[] energies = GistReference.gistEnergies(grating(s, o));
        for (int ch = 0; ch < channels; ch++) {
          double total = 0;
          for (int cell = 0; cell < 16; cell++) {
            total += energies[ch * 16 + cell];
          }
          response[s * ORIENTATIONS + o][ch] = total;
        }
      }
    }
    for (int g = 0; g < channels; g++) {
      int bestChannel = 0;
      int bestGrating = 0;
      for (int k = 0; k < channels; k++) {
        if (response[g][k] > response[g][bestChannel]) {
          bestChannel = k;
        }
        if (response[k][g] > response[bestGrating][g]) {
          bestGrating = k;
        }
      }
      assertThat(bestChannel).as("grating scale %d orientation %d", g / ORIENTATIONS, g % ORIENTATIONS).isEqualTo(g);
      assertThat(bestGrating).as("channel scale %d orientation %d", g / ORIENTATIONS, g % ORIENTATIONS).isEqualTo(g);
    }
  }

  @Test
  void evenKernelsHaveNoDcAndAllKernelsUnitNorm() {
    for (int o = 0; o < ORIENTATIONS; o++) {
      double[][] pair = GaborBank.kernelPair(o);
      double dc = 0;
      double e = 0;
      double q = 0;
      for (int i = 0; i < pair[0].length; i++) {
        dc += pair[0][i];
        e += pair[0][i] * pair[0][i];
        q += pair[1][i] * pair[1][i];
      }
      assertThat(Math.abs(dc)).isLessThan(1e-9);
      assertThat(e).isCloseTo(1.0, org.assertj.core.api.Assertions.within(1e-9));
      assertThat(q).isCloseTo(1.0, org.assertj.core.api.Assertions.within(1e-9));
    }
  }

  /** Channel 0 of an input tensor: cos grating, wavelength 4 * 2^scale px, wave vector at orientation * pi / 8. */
  private static float[] grating(int scale, int orientation) {
    int n = GistModelBuilder.SIZE;
    float[] input = new float[GistModelBuilder.CHANNELS * n * n];
    double lambda = GaborBank.WAVELENGTH * (1 << scale);
    double theta = orientation * Math.PI / ORIENTATIONS;
    for (int y = 0; y < n; y++) {
      for (int x = 0; x < n; x++) {
        input[y * n + x] = (float) Math.cos(2 * Math.PI * (x * Math.cos(theta) + y * Math.sin(theta)) / lambda);
      }
    }
    return input;
  }
}
