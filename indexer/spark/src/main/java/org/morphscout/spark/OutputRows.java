package org.morphscout.spark;

import java.util.ArrayList;
import java.util.List;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.catalog.Blobs;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.library.FailureKind;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;

/** Builds the job's output rows in {@link AnalysisColumn} order. */
final class OutputRows {
  private OutputRows() {}

  /** An encoded thumbnail and its extension ({@code jpg} or {@code png}). */
  record Thumbnail(byte[] bytes, String extension) {}

  static Row analysed(PartitionAnalysis.FileFacts f, String folder, JobSettings settings, ImageAnalysis a,
      int orientation, Thumbnail thumbnail) {
    Object[] v = common(f, folder, settings, a.modelId(), a.appearance().length);
    v[AnalysisColumn.WIDTH.ordinal()] = a.width();
    v[AnalysisColumn.HEIGHT.ordinal()] = a.height();
    v[AnalysisColumn.ORIENTATION.ordinal()] = orientation;
    v[AnalysisColumn.FORMAT.ordinal()] = a.format();
    v[AnalysisColumn.APPEARANCE.ordinal()] = floats(a.appearance());
    ShapeDescriptor s = a.shape();
    v[AnalysisColumn.SHAPE_VECTOR.ordinal()] = floats(s.shapeVector());
    Silhouette sil = a.silhouette();
    v[AnalysisColumn.SILHOUETTE_SOURCE.ordinal()] = sil.source();
    v[AnalysisColumn.MASK_WIDTH.ordinal()] = sil.mask().width();
    v[AnalysisColumn.MASK_HEIGHT.ordinal()] = sil.mask().height();
    v[AnalysisColumn.MASK.ordinal()] = Blobs.maskBits(sil.mask());
    v[AnalysisColumn.COMPONENTS.ordinal()] = sil.components();
    v[AnalysisColumn.TOUCHES_FRAME.ordinal()] = sil.touchesFrame();
    v[AnalysisColumn.COVERAGE.ordinal()] = sil.coverage();
    v[AnalysisColumn.CONFIDENCE.ordinal()] = sil.confidence();
    v[AnalysisColumn.HU.ordinal()] = doubles(s.hu());
    v[AnalysisColumn.BBOX_X.ordinal()] = s.bboxX();
    v[AnalysisColumn.BBOX_Y.ordinal()] = s.bboxY();
    v[AnalysisColumn.BBOX_W.ordinal()] = s.bboxW();
    v[AnalysisColumn.BBOX_H.ordinal()] = s.bboxH();
    v[AnalysisColumn.ASPECT.ordinal()] = s.aspect();
    v[AnalysisColumn.AREA_FRACTION.ordinal()] = s.areaFraction();
    v[AnalysisColumn.CENTROID_X.ordinal()] = s.centroidX();
    v[AnalysisColumn.CENTROID_Y.ordinal()] = s.centroidY();
    v[AnalysisColumn.SHAPE_ORIENTATION.ordinal()] = s.orientation();
    ColourStats c = a.colour();
    v[AnalysisColumn.FOREGROUND_MEAN.ordinal()] = doubles(c.foregroundMean());
    v[AnalysisColumn.FOREGROUND_STD.ordinal()] = doubles(c.foregroundStd());
    v[AnalysisColumn.BACKGROUND_MEAN.ordinal()] = doubles(c.backgroundMean());
    v[AnalysisColumn.BACKGROUND_STD.ordinal()] = doubles(c.backgroundStd());
    List<Double> lab = new ArrayList<>();
    List<Double> weight = new ArrayList<>();
    for (ColourStats.DominantColour d : c.dominant()) {
      for (double x : d.lab()) {
        lab.add(x);
      }
      weight.add(d.weight());
    }
    v[AnalysisColumn.DOMINANT_LAB.ordinal()] = seq(lab);
    v[AnalysisColumn.DOMINANT_WEIGHT.ordinal()] = seq(weight);
    v[AnalysisColumn.FINGERPRINT.ordinal()] = a.fingerprint() == null ? null : floats(a.fingerprint());
    if (thumbnail != null) {
      v[AnalysisColumn.THUMBNAIL.ordinal()] = thumbnail.bytes();
      v[AnalysisColumn.THUMBNAIL_EXTENSION.ordinal()] = thumbnail.extension();
    }
    return RowFactory.create(v);
  }

  static Row failed(PartitionAnalysis.FileFacts f, String folder, JobSettings settings, FailureKind.Failure failure) {
    Object[] v = common(f, folder, settings, null, null);
    v[AnalysisColumn.FAILURE_KIND.ordinal()] = failure.kind().name();
    v[AnalysisColumn.FAILURE_REASON.ordinal()] = failure.reason();
    v[AnalysisColumn.DECLARED_PIXELS.ordinal()] = failure.declaredPixels();
    return RowFactory.create(v);
  }

  private static Object[] common(PartitionAnalysis.FileFacts f, String folder, JobSettings settings, String modelId,
      Integer dimension) {
    Object[] v = new Object[AnalysisColumn.values().length];
    v[AnalysisColumn.PATH.ordinal()] = f.path();
    v[AnalysisColumn.FOLDER.ordinal()] = folder;
    v[AnalysisColumn.SIZE.ordinal()] = f.size();
    v[AnalysisColumn.MTIME_MS.ordinal()] = f.mtimeMs();
    v[AnalysisColumn.CONTENT_HASH.ordinal()] = f.contentHash();
    v[AnalysisColumn.LAYOUT.ordinal()] = AnalysisColumn.LAYOUT_VERSION;
    v[AnalysisColumn.MODEL_ID.ordinal()] = modelId;
    v[AnalysisColumn.DIMENSION.ordinal()] = dimension;
    v[AnalysisColumn.SILHOUETTES.ordinal()] = settings.silhouettes();
    return v;
  }

  /** Spark's rows hold array columns as Scala sequences. */
  private static <T> scala.collection.immutable.Seq<T> seq(List<T> list) {
    return scala.jdk.javaapi.CollectionConverters.asScala(list).toList();
  }

  private static scala.collection.immutable.Seq<Float> floats(float[] a) {
    List<Float> out = new ArrayList<>(a.length);
    for (float x : a) {
      out.add(x);
    }
    return seq(out);
  }

  private static scala.collection.immutable.Seq<Double> doubles(double[] a) {
    List<Double> out = new ArrayList<>(a.length);
    for (double x : a) {
      out.add(x);
    }
    return seq(out);
  }
}
