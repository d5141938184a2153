package org.morphscout.spark;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.demo.DemoLibrary;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.chain.ChainQuery;
import org.morphscout.indexer.library.AnalysisImporter;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.ChainService;
import org.morphscout.indexer.library.ImportReport;
import org.morphscout.indexer.library.IndexOptions;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.LibraryIndexer;
import org.morphscout.indexer.library.PairService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.library.SimilarityService;
import org.morphscout.indexer.pairing.PairQuery;
import org.morphscout.indexer.pairing.PairSearchResult;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.progress.CancellationToken;
import org.morphscout.indexer.progress.ProgressListener;
import org.morphscout.indexer.silhouette.ModelFolder;

/**
 * The cluster job in Spark's local mode on the demo library, imported into a catalog, against a catalog made by
 * {@code index} on the same files: the same stored analyses, and the same answers to similar, pairs and chain (the
 * library services the command line calls).
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class SparkImportTest {
  private static final AnalysisSetup SETUP = AnalysisSetup.defaults(); // classical silhouettes: fast, no model file

  @TempDir
  static Path tmp;

  private SparkSession spark;
  private Path demo;
  private Path parquet;
  private Path indexed;
  private Path imported;
  private ImportReport firstImport;

  @BeforeAll
  void analyseBothWays() throws IOException {
    demo = tmp.resolve("demo");
    DemoLibrary.generate(demo);
    indexed = tmp.resolve("indexed");
    try (Library library = Library.open(indexed)) {
      new LibraryIndexer(library, SETUP, IndexOptions.defaults())
          .index(List.of(demo), ProgressListener.NONE, CancellationToken.none());
    }
    spark = SparkSession.builder().master("local[2]").appName("morphscout-test")
        .config("spark.ui.enabled", "false").config("spark.sql.shuffle.partitions", "2").getOrCreate();
    parquet = tmp.resolve("parquet");
    AnalyseJob.run(spark, List.of(demo.toString()), Optional.empty(), parquet.toString(),
        AnalysisSetup.SilhouetteMode.CLASSICAL, new ModelFolder(tmp.resolve("no-models")), 3);
    imported = tmp.resolve("imported");
    try (Library library = Library.open(imported)) {
      firstImport = importInto(library);
    }
  }

  @AfterAll
  void stopSpark() {
    if (spark != null) {
      spark.stop();
    }
  }

  private ImportReport importInto(Library library) throws IOException {
    return new AnalysisImporter(library, IndexOptions.defaults())
        .importFrom(new ParquetAnalyses(), parquet, ProgressListener.NONE, CancellationToken.none());
  }

  @Test
  void storesTheSameImagesAndAnalysesAsIndex() throws IOException {
    try (Library a = Library.openForReading(indexed); Library b = Library.openForReading(imported)) {
      Map<String, ImageRow> rowsA = byPath(a);
      Map<String, ImageRow> rowsB = byPath(b);
      assertThat(rowsB.keySet()).containsExactlyElementsOf(rowsA.keySet());
      assertThat(rowsA).hasSizeGreaterThan(100);
      int compared = 0;
      for (String path : rowsA.keySet()) {
        ImageRow ra = rowsA.get(path);
        ImageRow rb = rowsB.get(path);
        assertThat(rb.id()).as(path).isEqualTo(ra.id()); // same order of arrival: same ids
        assertThat(rb.status()).as(path).isEqualTo(ra.status());
        assertThat(rb.contentHash()).as(path).isEqualTo(ra.contentHash());
        assertThat(rb.size()).as(path).isEqualTo(ra.size());
        if (ra.status() != ImageStatus.READY) {
          assertThat(b.images().failureReason(rb.id())).as(path).isEqualTo(a.images().failureReason(ra.id()));
          continue;
        }
        assertThat(List.of(rb.width(), rb.height(), rb.orientation(), rb.format())).as(path)
            .isEqualTo(List.of(ra.width(), ra.height(), ra.orientation(), ra.format()));
        ImageAnalysis fa = a.features().load(ra).orElseThrow();
        ImageAnalysis fb = b.features().load(rb).orElseThrow();
        assertThat(fb.appearance()).as(path).containsExactly(fa.appearance());
        assertThat(fb.shape().shapeVector()).as(path).containsExactly(fa.shape().shapeVector());
        assertThat(fb.shape().hu()).as(path).containsExactly(fa.shape().hu());
        assertThat(fb.silhouette().mask().equals(fa.silhouette().mask())
            || Arrays.equals(org.morphscout.indexer.catalog.Blobs.maskBits(fb.silhouette().mask()),
                org.morphscout.indexer.catalog.Blobs.maskBits(fa.silhouette().mask()))).as(path).isTrue();
        assertThat(fb.silhouette().confidence()).as(path).isEqualTo(fa.silhouette().confidence());
        assertThat(fb.colour().foregroundMean()).as(path).containsExactly(fa.colour().foregroundMean());
        assertThat(fb.fingerprint()).as(path).containsExactly(fa.fingerprint());
        assertThat(b.catalog().thumbnail(rb.id())).as(path).isPresent();
        compared++;
      }
      assertThat(compared).isGreaterThan(100);
      assertThat(b.images().failures()).hasSameSizeAs(a.images().failures());
    }
  }

  @Test
  void answersSimilarPairsAndChainAsIndex() throws IOException {
    try (Library a = Library.openForReading(indexed); Library b = Library.openForReading(imported)) {
      List<String> paths = new ArrayList<>(byPath(a).entrySet().stream()
          .filter(e -> e.getValue().status() == ImageStatus.READY).map(Map.Entry::getKey).toList());
      List<String> queries = List.of(paths.get(0), paths.get(paths.size() / 3), paths.get(2 * paths.size() / 3));
      for (String q : queries) {
        for (SimilarityService.By by : SimilarityService.By.values()) {
          assertThat(similar(b, q, by)).as(q + " " + by).isEqualTo(similar(a, q, by));
        }
      }
      List<String> pairsA = pairs(a);
      assertThat(pairsA).hasSizeGreaterThan(10);
      assertThat(pairs(b)).isEqualTo(pairsA);
      assertThat(chain(b, paths.get(1), paths.get(paths.size() - 2)))
          .isEqualTo(chain(a, paths.get(1), paths.get(paths.size() - 2)));
    }
  }

  @Test
  void importingTwiceChangesNothingAndKeepsDecisions() throws IOException {
    assertThat(firstImport.added()).isGreaterThan(100);
    Path again = tmp.resolve("again");
    copyTree(imported, again);
    try (Library library = Library.open(again)) {
      List<String> before = pairs(library);
      ImageRow first = library.images().withStatus(ImageStatus.READY).get(0);
      ImageRow second = library.images().withStatus(ImageStatus.READY).get(1);
      library.decisions().decide(first.id(), second.id(),
          org.morphscout.indexer.values.DecisionKind.APPROVED, "kept across imports");
      ImportReport report = importInto(library);
      assertThat(report.added()).isZero();
      assertThat(report.replaced()).isZero();
      assertThat(report.moved()).isZero();
      assertThat(report.unchanged()).isEqualTo(firstImport.added()); // every row, failed files included
      assertThat(pairs(library)).isEqualTo(before);
      assertThat(library.decisions().all()).hasSize(1);
    }
  }

  @Test
  void refusesDamagedAndForeignParquetAndKeepsTheCatalog() throws IOException {
    Path damaged = tmp.resolve("damaged");
    copyTree(parquet, damaged);
    Path part;
    try (Stream<Path> s = Files.list(damaged)) {
      part = s.filter(p -> p.getFileName().toString().endsWith(".parquet")).sorted().findFirst().orElseThrow();
    }
    byte[] bytes = Files.readAllBytes(part);
    Files.write(part, Arrays.copyOf(bytes, bytes.length / 2)); // a truncated copy: footer gone
    Path foreign = tmp.resolve("foreign");
    spark.range(5).toDF("n").write().parquet(foreign.toString());

    Path later = tmp.resolve("later-layout"); // our columns, written by a later version of the job
    spark.read().parquet(parquet.toString())
        .withColumn(AnalysisColumn.LAYOUT.key, org.apache.spark.sql.functions.lit(AnalysisColumn.LAYOUT_VERSION + 1))
        .write().parquet(later.toString());

    Path catalog = tmp.resolve("kept");
    copyTree(imported, catalog);
    try (Library library = Library.open(catalog)) {
      int ready = library.images().withStatus(ImageStatus.READY).size();
      List<String> before = pairs(library);
      AnalysisImporter importer = new AnalysisImporter(library, IndexOptions.defaults());
      assertThatThrownBy(() -> importer.importFrom(new ParquetAnalyses(), damaged, ProgressListener.NONE,
          CancellationToken.none()))
          .isInstanceOf(MorphscoutException.class)
          .hasMessageContaining(part.getFileName().toString()).hasMessageContaining("not a readable Parquet file");
      assertThatThrownBy(() -> importer.importFrom(new ParquetAnalyses(), foreign, ProgressListener.NONE,
          CancellationToken.none()))
          .isInstanceOf(MorphscoutException.class).hasMessageContaining("not Morphscout analysis output");
      assertThatThrownBy(() -> importer.importFrom(new ParquetAnalyses(), later, ProgressListener.NONE,
          CancellationToken.none()))
          .isInstanceOf(MorphscoutException.class).hasMessageContaining("written by another version of the job");
      assertThat(library.images().withStatus(ImageStatus.READY)).hasSize(ready);
      assertThat(pairs(library)).isEqualTo(before);
    }
  }

  @Test
  void picturesMovedBeforeTheJobKeepTheirIdentityAndDecisions() throws IOException {
    Path before = Files.createDirectories(tmp.resolve("shelf-before"));
    List<Path> pictures;
    try (Stream<Path> s = Files.walk(demo)) {
      pictures = s.filter(p -> p.getFileName().toString().endsWith(".jpg")).sorted().limit(4).toList();
    }
    for (int i = 0; i < pictures.size(); i++) {
      Files.copy(pictures.get(i), before.resolve("view-" + i + ".jpg"));
    }
    Path catalog = tmp.resolve("moves");
    try (Library library = Library.open(catalog)) {
      new LibraryIndexer(library, SETUP, IndexOptions.defaults())
          .index(List.of(before), ProgressListener.NONE, CancellationToken.none());
      long a = library.require(before.resolve("view-0.jpg").toString()).id();
      long b = library.require(before.resolve("view-1.jpg").toString()).id();
      library.decisions().decide(a, b, org.morphscout.indexer.values.DecisionKind.REJECTED, "moved later");

      Path after = tmp.resolve("shelf-after");
      Files.move(before, after);
      Path list = tmp.resolve("moved-files.txt"); // the job's --list input: one path a line
      try (Stream<Path> s = Files.list(after)) {
        Files.write(list, s.sorted().map(Path::toString).toList());
      }
      Path out = tmp.resolve("moved-parquet");
      AnalyseJob.Outcome outcome = AnalyseJob.run(spark, List.of(), Optional.of(list.toString()), out.toString(),
          AnalysisSetup.SilhouetteMode.CLASSICAL, new ModelFolder(tmp.resolve("no-models")), 0);
      assertThat(outcome.analysed()).isEqualTo(4);

      ImportReport report = new AnalysisImporter(library, IndexOptions.defaults())
          .importFrom(new ParquetAnalyses(), out, ProgressListener.NONE, CancellationToken.none());
      assertThat(report.moved()).isEqualTo(4);
      assertThat(report.added()).isZero();
      assertThat(library.require(after.resolve("view-0.jpg").toString()).id()).isEqualTo(a);
      assertThat(library.decisions().find(a, b)).hasValueSatisfying(d -> {
        assertThat(d.kind()).isEqualTo(org.morphscout.indexer.values.DecisionKind.REJECTED);
        assertThat(d.note()).isEqualTo("moved later");
      });
    }
  }

  private static Map<String, ImageRow> byPath(Library library) {
    Map<String, ImageRow> rows = new TreeMap<>();
    library.images().all().forEach(r -> rows.put(r.path(), r));
    return rows;
  }

  private static List<String> similar(Library library, String path, SimilarityService.By by) throws IOException {
    QueryContext context = new QueryContext(library, SETUP);
    try {
      ImageAnalysis query = context.resolve(path);
      return new SimilarityService(context).similar(query, 10, by).stream()
          .map(h -> h.path() + " " + h.distance()).toList();
    } finally {
      context.close();
    }
  }

  private static List<String> pairs(Library library) throws IOException {
    QueryContext context = new QueryContext(library, SETUP);
    try {
      PairSearchResult result = new PairService(context, ScoreConfig.DEFAULTS)
          .bestPairs(PairQuery.DEFAULTS, ProgressListener.NONE, CancellationToken.none());
      assertThat(result.notes()).as("pairs come from the store, not scored live").isEmpty();
      List<String> out = new ArrayList<>();
      result.pairs().forEach(p -> out.add(pathOf(library, p.a()) + " | " + pathOf(library, p.b()) + " "
          + p.score().score() + " " + p.score().verdict()));
      return out;
    } finally {
      context.close();
    }
  }

  private static List<String> chain(Library library, String from, String to) throws IOException {
    QueryContext context = new QueryContext(library, SETUP);
    try {
      ImageAnalysis a = context.resolve(from);
      ImageAnalysis b = context.resolve(to);
      ChainService.ChainAnswer answer = new ChainService(context, new PairService(context, ScoreConfig.DEFAULTS))
          .chains(a, b, ChainQuery.between(a.id(), b.id()));
      List<String> out = new ArrayList<>();
      for (ChainService.ChainDetail d : answer.chains()) {
        out.add(d.chain().images().stream().map(id -> pathOf(library, id)).toList() + " " + d.chain().total());
      }
      out.add("reason: " + answer.reason());
      return out;
    } finally {
      context.close();
    }
  }

  private static String pathOf(Library library, long id) {
    return library.images().byId(id).map(ImageRow::path).orElse("?");
  }

  private static void copyTree(Path from, Path to) throws IOException {
    try (Stream<Path> s = Files.walk(from)) {
      for (Path p : s.toList()) {
        Path target = to.resolve(from.relativize(p).toString());
        if (Files.isDirectory(p)) {
          Files.createDirectories(target);
        } else if (!p.getFileName().toString().endsWith(".lock")) {
          Files.copy(p, target);
        }
      }
    }
  }
}
