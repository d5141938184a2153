package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * The pair score of seeded, generated pair facts against the scores the scorer gave before its settings and reasons
 * were redefined (the file {@code pair-score-reference.txt}, written by this class from the code of the time): every
 * score, upper bound and sub-score identical to the last bit, every verdict the same, and every reason still there
 * with the same figures about the same picture (compared by its numbers and the picture it names, since the words
 * may change). Runs with the defaults and with two sets of changed settings given by their earlier flat names, so
 * settings written for earlier releases keep their meaning.
 *
 * <p>To write the reference again (only when a score is meant to change), run {@link #main} with the path of the
 * file in {@code src/test/resources}.
 */
class PairScoreReferenceTest {
  private static final long SEED = 20261204L;
  private static final int CASES = 400;
  private static final String FILE = "pair-score-reference.txt";

  /** Settings in the earlier flat names; every one of them must keep its meaning. */
  static final List<Map<String, String>> SETTINGS = List.of(
      Map.of(),
      ordered("overlapWeight", "1.2", "appearanceWeight", "4", "iouZero", "0.1", "iouFull", "0.8",
          "effortScale", "0.3", "reasonIou", "0.8", "reasonDeltaE", "10", "passScore", "55", "warnScore", "30",
          "tinyLongSide", "500", "cutOffPenalty", "0.9", "passMaxAspectGap", "0.5", "reasonExposure", "10",
          "reasonTurnGain", "0.05"),
      ordered("colourWeight", "0", "contrastWeight", "2", "foldTolerance", "0.2", "appearanceScale", "1.5",
          "deltaEScale", "20", "lightnessScale", "30", "aspectScale", "0.3", "resolutionFull", "0.9",
          "scaleFull", "0.4", "offsetScale", "0.2", "backgroundScale", "20", "reasonEffort", "0.05",
          "reasonFold", "0.05", "reasonAppearance", "0.2", "reasonLightness", "20", "reasonContrast", "0.7",
          "reasonAspect", "0.3", "reasonScale", "0.8", "reasonOffset", "0.1", "reasonResolution", "0.6",
          "reasonBackground", "10", "severalObjectsPenalty", "0.5", "tinyPenalty", "0.4", "warpEffortWeight", "3",
          "backgroundWeight", "1", "silhouetteMatchWeight", "2", "foldSafetyWeight", "0.5",
          "lightnessWeight", "1", "aspectWeight", "1", "resolutionWeight", "0.5", "objectScaleWeight", "1",
          "placementWeight", "1"));

  /** The pictures a reason names and the figures it gives, whatever words surround them. */
  private static final Pattern TOKENS = Pattern.compile("\\b(A|B|first|second)\\b|\\d+(?:\\.\\d+)?");

  @Test
  void scoresVerdictsAndReasonsAreThoseOfTheReference() throws IOException {
    List<String> expected;
    try (InputStream in = PairScoreReferenceTest.class.getResourceAsStream(FILE)) {
      assertThat(in).as("reference file " + FILE).isNotNull();
      expected = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
    }
    List<String> actual = lines();
    assertThat(actual).as("lines (seed %d)", SEED).hasSize(expected.size()).hasSize(SETTINGS.size() * CASES);
    for (int i = 0; i < actual.size(); i++) {
      assertThat(actual.get(i)).as("case %d of the reference (seed %d)", i, SEED).isEqualTo(expected.get(i));
    }
  }

  @Test
  void anEarlierSettingsFileScoresAsItsOverrides(@TempDir Path dir) throws IOException {
    // A settings file in the earlier flat form loads to the same configuration as the same keys given one by one.
    StringBuilder props = new StringBuilder("# written for an earlier release\n");
    SETTINGS.get(2).forEach((k, v) -> props.append(k).append(" = ").append(v).append('\n'));
    Path file = dir.resolve("earlier.properties");
    Files.writeString(file, props);
    ScoreConfig loaded = ScoreConfig.load(file);
    ScoreConfig given = ScoreConfig.DEFAULTS.withOverrides(SETTINGS.get(2));
    PairScorer a = new PairScorer(loaded, ColourDifference.cie76(), new WarpEstimator());
    PairScorer b = new PairScorer(given, ColourDifference.cie76(), new WarpEstimator());
    SplittableRandom random = new SplittableRandom(SEED);
    for (int i = 0; i < 50; i++) {
      PairFacts f = facts(random);
      assertThat(a.explain(f)).as("case %d (seed %d)", i, SEED).isEqualTo(b.explain(f));
    }
  }

  static List<String> lines() {
    List<String> out = new ArrayList<>();
    for (int s = 0; s < SETTINGS.size(); s++) {
      PairScorer scorer = new PairScorer(ScoreConfig.DEFAULTS.withOverrides(SETTINGS.get(s)),
          ColourDifference.cie76(), new WarpEstimator());
      SplittableRandom random = new SplittableRandom(SEED);
      for (int i = 0; i < CASES; i++) {
        out.add(line(s, i, scorer, facts(random)));
      }
    }
    return out;
  }

  private static String line(int settings, int i, PairScorer scorer, PairFacts f) {
    PairScore s = scorer.explain(f);
    StringBuilder b = new StringBuilder();
    b.append(settings).append(' ').append(i).append(' ').append(Double.toHexString(s.score()))
        .append(" bound ").append(Double.toHexString(scorer.upperBound(f))).append(' ').append(s.verdict());
    s.components().forEach((k, v) -> b.append(' ').append(k).append('=').append(Double.toHexString(v)));
    List<String> reasons = new ArrayList<>();
    for (String r : s.reasons()) {
      List<String> tokens = new ArrayList<>();
      Matcher m = TOKENS.matcher(r);
      while (m.find()) {
        tokens.add(switch (m.group()) {
          case "A" -> "first";
          case "B" -> "second";
          default -> m.group();
        });
      }
      reasons.add(String.join(",", tokens));
    }
    reasons.sort(null);
    b.append(" reasons ").append(reasons.size()).append(' ').append(String.join("|", reasons));
    return b.toString();
  }

  /**
   * Pair facts spread across every threshold, with missing measures, empty and faulty pictures now and then; half of
   * them drawn close to an ideal pair, so that passing verdicts are as well covered as failing ones.
   */
  static PairFacts facts(SplittableRandom r) {
    ImageFacts a = image(r);
    ImageFacts b = image(r);
    double g = r.nextDouble() < 0.5 ? 0.25 : 1; // the share of each measure's range drawn from
    double la = r.nextDouble(100);
    double lb = Math.clamp(la + r.nextDouble(-100, 100) * g, 0, 100);
    double sa = r.nextDouble(0.5, 30);
    double sb = r.nextDouble(0.5, 30);
    boolean colour = r.nextDouble() > 0.1;
    PairMeasures m = new PairMeasures(
        r.nextDouble() < 0.1 ? Double.NaN : r.nextDouble(1.2 * g),
        colour ? r.nextDouble(60 * g) : Double.NaN,
        colour ? la : Double.NaN, colour ? lb : Double.NaN,
        colour ? sa : Double.NaN, colour ? sb : Double.NaN,
        colour ? 1 - g * (1 - Math.min(sa, sb) / Math.max(sa, sb)) : Double.NaN,
        r.nextDouble() < 0.2 ? 0 : r.nextDouble(0.8 * g),
        1 - r.nextDouble(0.95 * g),
        1 - r.nextDouble(g),
        r.nextDouble(0.6 * g),
        r.nextDouble() < 0.1 ? Double.NaN : r.nextDouble(60 * g),
        r.nextDouble(100), r.nextDouble(100));
    double aligned = 1 - r.nextDouble(g);
    WarpMeasures w = new WarpMeasures(aligned * r.nextDouble(0.5, 1), aligned, Math.min(1, aligned + r.nextDouble(0.3)),
        r.nextDouble(0.4 * g), r.nextDouble(0.4, 1), r.nextDouble() < 0.3 ? 0 : r.nextDouble(0.1 * g),
        r.nextDouble() < 0.5 ? Double.NaN : Math.min(1, aligned + r.nextDouble(-0.1, 0.4)),
        r.nextDouble(-Math.PI, Math.PI));
    return new PairFacts(a, b, a.empty() || b.empty() ? null : m, a.empty() || b.empty() ? null : w);
  }

  private static ImageFacts image(SplittableRandom r) {
    boolean tiny = r.nextDouble() < 0.1;
    int width = tiny ? r.nextInt(40, 320) : r.nextInt(100, 4000);
    int height = tiny ? r.nextInt(40, 320) : r.nextInt(100, 4000);
    boolean uncertain = r.nextDouble() < 0.1;
    return new ImageFacts(width, height, r.nextDouble() < 0.03, r.nextDouble() < 0.15,
        r.nextDouble() < 0.15 ? r.nextInt(2, 9) : 1, uncertain ? r.nextDouble(0.45) : r.nextDouble(0.45, 1),
        uncertain, r.nextDouble(0.01, 0.9));
  }

  private static Map<String, String> ordered(String... keyValues) {
    Map<String, String> m = new LinkedHashMap<>();
    for (int i = 0; i < keyValues.length; i += 2) {
      m.put(keyValues[i], keyValues[i + 1]);
    }
    return m;
  }

  /** Writes the reference to the file given (only when a score is meant to change). */
  public static void main(String[] args) throws IOException {
    Files.write(Path.of(args[0]), lines());
  }
}
