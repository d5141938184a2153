package org.morphscout.spark;

import java.util.Arrays;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;

/**
 * The columns of the job's Parquet output, one row per file. The job writes them, {@link ParquetAnalyses} reads them;
 * both go through this list. Columns of the analysis are null on a failed file's row, and the failure columns are null
 * on an analysed file's row.
 */
enum AnalysisColumn {
  /** The file: a local absolute path, or the URI of a file system the importing machine may not reach. */
  PATH("path", DataTypes.StringType),
  /** The folder the job read (or the common folder of the files it was given). */
  FOLDER("folder", DataTypes.StringType),
  SIZE("size", DataTypes.LongType),
  MTIME_MS("mtimeMs", DataTypes.LongType),
  CONTENT_HASH("contentHash", DataTypes.StringType),
  /** Version of this column layout; a reader refuses layouts it does not know. */
  LAYOUT("morphscoutLayout", DataTypes.IntegerType),
  MODEL_ID("modelId", DataTypes.StringType),
  DIMENSION("dimension", DataTypes.IntegerType),
  SILHOUETTES("silhouettes", DataTypes.StringType),
  FAILURE_KIND("failureKind", DataTypes.StringType),
  FAILURE_REASON("failureReason", DataTypes.StringType),
  DECLARED_PIXELS("declaredPixels", DataTypes.LongType),
  WIDTH("width", DataTypes.IntegerType),
  HEIGHT("height", DataTypes.IntegerType),
  ORIENTATION("orientation", DataTypes.IntegerType),
  FORMAT("format", DataTypes.StringType),
  APPEARANCE("appearance", floats()),
  SHAPE_VECTOR("shapeVector", floats()),
  SILHOUETTE_SOURCE("silhouetteSource", DataTypes.StringType),
  MASK_WIDTH("maskWidth", DataTypes.IntegerType),
  MASK_HEIGHT("maskHeight", DataTypes.IntegerType),
  /** Row-major bits, packed 8 a byte, most significant first (as the catalog stores masks). */
  MASK("mask", DataTypes.BinaryType),
  COMPONENTS("components", DataTypes.IntegerType),
  TOUCHES_FRAME("touchesFrame", DataTypes.BooleanType),
  COVERAGE("coverage", DataTypes.DoubleType),
  CONFIDENCE("confidence", DataTypes.DoubleType),
  HU("hu", doubles()),
  BBOX_X("bboxX", DataTypes.DoubleType),
  BBOX_Y("bboxY", DataTypes.DoubleType),
  BBOX_W("bboxW", DataTypes.DoubleType),
  BBOX_H("bboxH", DataTypes.DoubleType),
  ASPECT("aspect", DataTypes.DoubleType),
  AREA_FRACTION("areaFraction", DataTypes.DoubleType),
  CENTROID_X("centroidX", DataTypes.DoubleType),
  CENTROID_Y("centroidY", DataTypes.DoubleType),
  SHAPE_ORIENTATION("shapeOrientation", DataTypes.DoubleType),
  FOREGROUND_MEAN("foregroundMean", doubles()),
  FOREGROUND_STD("foregroundStd", doubles()),
  BACKGROUND_MEAN("backgroundMean", doubles()),
  BACKGROUND_STD("backgroundStd", doubles()),
  /** CIELAB of each dominant colour, three values a colour. */
  DOMINANT_LAB("dominantLab", doubles()),
  DOMINANT_WEIGHT("dominantWeight", doubles()),
  FINGERPRINT("fingerprint", floats()),
  THUMBNAIL("thumbnail", DataTypes.BinaryType),
  THUMBNAIL_EXTENSION("thumbnailExtension", DataTypes.StringType);

  /** The layout this code writes and reads. */
  static final int LAYOUT_VERSION = 1;

  final String key;
  final DataType type;

  AnalysisColumn(String key, DataType type) {
    this.key = key;
    this.type = type;
  }

  /** The Spark schema of the output. */
  static StructType schema() {
    return new StructType(Arrays.stream(values())
        .map(c -> new StructField(c.key, c.type, true, org.apache.spark.sql.types.Metadata.empty()))
        .toArray(StructField[]::new));
  }

  private static DataType floats() {
    return DataTypes.createArrayType(DataTypes.FloatType, false);
  }

  private static DataType doubles() {
    return DataTypes.createArrayType(DataTypes.DoubleType, false);
  }
}
