package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.app.Main;
import org.morphscout.app.gui.chains.ChainsViewModel;
import org.morphscout.app.gui.common.Pane;
import org.morphscout.app.gui.library.LibraryViewModel;
import org.morphscout.app.gui.library.SortKey;
import org.morphscout.app.gui.pairs.PairRow;
import org.morphscout.app.gui.pairs.PairsViewModel;
import org.morphscout.app.gui.service.ImageFinding;
import org.morphscout.app.gui.service.SimilarityMode;
import org.morphscout.app.gui.task.DirectTaskRunner;
import org.morphscout.indexer.values.Decision;
import org.morphscout.indexer.values.ImageRow;

/** The view-models against a real sample catalog, without the toolkit (synchronous task runner). */
class ViewModelsTest {
  @TempDir static Path shared;
  static Path catalog;

  @TempDir Path tmp;
  private FakeBackends fakes;
  private MainViewModel main;

  @BeforeAll
  static void createCatalog() throws Exception {
    catalog = SampleCatalog.create(shared, 7L);
  }

  @BeforeEach
  void open() {
    fakes = new FakeBackends();
    main = new MainViewModel(new DirectTaskRunner(), fakes.factory());
    main.open(catalog, false);
    assertThat(main.messageProperty().get()).isEmpty();
  }

  private ImageRow row(String name) {
    return main.library().visible().stream().filter(r -> r.path().endsWith("/" + name)).findFirst().orElseThrow();
  }

  @Test
  void openingLoadsEveryImageAndCountsThem() {
    LibraryViewModel lib = main.library();
    assertThat(lib.visible()).hasSize(27);
    assertThat(lib.summaryProperty().get()).isEqualTo("27 of 27 images");
    assertThat(lib.roots()).hasSize(1);
  }

  @Test
  void missingCatalogIsExplainedNotThrown() {
    main.open(tmp.resolve("nothing-here"), false);
    assertThat(main.messageProperty().get()).startsWith("No catalog in").contains("New catalog");
    assertThat(main.library().visible()).hasSize(27); // the open catalog stays
  }

  @Test
  void flagAndFolderFiltersNarrowTheGrid() {
    LibraryViewModel lib = main.library();
    lib.findingProperty(ImageFinding.FAILED).set(true);
    assertThat(lib.visible()).extracting(ImageRow::path).singleElement().asString().endsWith("broken.jpg");
    lib.findingProperty(ImageFinding.FAILED).set(false);
    lib.findingProperty(ImageFinding.CUT_OFF).set(true);
    assertThat(lib.visible()).extracting(ImageRow::path).anyMatch(p -> p.endsWith("round-cut.png"))
        .noneMatch(p -> p.endsWith("round-01.png"));
    lib.findingProperty(ImageFinding.CUT_OFF).set(false);
    lib.findingProperty(ImageFinding.SEVERAL_OBJECTS).set(true);
    assertThat(lib.visible()).extracting(ImageRow::path).singleElement().asString().endsWith("pair-of-tiles.png");
    lib.findingProperty(ImageFinding.SEVERAL_OBJECTS).set(false);
    lib.folderProperty().set("GARDEN");
    assertThat(lib.visible()).isNotEmpty().allMatch(r -> r.path().contains("/garden/"));
  }

  @Test
  void sortBySizePutsTheLargestFileFirst() {
    LibraryViewModel lib = main.library();
    lib.sortProperty().set(SortKey.SIZE);
    List<ImageRow> v = lib.visible();
    for (int i = 0; i + 1 < v.size(); i++) {
      assertThat(v.get(i).size()).isGreaterThanOrEqualTo(v.get(i + 1).size());
    }
    lib.sortProperty().set(SortKey.NAME);
    assertThat(v.get(0).path()).endsWith("broken.jpg");
  }

  @Test
  void similarByShapeFindsTheSameShapeFirst() {
    LibraryViewModel lib = main.library();
    ImageRow round = row("round-01.png");
    main.session().selectedProperty().set(round);
    main.inspector().findSimilar(SimilarityMode.SHAPE);
    assertThat(main.session().paneProperty().get()).isEqualTo(Pane.LIBRARY);
    assertThat(lib.searchTitleProperty().get()).isEqualTo("Similar in shape to round-01.png");
    // the other discs differ only in size and place, which the shape vector normalises away
    assertThat(lib.visible().subList(0, 3)).extracting(ImageRow::path)
        .allMatch(p -> p.contains("/round-"), "a round picture");
    assertThat(lib.distance(lib.visible().get(0).id())).isLessThan(lib.distance(row("star-01.png").id()));
    lib.clearSimilar();
    assertThat(lib.visible()).hasSize(27);
  }

  @Test
  void inspectorShowsFactsFindingsAndSwatches() {
    main.session().selectedProperty().set(row("pair-of-tiles.png"));
    assertThat(main.inspector().facts()).extracting(f -> f.label() + ": " + f.value())
        .contains("Size: 320 × 240 px", "Findings: several objects");
    // times for people: the local date to the minute, not a raw count
    assertThat(main.inspector().facts()).filteredOn(f -> f.label().equals("Modified")).singleElement()
        .satisfies(f -> assertThat(f.value()).matches("\\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2}"));
    assertThat(main.inspector().uncertainProperty().get()).isEmpty(); // a sound silhouette carries no marker
    assertThat(main.inspector().facts()).filteredOn(f -> f.label().equals("Silhouette")).singleElement()
        .satisfies(f -> assertThat(f.value()).endsWith("(classical)")); // the glossary's word for the border model
    assertThat(main.inspector().maskProperty().get()).isNotNull();
    assertThat(main.inspector().swatches()).hasSize(2).allMatch(s -> s.matches("#[0-9a-f]{6}"));
    main.session().selectedProperty().set(row("broken.jpg"));
    assertThat(main.inspector().facts()).extracting(f -> f.label() + ": " + f.value())
        .contains("Failed: not a readable JPEG: the file ends after 5 bytes");
  }

  @Test
  void anUncertainSilhouetteIsMarkedWithTheLibrarysThreshold() {
    org.morphscout.indexer.silhouette.Mask blob = new org.morphscout.indexer.silhouette.Mask(4, 4, new byte[] {0, 0,
        0, 0, 0, 1, 1, 0, 0, 1, 1, 0, 0, 0, 0, 0});
    var doubtful = new org.morphscout.indexer.silhouette.Silhouette(blob, 1, false, 0.25, 0.30, "border-model");
    var sound = new org.morphscout.indexer.silhouette.Silhouette(blob, 1, false, 0.25, 0.80, "border-model");
    assertThat(doubtful.uncertain()).isTrue();
    assertThat(org.morphscout.app.gui.inspector.InspectorViewModelAccess.uncertainNote(doubtful))
        .startsWith("Uncertain silhouette: confidence 0.30 (below 0.45)");
    assertThat(org.morphscout.app.gui.inspector.InspectorViewModelAccess.uncertainNote(sound)).isEmpty();
    assertThat(org.morphscout.app.gui.service.CatalogFindings.of(doubtful))
        .contains(org.morphscout.app.gui.service.ImageFinding.UNCERTAIN);
    assertThat(org.morphscout.app.gui.service.CatalogFindings.of(sound))
        .doesNotContain(org.morphscout.app.gui.service.ImageFinding.UNCERTAIN);
  }

  @Test
  void startEndAndAvoidReachTheChainSearch() {
    ChainsViewModel chains = main.chains();
    chains.run();
    assertThat(chains.messageProperty().get()).contains("Choose a start and an end");
    main.session().selectedProperty().set(row("round-01.png"));
    main.inspector().useAsStart();
    main.session().selectedProperty().set(row("oval-04.png"));
    main.inspector().useAsEnd();
    chains.minStepsProperty().set(5);
    chains.maxStepsProperty().set(3);
    chains.run();
    assertThat(chains.messageProperty().get()).isEqualTo("The fewest steps (5) cannot be more than the most steps (3).");
    chains.minStepsProperty().set(1);
    chains.run();
    assertThat(chains.chains()).hasSize(1);
    ImageRow star = row("star-02.png");
    chains.avoid(star);
    assertThat(fakes.chainRequests).hasSize(2);
    assertThat(fakes.chainRequests.get(1).avoid()).containsExactly(star.id());
    chains.require(star);
    assertThat(fakes.chainRequests.get(2).avoid()).isEmpty();
    assertThat(fakes.chainRequests.get(2).require()).containsExactly(star.id());
    chains.preview(chains.chains().get(0));
    assertThat(chains.messageProperty().get()).isEmpty();
    assertThat(chains.previewProperty().get()).hasSize(12);
  }

  @Test
  void approvedPairIsStoredWhereTheCommandLineReadsIt() throws Exception {
    PairsViewModel pairs = main.pairs();
    main.session().selectedProperty().set(row("square-02.png"));
    main.inspector().findPartners();
    assertThat(main.session().paneProperty().get()).isEqualTo(Pane.PAIRS);
    assertThat(pairs.scopeProperty().get()).isEqualTo("Partners of square-02.png");
    assertThat(pairs.rows()).isNotEmpty();
    List<Double> scores = pairs.rows().stream().map(r -> r.suggestion().score()).toList();
    assertThat(scores).isSortedAccordingTo((a, b) -> Double.compare(b, a));
    PairRow first = pairs.rows().get(0);
    pairs.selectedProperty().set(first);
    assertThat(pairs.overlayProperty().get()).isNotNull();
    pairs.approve(first);
    pairs.note(first, "lovely match");
    assertThat(first.decisionProperty().get()).isEqualTo("approved");
    PairRow second = pairs.rows().get(1);
    pairs.reject(second);

    StringWriter out = new StringWriter();
    int code = Main.execute(new String[] {"--catalog", catalog.toString(), "decisions", "--only", "approved"},
        new PrintWriter(out), new PrintWriter(new StringWriter()));
    assertThat(code).isZero();
    assertThat(out.toString()).contains("approved").contains(Path.of(main.session().row(first.suggestion().a())
        .orElseThrow().path()).getFileName().toString());

    // the browser's export is exactly what decisions --only approved --csv (--json) prints, same library writer
    Path csv = tmp.resolve("out/approved.csv");
    pairs.exportApproved(csv);
    assertThat(Files.readString(csv)).isEqualTo(cliOut("decisions", "--only", "approved", "--csv"));
    List<CSVRecord> records = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
        .parse(Files.newBufferedReader(csv)).getRecords();
    assertThat(records).hasSize(1);
    assertThat(records.get(0).get("note")).isEqualTo("lovely match");
    assertThat(records.get(0).get("decision")).isEqualTo("approved");
    assertThat(Set.of(records.get(0).get("first"), records.get(0).get("second"))).isEqualTo(Set.of(
        main.session().row(first.suggestion().a()).orElseThrow().path(),
        main.session().row(first.suggestion().b()).orElseThrow().path()));
    Path json = tmp.resolve("approved.json");
    pairs.exportApproved(json);
    var mapper = new com.fasterxml.jackson.databind.ObjectMapper();
    assertThat(mapper.readTree(json.toFile())).isEqualTo(mapper.readTree(cliOut("decisions", "--only", "approved",
        "--json")));
    assertThat(mapper.readTree(json.toFile()).get("decisions")).hasSize(1);
    // leave the shared catalog as found
    try (var lib = org.morphscout.indexer.library.Library.openExisting(catalog)) {
      for (Decision d : lib.decisions().all()) {
        lib.decisions().clear(d.imageA(), d.imageB());
      }
    }
  }

  @Test
  void walkthroughOrdersAndFollowsMoves() throws java.io.IOException {
    var walk = main.walkthrough();
    main.session().selection().setAll(main.library().visible().subList(1, 7));
    walk.useSelection();
    assertThat(walk.strip()).hasSize(6);
    assertThat(walk.steps()).hasSize(5);
    walk.order();
    assertThat(walk.strip()).containsExactlyInAnyOrderElementsOf(main.library().visible().subList(1, 7));
    double before = walk.steps().stream().mapToDouble(Double::doubleValue).sum();
    ImageRow first = walk.strip().get(0);
    walk.move(0, 5);
    assertThat(walk.strip().get(5)).isEqualTo(first);
    assertThat(walk.steps()).hasSize(5);
    assertThat(walk.steps().stream().mapToDouble(Double::doubleValue).sum()).isGreaterThanOrEqualTo(before - 1e-9);

    // the export is walk --csv's format, by the same library writer: step cost FROM the previous image, first empty
    Path csv = tmp.resolve("walk.csv");
    walk.export(csv);
    List<CSVRecord> records = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
        .parse(Files.newBufferedReader(csv)).getRecords();
    assertThat(records.get(0).getParser().getHeaderNames()).containsExactly("position", "path", "step_cost");
    assertThat(records).hasSize(6);
    assertThat(records.get(0).get("step_cost")).isEmpty();
    for (int i = 1; i < 6; i++) {
      assertThat(records.get(i).get("path")).isEqualTo(walk.strip().get(i).path());
      assertThat(Double.parseDouble(records.get(i).get("step_cost"))).isCloseTo(walk.steps().get(i - 1),
          org.assertj.core.data.Offset.offset(5e-5));
    }
    java.io.StringWriter same = new java.io.StringWriter();
    org.morphscout.indexer.library.WalkTable.csv(same, walk.strip().stream().map(ImageRow::path).toList(),
        walk.steps());
    assertThat(Files.readString(csv)).isEqualTo(same.toString());
    // never over one of the walk's own images
    walk.export(Path.of(walk.strip().get(0).path()));
    assertThat(walk.messageProperty().get()).contains("input");
  }

  @Test
  void indexingShowsProgressAndFailures() throws Exception {
    var idx = main.indexing();
    assertThat(idx.failures()).extracting(f -> f.reason()).containsExactly(
        "not a readable JPEG: the file ends after 5 bytes");
    Path folder = Files.createDirectories(tmp.resolve("more"));
    idx.add(folder);
    assertThat(fakes.indexed).containsExactly(folder.toString());
    assertThat(idx.summaryProperty().get()).isEqualTo("4 found, 3 ready, 1 failed");
    assertThat(idx.progressProperty().get()).isEqualTo(1.0);
    idx.add(tmp.resolve("not-there"));
    assertThat(idx.messageProperty().get()).endsWith("is not a folder.");
  }

  private String cliOut(String... args) {
    StringWriter out = new StringWriter();
    String[] all = new String[args.length + 2];
    all[0] = "--catalog";
    all[1] = catalog.toString();
    System.arraycopy(args, 0, all, 2, args.length);
    assertThat(Main.execute(all, new PrintWriter(out), new PrintWriter(new StringWriter()))).isZero();
    return out.toString();
  }
}
