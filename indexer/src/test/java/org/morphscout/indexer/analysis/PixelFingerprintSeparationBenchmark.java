package org.morphscout.indexer.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.EncodedImage;
import org.morphscout.demo.FamilyItem;
import org.morphscout.demo.ImageCodec;
import org.morphscout.demo.NearDuplicateSet;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.feature.Ciede2000;
import org.morphscout.indexer.feature.ColourStatistics;
import org.morphscout.indexer.feature.OnnxAppearanceEmbedder;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.ingest.ImageIoDecoder;
import org.morphscout.indexer.pairing.NearDuplicateConfig;
import org.morphscout.indexer.pairing.NearDuplicates;
import org.morphscout.indexer.silhouette.DefaultSilhouettes;
import org.morphscout.indexer.silhouette.ShapeDescriptors;

/**
 * How well the pixel fingerprint separates edited copies from neighbouring members of silhouette families, measured
 * over several seeds on pairs that pass every other near-duplicate condition (so only the cases the fingerprint has
 * to decide count). Prints the figures behind {@link NearDuplicateConfig#minFingerprintCorrelation()}; a benchmark
 * (about a minute), not a test.
 */
@Tag("benchmark")
class PixelFingerprintSeparationBenchmark {
  private static final long[] SEEDS = {8401, 7202, 8502, 1, 3, 4};

  @TempDir static Path tmp;
  static ImageAnalyzer analyzer;
  static int files;

  @BeforeAll
  static void analyzer() throws IOException {
    analyzer = new ImageAnalyzer(new ImageIoDecoder(DecodeOptions.defaults()), new DefaultSilhouettes(),
        new ShapeDescriptors(), new ColourStatistics(), OnnxAppearanceEmbedder.builtIn(tmp.resolve("models")));
  }

  @AfterAll
  static void close() {
    analyzer.embedder().close();
  }

  private static ImageAnalysis analyse(byte[] bytes, String ext) throws IOException {
    Path f = Files.write(tmp.resolve("f" + (files++) + "." + ext), bytes);
    return analyzer.analyze(f);
  }

  private record Pair(ImageAnalysis a, ImageAnalysis b, String kind, String label) {}

  @Test
  void separation() throws IOException {
    List<Pair> pairs = new ArrayList<>();
    for (long seed : SEEDS) {
      for (Archetype[] ab : new Archetype[][] {{Archetype.VASE, Archetype.BOTTLE}, {Archetype.JUG, Archetype.BOTTLE}}) {
        for (int size : new int[] {8, 11}) {
          List<FamilyItem> items = TestFamilies.silhouetteFamily(seed, size, ab[0], ab[1]);
          List<ImageAnalysis> f = new ArrayList<>();
          for (FamilyItem x : items) {
            f.add(analyse(ImageCodec.png(x.image()), "png"));
          }
          for (int i = 0; i + 1 < f.size(); i++) {
            String label = seed + " " + items.get(i).label();
            if (size == 8) {
              pairs.add(new Pair(f.get(i), f.get(i + 1), "family, t 1/7 apart", label));
            } else if (i + 2 < f.size()) {
              pairs.add(new Pair(f.get(i), f.get(i + 2), "family, t 0.2 apart", label));
            }
          }
          if (size == 8) {
            // The demo library's copies (ProductPlanner): -web, -small, -edit.
            var img = items.get(5).image();
            int w = img.getWidth();
            int h = img.getHeight();
            ImageAnalysis o = analyse(ImageCodec.jpeg(img, 0.9f), "jpg");
            pairs.add(new Pair(o, analyse(ImageCodec.jpeg(ImageCodec.resize(img, w * 5 / 8, h * 5 / 8), 0.75f),
                "jpg"), "copy", seed + " web"));
            pairs.add(new Pair(o, analyse(ImageCodec.jpeg(ImageCodec.resize(img, w * 9 / 20, h * 9 / 20), 0.85f),
                "jpg"), "copy", seed + " small"));
            pairs.add(new Pair(o, analyse(ImageCodec.jpeg(ImageCodec.resize(ImageCodec.brightened(ImageCodec.cropped(
                img, w * 3 / 100, h * 3 / 100, w - w * 6 / 100, h - h * 6 / 100), 1.05), w * 4 / 5, h * 4 / 5),
                0.75f), "jpg"), "copy", seed + " edit"));
          }
        }
      }
      NearDuplicateSet set = TestFamilies.nearDuplicates(seed);
      List<ImageAnalysis> all = new ArrayList<>();
      List<String> labels = new ArrayList<>();
      all.add(analyse(set.original().bytes(), "jpg"));
      labels.add("original");
      for (EncodedImage c : set.copies()) {
        all.add(analyse(c.bytes(), c.format().equals("png") ? "png" : "jpg"));
        labels.add(c.label());
      }
      for (int i = 0; i < all.size(); i++) {
        for (int j = i + 1; j < all.size(); j++) {
          pairs.add(new Pair(all.get(i), all.get(j), "copy", seed + " " + labels.get(i) + "/" + labels.get(j)));
        }
      }
    }
    // The other conditions alone: the fingerprint threshold set to -1 turns it off.
    NearDuplicates others = new NearDuplicates(
        NearDuplicateConfig.DEFAULTS.withOverrides(java.util.Map.of("minFingerprintCorrelation", "-1")),
        Ciede2000::difference);
    double threshold = NearDuplicateConfig.DEFAULTS.minFingerprintCorrelation();
    StringBuilder report = new StringBuilder();
    for (String kind : List.of("copy", "family, t 1/7 apart", "family, t 0.2 apart")) {
      List<Double> r = new ArrayList<>();
      int total = 0;
      String worst = "";
      double worstR = kind.equals("copy") ? 2 : -2;
      for (Pair p : pairs) {
        if (!p.kind().equals(kind)) {
          continue;
        }
        total++;
        if (!others.areDuplicates(p.a(), p.b())) {
          continue;
        }
        double c = PixelFingerprint.correlation(p.a().fingerprint(), p.b().fingerprint());
        r.add(c);
        if (kind.equals("copy") ? c < worstR : c > worstR) {
          worstR = c;
          worst = p.label();
        }
      }
      r.sort(Double::compare);
      long passing = r.stream().filter(c -> c >= threshold).count();
      report.append(String.format(Locale.ROOT, "%-20s %3d pairs, %3d pass the other conditions; fingerprint r: "
              + "min %.4f, median %.4f, max %.4f; %d at or above %.3f; %s %s%n", kind, total, r.size(),
          r.isEmpty() ? Double.NaN : r.get(0), r.isEmpty() ? Double.NaN : r.get(r.size() / 2),
          r.isEmpty() ? Double.NaN : r.get(r.size() - 1), passing, threshold,
          kind.equals("copy") ? "lowest:" : "highest:", worst));
      report.append("    at or above");
      for (double t : new double[] {0.993, 0.994, 0.995, 0.996, 0.997, 0.998}) {
        report.append(String.format(Locale.ROOT, " %.3f: %d;", t, r.stream().filter(c -> c >= t).count()));
      }
      report.append(System.lineSeparator());
    }
    System.out.print(report);
    assertThat(pairs).isNotEmpty();
  }
}
