package org.morphscout.indexer.library;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.analysis.ImageAnalyzer;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.pairing.PairScore;
import org.morphscout.indexer.pairing.PairScorer;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.pairing.Verdict;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;
import org.morphscout.indexer.testing.CommentedCsv;
import org.morphscout.indexer.testing.OutsideData;
import org.morphscout.indexer.warp.WarpEstimator;

/**
 * Silhouettes of the default analysis ({@code index}'s: the per-image choice between the classical and the learned
 * extractor) on real photographs packaged by Debian, against object boxes drawn by hand (test resource
 * {@code real-photo-boxes.csv}, which says how): the mask's bounding box must overlap the drawn box with IoU >= 0.7.
 *
 * <p>Sources: Debian package {@code opencv-doc} (OpenCV's sample data, {@code /usr/share/doc/opencv-doc/examples/data},
 * licensed with OpenCV) and {@code python3-skimage} (scikit-image's data images, {@code .../skimage/data}, each
 * under the licence listed in that package's copyright file). The pictures are read where the packages install them;
 * {@code .ci/run} installs both packages and the learned model, and under CI ({@code CI} set) a missing one fails
 * the test instead of skipping it.
 */
class MasksOnRealPhotosTest {

  @TempDir static Path tmp;
  static Library library;
  static ImageAnalyzer analyzer;

  record Drawn(String pkg, String file, double x0, double y0, double x1, double y1) {
    Path path() {
      return (pkg.equals("opencv-doc") ? OutsideData.OPENCV_SAMPLES : OutsideData.SKIMAGE_DATA).resolve(file);
    }
  }

  @BeforeAll
  static void open() throws IOException {
    OutsideData.require(OutsideData.OPENCV_SAMPLES, "opencv-doc");
    OutsideData.require(OutsideData.SKIMAGE_DATA, "python3-skimage");
    if (new SalientModelStore().find(ModelFolder.resolve(Optional.empty()), tmp).isEmpty()) {
      OutsideData.unavailable("the learned silhouette model is not installed (./morphscout models add-salient; "
          + ".ci/run installs it)");
    }
    library = Library.open(tmp.resolve("catalog"));
    // The analyser index builds with its default setup (the command line's default silhouettes: auto).
    analyzer = AnalyzerFactory.create(library, AnalysisSetup.defaults()
        .withSilhouettes(AnalysisSetup.SilhouetteMode.AUTO).withModels(ModelFolder.resolve(Optional.empty())));
  }

  @AfterAll
  static void close() throws IOException {
    if (analyzer != null) {
      analyzer.embedder().close();
    }
    if (library != null) {
      library.close();
    }
  }

  static List<Drawn> drawn() throws IOException {
    List<Drawn> out = new ArrayList<>();
    for (String[] f : CommentedCsv.rows(MasksOnRealPhotosTest.class, "real-photo-boxes.csv")) {
      out.add(new Drawn(f[0], f[1], Double.parseDouble(f[2]), Double.parseDouble(f[3]), Double.parseDouble(f[4]),
          Double.parseDouble(f[5])));
    }
    return out;
  }

  /** The mask's bounding box as fractions of the mask: x0, y0, x1, y1; null for an empty mask. */
  static double[] box(Mask m) {
    int x0 = m.width();
    int y0 = m.height();
    int x1 = -1;
    int y1 = -1;
    for (int y = 0; y < m.height(); y++) {
      for (int x = 0; x < m.width(); x++) {
        if (m.get(x, y)) {
          x0 = Math.min(x0, x);
          y0 = Math.min(y0, y);
          x1 = Math.max(x1, x);
          y1 = Math.max(y1, y);
        }
      }
    }
    if (x1 < 0) {
      return null;
    }
    return new double[] {x0 / (double) m.width(), y0 / (double) m.height(), (x1 + 1) / (double) m.width(),
        (y1 + 1) / (double) m.height()};
  }

  static double boxIou(double[] a, Drawn d) {
    double ix = Math.max(0, Math.min(a[2], d.x1()) - Math.max(a[0], d.x0()));
    double iy = Math.max(0, Math.min(a[3], d.y1()) - Math.max(a[1], d.y0()));
    double inter = ix * iy;
    double union = (a[2] - a[0]) * (a[3] - a[1]) + (d.x1() - d.x0()) * (d.y1() - d.y0()) - inter;
    return union <= 0 ? 0 : inter / union;
  }

  @Test
  void defaultSilhouettesMatchHandDrawnBoxes() throws IOException {
    List<Drawn> boxes = drawn();
    assertThat(boxes).as("pictures with a drawn box").hasSizeGreaterThanOrEqualTo(6);
    List<String> report = new ArrayList<>();
    List<String> misses = new ArrayList<>();
    for (Drawn d : boxes) {
      OutsideData.require(d.path(), d.pkg());
      ImageAnalysis a = analyzer.analyze(d.path());
      double[] b = box(a.silhouette().mask());
      double iou = b == null ? 0 : boxIou(b, d);
      String line = String.format(Locale.ROOT, "%s: box IoU %.2f (%s, confidence %.2f)%s", d.file(), iou,
          a.silhouette().source(), a.silhouette().confidence(),
          b == null ? " empty" : String.format(Locale.ROOT, " mask box %.2f,%.2f,%.2f,%.2f", b[0], b[1], b[2], b[3]));
      report.add(line);
      if (iou < 0.7) {
        misses.add(line);
      }
    }
    System.err.println(String.join("\n", report)); // the per-photo figures, for the record
    assertThat(misses).as("photos whose mask box overlaps the drawn box with IoU < 0.7").isEmpty();
  }

  @Test
  void realPairsScreenWithReasonsAPersonWouldGive() throws IOException {
    // Common practice in morphing: two round fruits of one size morph well; a fruit into a motorcycle does not.
    PairScorer scorer = new PairScorer(ScoreConfig.DEFAULTS, Ciede2000::difference, new WarpEstimator());
    ImageAnalysis apple = analyzer.analyze(OutsideData.require(OutsideData.OPENCV_SAMPLES.resolve("apple.jpg"),
        "opencv-doc"));
    ImageAnalysis orange = analyzer.analyze(OutsideData.require(OutsideData.OPENCV_SAMPLES.resolve("orange.jpg"),
        "opencv-doc"));
    ImageAnalysis motorcycle = analyzer.analyze(OutsideData.require(
        OutsideData.SKIMAGE_DATA.resolve("motorcycle_left.png"), "python3-skimage"));
    PairScore fruit = scorer.score(apple, orange);
    PairScore unlike = scorer.score(apple, motorcycle);
    assertThat(fruit.reasons()).noneMatch(r -> r.startsWith("silhouettes match poorly"));
    assertThat(fruit.verdict()).isNotEqualTo(Verdict.FAIL);
    assertThat(unlike.reasons()).anyMatch(r -> r.startsWith("silhouettes match poorly"));
    assertThat(unlike.verdict()).isEqualTo(Verdict.FAIL);
    assertThat(fruit.score()).isGreaterThan(unlike.score() + 20);
  }
}
