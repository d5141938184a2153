package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.gui.service.LibraryBackends;
import org.morphscout.app.gui.service.ServicePairs;
import org.morphscout.app.gui.service.ServiceSimilarity;
import org.morphscout.app.gui.service.ServiceWalk;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.app.gui.task.DirectTaskRunner;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.pairing.PairComponent;
import org.morphscout.indexer.values.ImageRow;

/** The browser on the library's real services: a new catalog, indexing a folder, then a similarity search. */
class RealServicesTest {
  @TempDir Path tmp;

  @Test
  void newCatalogIndexAFolderAndFindSimilarShapes() throws Exception {
    Path photos = Files.createDirectories(tmp.resolve("photos"));
    String[] kinds = {"round", "square", "star"};
    Color[] colours = {new Color(0xC0504D), new Color(0x4F81BD), new Color(0x9BBB59)};
    for (String kind : kinds) {
      for (int i = 0; i < 3; i++) {
        SampleCatalog.Picture p = new SampleCatalog.Picture("", kind + "-" + i + ".png", kind, 0.5 + 0.15 * i,
            colours[i], 0, 0, false);
        ImageIO.write(SampleCatalog.draw(p, 320, 240, true), "png", photos.resolve(p.name()).toFile());
      }
    }
    Files.write(photos.resolve("broken.jpg"), new byte[] {(byte) 0xFF, (byte) 0xD8, 0, 1});

    try (MainViewModel vm = new MainViewModel(new DirectTaskRunner(), LibraryBackends::create)) {
      vm.open(tmp.resolve("catalog"), true);
      assertThat(vm.messageProperty().get()).isEmpty();
      // analysed as `index` does without options (auto silhouettes), not with the library's classical default
      assertThat(vm.session().backends().resources()).isInstanceOfSatisfying(QueryContext.class,
          c -> assertThat(c.setup()).isEqualTo(AnalysisSetup.indexDefaults()));
      assertThat(vm.library().visible()).isEmpty();
      vm.indexing().add(photos);
      assertThat(vm.indexing().messageProperty().get()).isEmpty();
      assertThat(vm.indexing().summaryProperty().get()).isEqualTo("10 found, 9 ready, 1 failed");
      assertThat(vm.indexing().failures()).singleElement().satisfies(f -> {
        assertThat(f.path()).endsWith("broken.jpg");
        assertThat(f.reason()).isNotBlank();
      });
      assertThat(vm.library().visible()).hasSize(10);
      assertThat(vm.session().backends().similarity()).isInstanceOf(ServiceSimilarity.class);

      ImageRow round = vm.library().visible().stream().filter(r -> r.path().endsWith("round-0.png")).findFirst()
          .orElseThrow();
      vm.library().findSimilar(round, SimilarityMode.SHAPE);
      assertThat(vm.library().messageProperty().get()).isEmpty();
      // discs differ only in size and colour; the shape vector is scale-normalised, so they come first
      assertThat(vm.library().visible().subList(0, 2)).extracting(ImageRow::path)
          .allMatch(p -> p.contains("round-"));

      // an image outside the catalog is analysed on the fly: a new disc finds the catalog's discs first
      Path outside = tmp.resolve("outside-disc.png");
      ImageIO.write(SampleCatalog.draw(new SampleCatalog.Picture("", "x.png", "round", 0.7, new Color(0x8064A2), 0.1,
          0, false), 320, 240, true), "png", outside.toFile());
      vm.library().findSimilarToFile(outside, SimilarityMode.SHAPE);
      assertThat(vm.library().messageProperty().get()).isEmpty();
      assertThat(vm.library().searchTitleProperty().get()).isEqualTo("Similar in shape to outside-disc.png");
      assertThat(vm.library().visible().subList(0, 3)).extracting(ImageRow::path).allMatch(p -> p.contains("round-"));

      // partners through the real pair scorer: scores on the command line's 0..100 scale, a disc first
      assertThat(vm.session().backends().pairs()).isInstanceOf(ServicePairs.class);
      assertThat(vm.session().backends().walk()).isInstanceOf(ServiceWalk.class);
      vm.pairs().showFor(round);
      assertThat(vm.pairs().messageProperty().get()).isEmpty();
      assertThat(vm.pairs().rows()).isNotEmpty().allSatisfy(r -> {
        assertThat(r.suggestion().score()).isBetween(0.0, 100.0);
        assertThat(r.suggestion().a()).isEqualTo(round.id());
        // every sub-score reaches the table (shown or in its column menu), keyed and ordered by its component
        assertThat(r.suggestion().components().keySet()).containsExactlyElementsOf(
            Arrays.stream(PairComponent.values()).map(PairComponent::key).toList());
      });
      // a disc against a disc covers it fully once aligned; against a star it cannot (silhouette match in [0, 1])
      double discs = vm.pairs().rows().stream().filter(r -> r.nameB().startsWith("round-"))
          .mapToDouble(r -> r.suggestion().components().get("silhouetteMatch")).min().orElseThrow();
      double stars = vm.pairs().rows().stream().filter(r -> r.nameB().startsWith("star-"))
          .mapToDouble(r -> r.suggestion().components().get("silhouetteMatch")).max().orElseThrow();
      assertThat(discs).isGreaterThan(stars);
      // the same numbers as the command line prints for the same catalog (pairs --for, CSV scores to one decimal)
      java.io.StringWriter cli = new java.io.StringWriter();
      int code = org.morphscout.app.Main.execute(new String[] {"--catalog", tmp.resolve("catalog").toString(),
          "pairs", "--for", round.path(), "--csv"}, new java.io.PrintWriter(cli),
          new java.io.PrintWriter(new java.io.StringWriter()));
      assertThat(code).isZero();
      java.util.Map<String, String> cliScores = new java.util.HashMap<>();
      cli.toString().lines().skip(1).map(l -> l.split(",")).forEach(c -> cliScores.put(c[1], c[2]));
      assertThat(vm.pairs().rows()).allSatisfy(r -> assertThat(String.format(java.util.Locale.ROOT, "%.1f",
          r.suggestion().score())).isEqualTo(cliScores.get(vm.session().row(r.suggestion().b()).orElseThrow()
          .path())));
      // Without up-to-date stored pairs the view still answers, scored live, and says so as the command line does.
      try (org.morphscout.indexer.library.Library other = org.morphscout.indexer.library.Library.open(
          tmp.resolve("catalog"))) {
        other.pairs().clear();
      }
      vm.pairs().showFor(round);
      assertThat(vm.pairs().messageProperty().get()).startsWith("scored live: ");
      assertThat(vm.pairs().rows()).isNotEmpty();
      vm.pairs().approve(vm.pairs().rows().get(0));
      assertThat(vm.pairs().rows().get(0).decisionProperty().get()).isEqualTo("approved");

      // chains on the stored neighbour graph from the smallest to the largest disc
      ImageRow big = vm.library().session().row(vm.library().session().rows().stream()
          .filter(r -> r.path().endsWith("round-2.png")).findFirst().orElseThrow().id()).orElseThrow();
      vm.session().startProperty().set(round);
      vm.session().endProperty().set(big);
      vm.chains().minStepsProperty().set(1);
      vm.chains().run();
      assertThat(vm.chains().messageProperty().get()).isEmpty();
      assertThat(vm.chains().chains()).isNotEmpty().allSatisfy(c -> {
        assertThat(c.images().get(0)).isEqualTo(round.id());
        assertThat(c.images().get(c.images().size() - 1)).isEqualTo(big.id());
        assertThat(c.maxStep()).isEqualTo(c.steps().stream().mapToDouble(s -> s.cost()).max().orElseThrow());
        assertThat(c.steps()).allSatisfy(s -> assertThat(s.components()).containsKey("score"));
      });
      var chain = vm.chains().chains().get(0);
      vm.chains().preview(chain);
      // the library's preview: 12 frames a step, the frame shared by two steps shown once
      assertThat(vm.chains().previewProperty().get()).hasSize(11 * chain.steps().size() + 1)
          .allSatisfy(f -> assertThat(f.getWidth()).isEqualTo(320));

      // a walkthrough of the three discs and a star keeps the discs together (same shape, scale-normalised)
      vm.session().selection().setAll(vm.session().rows().stream().filter(r -> r.path().contains("round-")
          || r.path().endsWith("star-1.png")).toList());
      vm.walkthrough().useSelection();
      vm.walkthrough().order();
      assertThat(vm.walkthrough().messageProperty().get()).isEmpty();
      assertThat(vm.walkthrough().steps()).hasSize(3);
      int star = -1;
      for (int i = 0; i < 4; i++) {
        if (vm.walkthrough().strip().get(i).path().endsWith("star-1.png")) {
          star = i;
        }
      }
      assertThat(star).isIn(0, 3);
    }
  }
}
