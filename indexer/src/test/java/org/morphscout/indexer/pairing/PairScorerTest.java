package org.morphscout.indexer.pairing;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.warp.TestMasks;
import org.morphscout.indexer.warp.WarpEstimator;

class PairScorerTest {
  private final PairScorer scorer =
      new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());

  private static ImageAnalysis clean(long id) {
    return Analyses.builder(id).build();
  }

  @Test
  void aCleanPairPassesWithoutReasons() {
    PairScore s = scorer.score(clean(1), clean(2));
    assertThat(s.reasons()).isEmpty();
    assertThat(s.verdict()).isEqualTo(Verdict.PASS);
    assertThat(s.score()).isGreaterThan(90);
    assertThat(s.components().keySet()).startsWith("silhouetteMatch", "warpEffort", "foldSafety", "appearance");
    assertThat(s.components().values()).allSatisfy(v -> assertThat(v).isBetween(0.0, 1.0));
    assertThat(s.measures()).containsKeys("alignedIou", "warpedIou", "meanDisplacement", "foldFraction",
        "appearanceDistance", "deltaE00", "lightnessGap", "stdRatio", "aspectRatioGap", "resolutionRatio",
        "scaleRatio", "offset");
    assertThat(s.warp()).isPresent();
  }

  @Test
  void growingSilhouetteDifferenceLowersTheScoreMonotonically() {
    // A vase whose neck widens with t: each step moves further from t = 0 (by construction), so the score must fall.
    ImageAnalysis a = Analyses.builder(1).object(TestMasks.vase(0)).build();
    double previous = Double.POSITIVE_INFINITY;
    for (double t : new double[] {0, 0.25, 0.5, 0.75, 1.0}) {
      ImageAnalysis b = Analyses.builder(2).object(TestMasks.vase(t)).build();
      double score = scorer.score(a, b).score();
      assertThat(score).as("score at t=%s", t).isLessThan(previous);
      previous = score;
    }
  }

  @Test
  void eachScreeningReasonIsTriggeredByThePairBuiltForIt() {
    expectReason(b -> b.cutOff(), "object cut off by the frame in the second picture");
    expectReason(b -> b.components(2), "two objects in the second picture");
    expectReason(b -> b.size(1080, 1920), "aspect ratios differ (4:3 vs 9:16)");
    expectReason(b -> b.size(120, 90), "the second picture is tiny (120x90 px)");
    // Lightness gap 42 > default threshold 40.
    expectReason(b -> b.foreground(92, 10, 20), "dark vs bright (L* 50 vs 92)");
  }

  @Test
  void furtherReasonsAreTriggeredByThePairBuiltForThem() {
    // L* spread 15 against 3: ratio 0.2 < 0.4.
    expectReason(b -> b.foregroundStd(3, 5, 5), "contrast differs (L* spread 15 vs 3)");
    // 640x480 against 4000x3000: sqrt of the pixel ratio is 0.16 < 0.25.
    expectReason(b -> b.size(4000, 3000), "resolutions differ a lot (640x480 vs 4000x3000 px)");
    expectReason(b -> b.appearance(Analyses.look(12345)), "the pictures look different");
  }

  @Test
  void colourGapsAreQuotedInCiede2000AsPublished() {
    // Sharma, Wu and Dalal (2005), Table 1 (in the suite: feature/ciede2000-sharma-2005.csv), pair 17:
    // (50, 2.5, 0) against (73, 25, -18) is dE00 27.1492; pair 19: (50, 2.5, 0) against (56, -27, -3) is 31.9030.
    ImageAnalysis a = Analyses.builder(1).foreground(50, 2.5, 0).background(50, 2.5, 0).build();
    ImageAnalysis b = Analyses.builder(2).foreground(73, 25, -18).background(56, -27, -3).build();
    PairScore s = scorer.score(a, b);
    // Measures are kept at single precision, hence the 1e-3 tolerance on top of the table's four decimals.
    assertThat(s.measures().get("deltaE00")).isCloseTo(27.1492, org.assertj.core.data.Offset.offset(1e-3));
    assertThat(s.measures().get("backgroundDeltaE00")).isCloseTo(31.9030, org.assertj.core.data.Offset.offset(1e-3));
    assertThat(s.reasons()).contains("large colour gap (ΔE00 27)", "backgrounds differ (ΔE00 32)");
    // The colour sub-score is 1 - dE00 / deltaEScale (40 by default).
    assertThat(s.components().get("colour")).isCloseTo(1 - 27.1492 / 40, org.assertj.core.data.Offset.offset(1e-4));
  }

  @Test
  void darkVersusBrightNamesBothLightnesses() {
    ImageAnalysis a = Analyses.builder(1).foreground(18, 0, 0).build();
    ImageAnalysis b = Analyses.builder(2).foreground(82, 0, 0).build();
    assertThat(scorer.score(a, b).reasons()).contains("dark vs bright (L* 18 vs 82)");
    assertThat(scorer.score(b, a).reasons()).contains("bright vs dark (L* 82 vs 18)");
  }

  @Test
  void twoObjectsInAAreNamedForA() {
    PairScore s = scorer.score(Analyses.builder(1).components(2).build(), clean(2));
    assertThat(s.reasons()).contains("two objects in the first picture");
  }

  @Test
  void framingFaultsLowerTheScoreAndCapTheVerdict() {
    PairScore ok = scorer.score(clean(1), clean(2));
    PairScore cut = scorer.score(clean(1), Analyses.builder(2).cutOff().build());
    assertThat(cut.score()).isLessThan(ok.score());
    assertThat(cut.verdict()).isNotEqualTo(Verdict.PASS);
  }

  @Test
  void aPairWithoutSilhouetteFails() {
    PairScore s = scorer.score(clean(1), Analyses.builder(2).noObject().build());
    assertThat(s.verdict()).isEqualTo(Verdict.FAIL);
    assertThat(s.score()).isZero();
    assertThat(s.reasons()).containsExactly("no object found in the second picture");
    assertThat(s.warp()).isEmpty();
  }

  @Test
  void poorSilhouetteMatchIsReported() {
    // A tall thin bar against a disc: after alignment the IoU is far below 0.6 by geometry.
    ImageAnalysis a = Analyses.builder(1).object(new java.awt.geom.Rectangle2D.Double(-5, -40, 10, 80)).build();
    ImageAnalysis b = Analyses.builder(2).object(new java.awt.geom.Ellipse2D.Double(-20, -20, 40, 40)).build();
    PairScore s = scorer.score(a, b);
    assertThat(s.reasons().get(0)).startsWith("silhouettes match poorly after alignment (aligned IoU 0.");
    assertThat(s.verdict()).isNotEqualTo(Verdict.PASS);
  }

  @Test
  void verdictIsWrittenLowerCase() {
    assertThat(Verdict.PASS.toString()).isEqualTo("pass");
    assertThat(Verdict.WARN.label()).isEqualTo("warn");
    assertThat(Verdict.FAIL.toString()).isEqualTo("fail");
  }

  @Test
  void aWholePictureExposureGapIsNamedEvenWhenTheObjectsMatch() {
    // Same object colour; the background (most of the frame) is dark in A and bright in B, as in an under- and an
    // over-exposed shot of one scene. L* 21 and 84 are the CIELAB lightness of sRGB greys 50 and 210 (CIE 15 / IEC
    // 61966-2-1 formulas; values worked out by hand from them).
    ImageAnalysis a = Analyses.builder(1).foreground(50, 10, 20).background(21, 0, 0).build();
    ImageAnalysis b = Analyses.builder(2).foreground(50, 10, 20).background(84, 0, 0).build();
    PairScore s = scorer.score(a, b);
    double ea = PairMeasures.exposure(a);
    double eb = PairMeasures.exposure(b);
    double f = a.shape().areaFraction();
    assertThat(ea).isCloseTo(f * 50 + (1 - f) * 21, org.assertj.core.data.Offset.offset(1e-9));
    assertThat(s.reasons()).anySatisfy(r -> assertThat(r)
        .startsWith("the first picture is exposed much darker than the second").contains(String.format(java.util.Locale.ROOT, "%.0f vs %.0f", ea, eb)));
    assertThat(s.reasons()).noneMatch(r -> r.startsWith("dark vs bright"));
    // Pair measures are kept at single precision (the precision they are stored at in the catalog).
    assertThat(s.measures().get("exposureGap")).isCloseTo(Math.abs(ea - eb), org.assertj.core.data.Offset.offset(1e-4));
    // The reverse order names the other side.
    assertThat(scorer.score(b, a).reasons())
        .anyMatch(r -> r.startsWith("the first picture is exposed much brighter than the second"));
    // A small exposure difference says nothing.
    ImageAnalysis c = Analyses.builder(3).foreground(50, 10, 20).background(30, 0, 0).build();
    assertThat(scorer.score(a, c).reasons()).noneMatch(r -> r.contains("exposed"));
  }

  @Test
  void framesOfClearlyDifferentAspectRatiosNeverPass() {
    // 4:3 against 2.5:1: |ln(1.333 / 2.5)| = 0.63, far beyond the default 0.2.
    ImageAnalysis a = Analyses.builder(1).size(1600, 1200).build();
    ImageAnalysis wide = Analyses.builder(2).size(2500, 1000).build();
    PairScore s = scorer.score(a, wide);
    assertThat(s.score()).as("otherwise a good pair").isGreaterThanOrEqualTo(ScoreConfig.DEFAULTS.warnScore());
    assertThat(s.verdict()).isEqualTo(Verdict.WARN);
    // 3:2 against 4:3 (|ln 1.125| = 0.118) is within the limit: a clean pair still passes.
    PairScore close = scorer.score(Analyses.builder(1).size(1500, 1000).build(), Analyses.builder(2).size(1600, 1200)
        .build());
    assertThat(close.verdict()).isEqualTo(Verdict.PASS);
    // The limit is a setting.
    PairScorer lenient = new PairScorer(ScoreConfig.DEFAULTS.withOverrides(java.util.Map.of("passMaxAspectGap", "1")),
        Ciede2000::difference, new WarpEstimator());
    PairScore lenientScore = lenient.score(a, wide);
    assertThat(lenientScore.verdict()).isEqualTo(lenientScore.score() >= ScoreConfig.DEFAULTS.passScore()
        ? Verdict.PASS : Verdict.WARN);
  }

  @Test
  void anUncertainSilhouetteIsNamedFirstAndThePairNeverPasses() {
    PairScore sure = scorer.score(clean(1), clean(2));
    assertThat(sure.verdict()).isEqualTo(Verdict.PASS);
    ImageAnalysis doubtful = Analyses.builder(2).confidence(0.3).build();
    PairScore s = scorer.score(clean(1), doubtful);
    assertThat(s.reasons().get(0)).isEqualTo("the silhouette of the second picture is uncertain (confidence 0.30), "
        + "so its shape figures may be wrong");
    assertThat(s.verdict()).isEqualTo(Verdict.WARN);
    // At the threshold it is no longer uncertain.
    ImageAnalysis atLimit = Analyses.builder(2).confidence(org.morphscout.indexer.silhouette.Silhouette.UNCERTAIN_BELOW)
        .build();
    assertThat(scorer.score(clean(1), atLimit).verdict()).isEqualTo(Verdict.PASS);
  }

  private void expectReason(UnaryOperator<Analyses.Builder> change, String reason) {
    ImageAnalysis a = clean(1);
    assertThat(scorer.score(a, clean(2)).reasons()).as("clean pair").noneMatch(r -> r.startsWith(reason));
    ImageAnalysis b = change.apply(Analyses.builder(2)).build();
    assertThat(scorer.score(a, b).reasons()).as("pair built for: " + reason)
        .anySatisfy(r -> assertThat(r).startsWith(reason));
  }
}
