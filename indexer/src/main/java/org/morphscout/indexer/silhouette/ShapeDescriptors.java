package org.morphscout.indexer.silhouette;

/**
 * Computes a {@link ShapeDescriptor} from a mask: bounding box, aspect, area, centroid, principal-axis orientation
 * (from second central moments), Hu moments and the normalised soft silhouette vector (see {@link ShapeVectors} for
 * how it is sampled). Immutable and thread-safe.
 */
public final class ShapeDescriptors {
  private final ShapeVectorOptions options;

  public ShapeDescriptors(ShapeVectorOptions options) {
    this.options = java.util.Objects.requireNonNull(options, "options");
  }

  /** With {@link ShapeVectorOptions#DEFAULTS}. */
  public ShapeDescriptors() {
    this(ShapeVectorOptions.DEFAULTS);
  }

  public ShapeVectorOptions options() {
    return options;
  }

  /**
   * Describes the mask's object pixels (all of them, whatever their connectivity). An empty mask gives zeros
   * everywhere (aspect 0, a zero vector).
   */
  public ShapeDescriptor describe(Mask mask) {
    int w = mask.width();
    int h = mask.height();
    int minX = w;
    int minY = h;
    int maxX = -1;
    int maxY = -1;
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        if (mask.get(y * w + x)) {
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x);
          minY = Math.min(minY, y);
          maxY = Math.max(maxY, y);
        }
      }
    }
    CentralMoments m = CentralMoments.of(mask);
    float[] vector = ShapeVectors.of(mask, m, options);
    if (maxX < 0) {
      return new ShapeDescriptor(vector, new double[7], 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }
    int bw = maxX - minX + 1;
    int bh = maxY - minY + 1;
    return new ShapeDescriptor(
        vector,
        HuMoments.of(m),
        minX / (double) w,
        minY / (double) h,
        bw / (double) w,
        bh / (double) h,
        bw / (double) bh,
        m.m00() / ((double) w * h),
        // Centroid of pixel centres (pixel x spans [x, x + 1)), as a fraction of the image size.
        (m.cx() + 0.5) / w,
        (m.cy() + 0.5) / h,
        m.orientation());
  }

  /** Cosine similarity of two shape vectors (both L2-normalised, so their dot product); 0 if either is zero. */
  public static double cosine(float[] a, float[] b) {
    if (a.length != b.length) {
      throw new IllegalArgumentException("vectors differ in length: " + a.length + " vs " + b.length);
    }
    double dot = 0;
    double na = 0;
    double nb = 0;
    for (int i = 0; i < a.length; i++) {
      dot += a[i] * b[i];
      na += a[i] * a[i];
      nb += b[i] * b[i];
    }
    return na == 0 || nb == 0 ? 0 : dot / Math.sqrt(na * nb);
  }
}
