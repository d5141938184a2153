package org.morphscout.indexer.pairing;

import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.util.List;
import java.util.Random;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.feature.ColourStats;
import org.morphscout.indexer.silhouette.Mask;
import org.morphscout.indexer.silhouette.ShapeDescriptor;
import org.morphscout.indexer.silhouette.Silhouette;
import org.morphscout.indexer.warp.TestMasks;

/**
 * Builds {@link ImageAnalysis} fixtures for tests: a mask drawn with Graphics2D, shape facts computed plainly from
 * it, colour statistics and appearance vectors set by hand. Invented data, test-only.
 */
public final class Analyses {
  /** Appearance dimension of the fixtures. */
  public static final int DIM = 16;

  private Analyses() {}

  public static Builder builder(long id) {
    return new Builder(id);
  }

  /** A deterministic unit vector from a seed (the "look" of a picture). */
  public static float[] look(long seed) {
    Random r = new Random(seed);
    float[] v = new float[DIM];
    for (int i = 0; i < DIM; i++) {
      v[i] = (float) r.nextGaussian();
    }
    return normalise(v);
  }

  /** {@code base} plus Gaussian noise of the given size, renormalised. */
  public static float[] perturbed(float[] base, double amount, long seed) {
    Random r = new Random(seed);
    float[] v = base.clone();
    for (int i = 0; i < v.length; i++) {
      v[i] += (float) (amount * r.nextGaussian());
    }
    return normalise(v);
  }

  static float[] normalise(float[] v) {
    double n = 0;
    for (float x : v) {
      n += x * x;
    }
    float inv = (float) (1 / Math.sqrt(n));
    for (int i = 0; i < v.length; i++) {
      v[i] *= inv;
    }
    return v;
  }

  /** Mutable builder; every setting has a clean default (a centred ellipse, 640x480, mid-grey object on white). */
  public static final class Builder {
    private final long id;
    private int width = 640;
    private int height = 480;
    private Shape object = new Ellipse2D.Double(-25, -30, 50, 60);
    private double shiftX;
    private double shiftY;
    private int components = 1;
    private boolean touchesFrame;
    private double confidence = 0.9;
    private double[] fgMean = {50, 10, 20};
    private double[] fgStd = {15, 5, 5};
    private double[] bgMean = {92, 0, 2};
    private double[] bgStd = {3, 1, 1};
    private float[] appearance = look(7);
    private String hash = "";
    private float[] fingerprint;
    private boolean empty;

    private Builder(long id) {
      this.id = id;
    }

    public Builder size(int w, int h) {
      width = w;
      height = h;
      return this;
    }

    /** The object outline in units where the mask's short side is 100 and (0, 0) is the mask centre. */
    public Builder object(Shape s) {
      object = s;
      return this;
    }

    /** Moves the object by a fraction of the short side. */
    public Builder shift(double fx, double fy) {
      shiftX = fx * 100;
      shiftY = fy * 100;
      return this;
    }

    public Builder components(int n) {
      components = n;
      return this;
    }

    public Builder confidence(double c) {
      confidence = c;
      return this;
    }

    public Builder cutOff() {
      touchesFrame = true;
      return this;
    }

    public Builder noObject() {
      empty = true;
      return this;
    }

    public Builder foreground(double l, double a, double b) {
      fgMean = new double[] {l, a, b};
      return this;
    }

    public Builder foregroundStd(double l, double a, double b) {
      fgStd = new double[] {l, a, b};
      return this;
    }

    public Builder background(double l, double a, double b) {
      bgMean = new double[] {l, a, b};
      return this;
    }

    public Builder appearance(float[] v) {
      appearance = v;
      return this;
    }

    /** The pixel fingerprint (default null: unknown). */
    public Builder fingerprint(float[] f) {
      this.fingerprint = f == null ? null : f.clone();
      return this;
    }

    public Builder hash(String h) {
      hash = h;
      return this;
    }

    public ImageAnalysis build() {
      int longSide = Math.min(160, Math.max(width, height));
      double k = longSide / (double) Math.max(width, height);
      int mw = Math.max(1, (int) Math.round(width * k));
      int mh = Math.max(1, (int) Math.round(height * k));
      double unit = Math.min(mw, mh) / 100.0;
      AffineTransform t = new AffineTransform();
      t.translate(mw / 2.0 + shiftX * unit, mh / 2.0 + shiftY * unit);
      t.scale(unit, unit);
      Mask mask = empty ? Mask.empty(mw, mh) : TestMasks.draw(mw, mh, t.createTransformedShape(object));
      Silhouette sil = new Silhouette(mask, empty ? 0 : components, touchesFrame, mask.coverage(),
          empty ? 0 : confidence, "test");
      ColourStats colour = new ColourStats(fgMean.clone(), fgStd.clone(), bgMean.clone(), bgStd.clone(), List.of());
      return new ImageAnalysis(id, "/photos/img" + id + ".jpg", width, height, "jpeg", appearance.clone(), "test-model",
          sil, describe(mask), colour, hash, fingerprint);
    }
  }

  /** Plain shape facts: bbox, area, centroid and a 16x16 occupancy vector around the centroid. */
  static ShapeDescriptor describe(Mask m) {
    int w = m.width();
    int h = m.height();
    int area = m.area();
    if (area == 0) {
      return new ShapeDescriptor(new float[256], new double[7], 0, 0, 0, 0, 1, 0, 0.5, 0.5, 0);
    }
    int minX = w;
    int minY = h;
    int maxX = 0;
    int maxY = 0;
    double sx = 0;
    double sy = 0;
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        if (m.get(x, y)) {
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x);
          minY = Math.min(minY, y);
          maxY = Math.max(maxY, y);
          sx += x + 0.5;
          sy += y + 0.5;
        }
      }
    }
    double cx = sx / area;
    double cy = sy / area;
    double side = 3 * Math.sqrt(area);
    float[] v = new float[256];
    for (int j = 0; j < 16; j++) {
      for (int i = 0; i < 16; i++) {
        int x = (int) Math.floor(cx + ((i + 0.5) / 16 - 0.5) * side);
        int y = (int) Math.floor(cy + ((j + 0.5) / 16 - 0.5) * side);
        v[j * 16 + i] = x >= 0 && y >= 0 && x < w && y < h && m.get(x, y) ? 1f : 0f;
      }
    }
    int bw = maxX - minX + 1;
    int bh = maxY - minY + 1;
    return new ShapeDescriptor(normalise(v), new double[7], minX / (double) w, minY / (double) h, bw / (double) w,
        bh / (double) h, bw / (double) bh, area / (double) (w * h), cx / w, cy / h, 0);
  }
}
