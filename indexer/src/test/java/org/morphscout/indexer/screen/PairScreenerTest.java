package org.morphscout.indexer.screen;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.Analyses;
import org.morphscout.indexer.pairing.ColourDifference;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.Verdict;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.warp.WarpEstimator;

class PairScreenerTest {
  private final PairScorer scorer =
      new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());

  private static ImageAnalysis byPath(String path) throws IOException {
    return switch (path) {
      case "a.jpg" -> Analyses.builder(1).build();
      case "b.jpg" -> Analyses.builder(2).build();
      case "tiny.jpg" -> Analyses.builder(3).size(120, 90).build();
      default -> throw new IOException("cannot read " + path + ": not a JPEG file");
    };
  }

  @Test
  void aThrowingResolverGivesAFailRowWithTheReasonAndKeepsExtras() {
    PairScreener screener = new PairScreener(scorer, PairScreenerTest::byPath);
    ScreenResult r = screener.screen(new ScreenRow("a.jpg", "broken.png", List.of("shot 12", "keep")));
    assertThat(r.verdict()).isEqualTo(Verdict.FAIL);
    assertThat(r.score()).isZero();
    assertThat(r.reasons()).containsExactly("cannot use B (broken.png): cannot read broken.png: not a JPEG file");
    assertThat(r.extras()).containsExactly("shot 12", "keep");
    assertThat(r.a()).isEqualTo("a.jpg");
    assertThat(r.b()).isEqualTo("broken.png");
  }

  @Test
  void goodRowsAreScoredAndEachPathIsResolvedOnce() {
    AtomicInteger calls = new AtomicInteger();
    PairScreener screener = new PairScreener(scorer, p -> {
      calls.incrementAndGet();
      return byPath(p);
    });
    List<ScreenResult> out = screener.screenAll(List.of(
        new ScreenRow("a.jpg", "b.jpg", List.of("1")),
        new ScreenRow("a.jpg", "tiny.jpg", List.of("2")),
        new ScreenRow("missing.jpg", "b.jpg", List.of())), ProgressListener.NONE, CancellationToken.none());
    assertThat(out).hasSize(3);
    assertThat(out.get(0).verdict()).isEqualTo(Verdict.PASS);
    assertThat(out.get(0).extras()).containsExactly("1");
    assertThat(out.get(1).reasons()).contains("the second picture is tiny (120x90 px)");
    assertThat(out.get(2).verdict()).isEqualTo(Verdict.FAIL);
    assertThat(out.get(2).reasons().get(0)).startsWith("cannot use A (missing.jpg)");
    assertThat(calls.get()).isEqualTo(4);
  }

  @Test
  void aRuntimeFailureOrNullIsAlsoAFailRow() {
    PairScreener screener = new PairScreener(scorer, p -> {
      if (p.equals("null.jpg")) {
        return null;
      }
      throw new IllegalStateException("decoder crashed");
    });
    assertThat(screener.screen(new ScreenRow("x.jpg", "null.jpg", List.of())).reasons())
        .containsExactly("cannot use A (x.jpg): decoder crashed", "cannot use B (null.jpg): no analysis found");
  }
}
