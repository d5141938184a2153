package org.morphscout.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Spliterator;
import java.util.Spliterators;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;
import org.apache.hadoop.conf.Configuration;
import org.apache.parquet.example.data.Group;
import org.apache.parquet.hadoop.ParquetFileReader;
import org.apache.parquet.hadoop.ParquetReader;
import org.apache.parquet.hadoop.api.ReadSupport;
import org.apache.parquet.hadoop.example.GroupReadSupport;
import org.apache.parquet.hadoop.util.HadoopInputFile;
import org.apache.parquet.schema.MessageType;
import org.apache.parquet.schema.Type;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.Blobs;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.library.FailureKind;
import org.morphscout.indexer.library.OutsideAnalyses;
import org.morphscout.indexer.library.OutsideAnalysis;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;

/**
 * Reads the job's Parquet output for {@code morphscout import}: every {@code *.parquet} file of the folder (Spark's
 * {@code _SUCCESS} and hidden files are ignored), in file-name order, which is path order for the job's sorted output.
 */
public final class ParquetAnalyses implements OutsideAnalyses {
  private static final List<AnalysisColumn> SUMMARY_COLUMNS = List.of(AnalysisColumn.LAYOUT, AnalysisColumn.FOLDER,
      AnalysisColumn.MODEL_ID, AnalysisColumn.DIMENSION, AnalysisColumn.SILHOUETTES);

  @Override
  public String format() {
    return "Parquet";
  }

  @Override
  public Summary check(Path folder) throws IOException {
    long images = 0;
    String jobFolder = null;
    String modelId = "";
    int dimension = 0;
    String silhouettes = null;
    for (Path file : files(folder)) {
      MessageType schema = schema(file);
      List<Type> projected = new ArrayList<>();
      for (AnalysisColumn c : SUMMARY_COLUMNS) {
        projected.add(schema.getType(c.key));
      }
      Configuration conf = new Configuration();
      conf.set(ReadSupport.PARQUET_READ_SCHEMA, new MessageType(schema.getName(), projected).toString());
      try (ParquetReader<Group> reader = reader(file, conf)) {
        for (Group g = reader.read(); g != null; g = reader.read()) {
          images++;
          int layout = g.getInteger(AnalysisColumn.LAYOUT.key, 0);
          if (layout != AnalysisColumn.LAYOUT_VERSION) {
            throw refused(file, "written by another version of the job (column layout " + layout + ", this "
                + "Morphscout reads layout " + AnalysisColumn.LAYOUT_VERSION + ")");
          }
          jobFolder = same(file, "folder", jobFolder, g.getString(AnalysisColumn.FOLDER.key, 0));
          silhouettes = same(file, "silhouettes", silhouettes, g.getString(AnalysisColumn.SILHOUETTES.key, 0));
          if (g.getFieldRepetitionCount(AnalysisColumn.MODEL_ID.key) > 0) {
            modelId = same(file, "appearance model", modelId.isEmpty() ? null : modelId,
                g.getString(AnalysisColumn.MODEL_ID.key, 0));
            dimension = g.getInteger(AnalysisColumn.DIMENSION.key, 0);
          }
        }
      } catch (MorphscoutException e) {
        throw e;
      } catch (RuntimeException e) {
        throw damaged(file, e);
      }
    }
    if (images == 0) {
      throw new MorphscoutException("nothing to import in " + folder + ": its Parquet files hold no rows");
    }
    return new Summary(images, jobFolder, modelId, dimension, silhouettes);
  }

  @Override
  public Stream<OutsideAnalysis> read(Path folder) throws IOException {
    List<Path> files = files(folder);
    RowIterator rows = new RowIterator(files);
    return StreamSupport.stream(Spliterators.spliteratorUnknownSize(rows, Spliterator.ORDERED), false)
        .onClose(rows::close);
  }

  /** Reads the files one after the other, one open reader at a time. */
  private static final class RowIterator implements Iterator<OutsideAnalysis> {
    private final List<Path> files;
    private int nextFile;
    private Path current;
    private ParquetReader<Group> reader;
    private Group next;

    RowIterator(List<Path> files) {
      this.files = files;
    }

    @Override
    public boolean hasNext() {
      try {
        while (next == null) {
          if (reader == null) {
            if (nextFile == files.size()) {
              return false;
            }
            current = files.get(nextFile++);
            reader = reader(current, new Configuration());
          }
          next = reader.read();
          if (next == null) {
            close();
          }
        }
        return true;
      } catch (IOException | RuntimeException e) {
        close();
        throw damaged(current, e);
      }
    }

    @Override
    public OutsideAnalysis next() {
      if (!hasNext()) {
        throw new NoSuchElementException();
      }
      Group g = next;
      next = null;
      try {
        return toAnalysis(g);
      } catch (RuntimeException e) {
        throw damaged(current, e);
      }
    }

    void close() {
      if (reader != null) {
        try {
          reader.close();
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        } finally {
          reader = null;
        }
      }
    }
  }

  static OutsideAnalysis toAnalysis(Group g) {
    String path = g.getString(AnalysisColumn.PATH.key, 0);
    long size = g.getLong(AnalysisColumn.SIZE.key, 0);
    long mtime = g.getLong(AnalysisColumn.MTIME_MS.key, 0);
    String hash = g.getString(AnalysisColumn.CONTENT_HASH.key, 0);
    if (has(g, AnalysisColumn.FAILURE_KIND)) {
      FailureKind kind = FailureKind.valueOf(string(g, AnalysisColumn.FAILURE_KIND));
      long declared = has(g, AnalysisColumn.DECLARED_PIXELS) ? g.getLong(AnalysisColumn.DECLARED_PIXELS.key, 0) : 0;
      return new OutsideAnalysis(path, size, mtime, hash, 0, null, null, "",
          new FailureKind.Failure(kind, string(g, AnalysisColumn.FAILURE_REASON), declared));
    }
    Silhouette silhouette = new Silhouette(
        Blobs.mask(integer(g, AnalysisColumn.MASK_WIDTH), integer(g, AnalysisColumn.MASK_HEIGHT),
            g.getBinary(AnalysisColumn.MASK.key, 0).getBytes()),
        integer(g, AnalysisColumn.COMPONENTS), g.getBoolean(AnalysisColumn.TOUCHES_FRAME.key, 0),
        real(g, AnalysisColumn.COVERAGE), real(g, AnalysisColumn.CONFIDENCE), string(g, AnalysisColumn.SILHOUETTE_SOURCE));
    ShapeDescriptor shape = new ShapeDescriptor(floats(g, AnalysisColumn.SHAPE_VECTOR), doubles(g, AnalysisColumn.HU),
        real(g, AnalysisColumn.BBOX_X), real(g, AnalysisColumn.BBOX_Y), real(g, AnalysisColumn.BBOX_W),
        real(g, AnalysisColumn.BBOX_H), real(g, AnalysisColumn.ASPECT), real(g, AnalysisColumn.AREA_FRACTION),
        real(g, AnalysisColumn.CENTROID_X), real(g, AnalysisColumn.CENTROID_Y),
        real(g, AnalysisColumn.SHAPE_ORIENTATION));
    double[] lab = doubles(g, AnalysisColumn.DOMINANT_LAB);
    double[] weight = doubles(g, AnalysisColumn.DOMINANT_WEIGHT);
    if (lab.length != 3 * weight.length) {
      throw new IllegalStateException("dominant colours: " + lab.length + " CIELAB values for " + weight.length
          + " weights");
    }
    List<ColourStats.DominantColour> dominant = new ArrayList<>();
    for (int i = 0; i < weight.length; i++) {
      dominant.add(new ColourStats.DominantColour(new double[] {lab[3 * i], lab[3 * i + 1], lab[3 * i + 2]},
          weight[i]));
    }
    ColourStats colour = new ColourStats(doubles(g, AnalysisColumn.FOREGROUND_MEAN),
        doubles(g, AnalysisColumn.FOREGROUND_STD), doubles(g, AnalysisColumn.BACKGROUND_MEAN),
        doubles(g, AnalysisColumn.BACKGROUND_STD), dominant);
    ImageAnalysis analysis = new ImageAnalysis(-1, path, integer(g, AnalysisColumn.WIDTH),
        integer(g, AnalysisColumn.HEIGHT), string(g, AnalysisColumn.FORMAT), floats(g, AnalysisColumn.APPEARANCE),
        string(g, AnalysisColumn.MODEL_ID), silhouette, shape, colour, hash,
        has(g, AnalysisColumn.FINGERPRINT) ? floats(g, AnalysisColumn.FINGERPRINT) : null);
    byte[] thumbnail = has(g, AnalysisColumn.THUMBNAIL) ? g.getBinary(AnalysisColumn.THUMBNAIL.key, 0).getBytes() : null;
    return new OutsideAnalysis(path, size, mtime, hash, integer(g, AnalysisColumn.ORIENTATION), analysis, thumbnail,
        thumbnail == null ? "" : string(g, AnalysisColumn.THUMBNAIL_EXTENSION), null);
  }

  private static boolean has(Group g, AnalysisColumn c) {
    return g.getFieldRepetitionCount(c.key) > 0;
  }

  private static String string(Group g, AnalysisColumn c) {
    return g.getString(c.key, 0);
  }

  private static int integer(Group g, AnalysisColumn c) {
    return g.getInteger(c.key, 0);
  }

  private static double real(Group g, AnalysisColumn c) {
    return g.getDouble(c.key, 0);
  }

  /** A list column: {@code group (LIST) { repeated group list { element } }}, as Spark writes arrays. */
  private static float[] floats(Group g, AnalysisColumn c) {
    Group list = g.getGroup(c.key, 0);
    int n = list.getFieldRepetitionCount(0);
    float[] out = new float[n];
    for (int i = 0; i < n; i++) {
      out[i] = list.getGroup(0, i).getFloat(0, 0);
    }
    return out;
  }

  private static double[] doubles(Group g, AnalysisColumn c) {
    Group list = g.getGroup(c.key, 0);
    int n = list.getFieldRepetitionCount(0);
    double[] out = new double[n];
    for (int i = 0; i < n; i++) {
      out[i] = list.getGroup(0, i).getDouble(0, 0);
    }
    return out;
  }

  private static List<Path> files(Path folder) throws IOException {
    if (!Files.isDirectory(folder)) {
      throw new MorphscoutException(Files.exists(folder) ? "not a folder: " + folder
          + " (import takes the folder the job wrote)" : "folder not found: " + folder);
    }
    List<Path> files;
    try (Stream<Path> s = Files.list(folder)) {
      files = s.filter(p -> {
        String n = p.getFileName().toString();
        return n.endsWith(".parquet") && !n.startsWith("_") && !n.startsWith(".") && Files.isRegularFile(p);
      }).sorted().toList();
    }
    if (files.isEmpty()) {
      throw new MorphscoutException("nothing to import in " + folder + ": it holds no .parquet files (is it the "
          + "folder the job wrote with --out?)");
    }
    return files;
  }

  /** The file's schema, after checking that it is our output. */
  private static MessageType schema(Path file) {
    MessageType schema;
    try (ParquetFileReader r = ParquetFileReader.open(HadoopInputFile.fromPath(hadoopPath(file),
        new Configuration()))) {
      schema = r.getFooter().getFileMetaData().getSchema();
    } catch (IOException | RuntimeException e) {
      throw damaged(file, e);
    }
    List<String> missing = new ArrayList<>();
    for (AnalysisColumn c : AnalysisColumn.values()) {
      if (!schema.containsField(c.key)) {
        missing.add(c.key);
      }
    }
    if (!missing.isEmpty()) {
      throw refused(file, "not Morphscout analysis output (missing columns: " + String.join(", ", missing) + ")");
    }
    return schema;
  }

  private static ParquetReader<Group> reader(Path file, Configuration conf) throws IOException {
    return ParquetReader.builder(new GroupReadSupport(), hadoopPath(file)).withConf(conf).build();
  }

  private static org.apache.hadoop.fs.Path hadoopPath(Path file) {
    return new org.apache.hadoop.fs.Path(file.toAbsolutePath().toUri());
  }

  private static String same(Path file, String what, String seen, String value) {
    if (seen != null && !seen.equals(value)) {
      throw refused(file, "mixes two " + what + "s (" + seen + " and " + value + "): import each job's output "
          + "on its own");
    }
    return value;
  }

  private static MorphscoutException refused(Path file, String why) {
    return new MorphscoutException("cannot import " + file + ": " + why);
  }

  private static MorphscoutException damaged(Path file, Throwable cause) {
    String detail = cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
    return new MorphscoutException("cannot import " + file + ": not a readable Parquet file (" + firstLine(detail)
        + ")", cause);
  }

  private static String firstLine(String s) {
    int nl = s.indexOf('\n');
    return nl < 0 ? s : s.substring(0, nl);
  }
}
