package org.morphscout.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.apache.spark.SparkConf;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Encoders;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.storage.StorageLevel;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.library.AnalysisSetup;
import org.morphscout.indexer.library.AnalysisSetup.SilhouetteMode;
import org.morphscout.indexer.library.AnalyzerFactory;
import org.morphscout.indexer.library.OutsideAnalysis;
import org.morphscout.indexer.silhouette.ModelFolder;
import org.morphscout.indexer.silhouette.SalientModelStore;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The cluster job's entry point ({@code spark-submit --class org.morphscout.spark.AnalyseJob}): reads image files with
 * Spark's binary-file source, analyses each partition with the indexer's own analyser, and writes one Parquet row per
 * file, sorted by path, for {@code morphscout import}.
 */
@Command(name = "analyse-job", mixinStandardHelpOptions = true, sortOptions = false,
    description = {
        "Analyses image files on Apache Spark exactly as 'morphscout index' does, and writes the analyses as Parquet",
        "for 'morphscout import'. INPUT is a folder (read recursively) or a file, on any file system Hadoop reads",
        "(local paths, hdfs://, object stores with their connector)."})
public final class AnalyseJob implements Callable<Integer> {

  @Parameters(arity = "0..*", paramLabel = "INPUT", description = "Folders or files to analyse.")
  List<String> inputs = new ArrayList<>();

  @Option(names = "--list", paramLabel = "FILE",
      description = "A text file naming one image path or URI a line (read through Hadoop too), instead of or "
          + "beside INPUT.")
  String list;

  @Option(names = "--out", required = true, paramLabel = "DIR",
      description = "Folder the Parquet files are written to; must not exist yet.")
  String out;

  @Option(names = "--silhouettes", paramLabel = "MODE",
      description = "auto (default), classical or learned: as 'morphscout index --silhouettes'.")
  SilhouetteMode silhouettes = SilhouetteMode.AUTO;

  @Option(names = "--models", paramLabel = "DIR",
      description = "Folder holding the learned silhouette model on the machine that submits the job (default: the "
          + "per-user model folder, or MORPHSCOUT_MODELS); the job ships the verified file to every worker.")
  Path models;

  @Option(names = "--partitions", paramLabel = "N",
      description = "Spread the files over N partitions (default: as Spark reads them).")
  int partitions;

  /** What a run wrote. */
  public record Outcome(long analysed, long failed, String silhouettes) {}

  public static void main(String[] args) {
    System.exit(new CommandLine(new AnalyseJob()).setCaseInsensitiveEnumValuesAllowed(true).execute(args));
  }

  @Override
  public Integer call() throws IOException {
    SparkConf conf = new SparkConf().setAppName("morphscout analyse");
    if (!conf.contains("spark.master")) {
      conf.setMaster("local[*]"); // started without spark-submit: use this machine's cores
    }
    SparkSession spark = SparkSession.builder().config(conf).getOrCreate();
    try {
      long start = System.nanoTime();
      Outcome o = run(spark, inputs, Optional.ofNullable(list), out, silhouettes,
          ModelFolder.resolve(Optional.ofNullable(models)), partitions);
      double seconds = (System.nanoTime() - start) / 1e9;
      System.out.printf(java.util.Locale.ROOT, "analysed %d files, %d failed (%s silhouettes) in %.1f s on %s "
          + "(%.1f files/s); wrote %s%n", o.analysed(), o.failed(), o.silhouettes(), seconds, spark.sparkContext()
          .master(), (o.analysed() + o.failed()) / seconds, out);
      return 0;
    } catch (MorphscoutException e) {
      System.err.println("analyse-job: " + e.getMessage());
      return 1;
    } finally {
      spark.stop();
    }
  }

  /**
   * Runs the job on {@code spark}.
   *
   * @param partitions spread the files over this many partitions; 0 keeps Spark's choice
   */
  public static Outcome run(SparkSession spark, List<String> inputs, Optional<String> list, String out,
      SilhouetteMode mode, ModelFolder models, int partitions) throws IOException {
    List<String> paths = new ArrayList<>(inputs);
    if (list.isPresent()) {
      paths.addAll(spark.read().textFile(list.get()).filter((org.apache.spark.api.java.function.FilterFunction<String>)
          s -> !s.isBlank()).collectAsList());
    }
    if (paths.isEmpty()) {
      throw new MorphscoutException("nothing to analyse: give a folder, files, or --list FILE");
    }
    JobSettings settings = settings(spark, mode, models);
    String folder = commonFolder(paths);
    Dataset<Row> files = spark.read().format("binaryFile").option("recursiveFileLookup", "true")
        .load(paths.toArray(String[]::new));
    if (partitions > 0) {
      files = files.repartition(partitions);
    }
    Dataset<Row> analysed = files.mapPartitions(new PartitionAnalysis(settings, folder),
        Encoders.row(AnalysisColumn.schema()));
    // Sorting by path samples the analysed rows first: kept (memory, else local disk), the files are analysed once.
    analysed = analysed.persist(StorageLevel.MEMORY_AND_DISK());
    try {
      analysed.orderBy(AnalysisColumn.PATH.key).write().parquet(out);
    } finally {
      analysed.unpersist();
    }
    Row counts = spark.read().parquet(out).agg(org.apache.spark.sql.functions.count(
        org.apache.spark.sql.functions.lit(1)), org.apache.spark.sql.functions.count(AnalysisColumn.FAILURE_KIND.key))
        .first(); // one pass: count(column) counts its non-null values
    long failed = counts.getLong(1);
    return new Outcome(counts.getLong(0) - failed, failed, settings.silhouettes());
  }

  /** Finds and verifies the learned model on the submitting machine and ships it to the workers. */
  private static JobSettings settings(SparkSession spark, SilhouetteMode mode, ModelFolder models) throws IOException {
    Optional<Path> learned = mode == SilhouetteMode.CLASSICAL ? Optional.empty()
        : new SalientModelStore().findIn(models);
    if (mode == SilhouetteMode.LEARNED && learned.isEmpty()) {
      throw new MorphscoutException("the learned silhouette model is not installed in " + models.dir()
          + ": run 'morphscout models add-salient' first, or give --models DIR");
    }
    String effective = AnalyzerFactory.effectiveSilhouettes(AnalysisSetup.defaults().withSilhouettes(mode), learned);
    if (learned.isPresent()) {
      spark.sparkContext().addFile(learned.get().toString());
    }
    return new JobSettings(mode, effective, learned.map(p -> p.getFileName().toString()).orElse(null));
  }

  /**
   * The folder the catalog records as the images' folder: the one folder given, else the deepest folder all inputs share.
   */
  static String commonFolder(List<String> paths) {
    List<String> names = paths.stream().map(OutsideAnalysis::catalogName).toList();
    if (names.size() == 1 && !names.get(0).contains("://") && Files.isDirectory(Path.of(names.get(0)))) {
      return names.get(0);
    }
    String common = parent(names.get(0));
    for (String n : names) {
      while (!n.startsWith(common.endsWith("/") ? common : common + "/") && common.contains("/")) {
        common = parent(common);
      }
    }
    return common;
  }

  private static String parent(String path) {
    int slash = path.lastIndexOf('/');
    return slash <= 0 ? "/" : path.substring(0, slash);
  }
}
