package org.morphscout.indexer.silhouette;

import java.util.Arrays;

/**
 * A binary mask on a pixel grid, row-major, one byte a pixel (0 = background, 1 = object). Immutable: the array
 * handed to the constructor is copied, and {@link #data()} returns a copy.
 */
public final class Mask {
  private final int width;
  private final int height;
  private final byte[] data;
  /** Counted once: the pair scorer asks for it several times per pair. */
  private final int area;

  public Mask(int width, int height, byte[] data) {
    if (width <= 0 || height <= 0) {
      throw new IllegalArgumentException("mask size must be positive: " + width + "x" + height);
    }
    if (data.length != width * height) {
      throw new IllegalArgumentException("mask data has " + data.length + " bytes, expected " + width * height);
    }
    this.width = width;
    this.height = height;
    this.data = new byte[data.length];
    int n = 0;
    for (int i = 0; i < data.length; i++) {
      this.data[i] = data[i] != 0 ? (byte) 1 : 0;
      n += this.data[i];
    }
    this.area = n;
  }

  /** An empty (all background) mask. */
  public static Mask empty(int width, int height) {
    return new Mask(width, height, new byte[width * height]);
  }

  public int width() {
    return width;
  }

  public int height() {
    return height;
  }

  public boolean get(int x, int y) {
    return data[y * width + x] != 0;
  }

  /** Whether the pixel at row-major index {@code i} is object. */
  public boolean get(int i) {
    return data[i] != 0;
  }

  /** A copy of the row-major 0/1 bytes. */
  public byte[] data() {
    return data.clone();
  }

  /** Number of object pixels. */
  public int area() {
    return area;
  }

  /**
   * This mask brought down to at most {@code longSide} pixels on its long side by majority vote over each output
   * pixel's source block (this mask itself when already small enough). Warp estimation works on 64-pixel grids, so
   * 128 pixels keep its inputs intact while scanning far fewer pixels.
   */
  public Mask shrunk(int longSide) {
    int w = width;
    int h = height;
    double f = Math.max(w, h) / (double) longSide;
    if (f <= 1) {
      return this;
    }
    int sw = Math.max(1, (int) Math.round(w / f));
    int sh = Math.max(1, (int) Math.round(h / f));
    byte[] out = new byte[sw * sh];
    for (int y = 0; y < sh; y++) {
      int y0 = y * h / sh;
      int y1 = Math.max(y0 + 1, (y + 1) * h / sh);
      for (int x = 0; x < sw; x++) {
        int x0 = x * w / sw;
        int x1 = Math.max(x0 + 1, (x + 1) * w / sw);
        int on = 0;
        for (int yy = y0; yy < y1; yy++) {
          for (int xx = x0; xx < x1; xx++) {
            if (get(xx, yy)) {
              on++;
            }
          }
        }
        out[y * sw + x] = (byte) (2 * on >= (x1 - x0) * (y1 - y0) ? 1 : 0);
      }
    }
    return new Mask(sw, sh, out);
  }
  /** Object pixels over all pixels, in [0, 1]. */
  public double coverage() {
    return area() / (double) data.length;
  }

  /** Intersection over union with a mask of the same size; 1 when both are empty. */
  public double iou(Mask other) {
    if (other.width != width || other.height != height) {
      throw new IllegalArgumentException("masks differ in size");
    }
    int inter = 0;
    int union = 0;
    for (int i = 0; i < data.length; i++) {
      inter += data[i] & other.data[i];
      union += data[i] | other.data[i];
    }
    return union == 0 ? 1.0 : inter / (double) union;
  }

  /**
   * Left-right mirror symmetry: the IoU of the mask with its mirror image about the vertical line through its
   * centroid (pixel centres, the mirrored column rounded to the nearest), in [0, 1]; 0 for an empty mask.
   */
  public double mirrorSymmetry() {
    long sumX = 0;
    int n = 0;
    for (int y = 0, i = 0; y < height; y++) {
      for (int x = 0; x < width; x++, i++) {
        if (data[i] != 0) {
          sumX += x;
          n++;
        }
      }
    }
    if (n == 0) {
      return 0;
    }
    double twiceCx = 2.0 * sumX / n;
    int inter = 0;
    int union = 0;
    for (int y = 0; y < height; y++) {
      int row = y * width;
      for (int x = 0; x < width; x++) {
        int mx = (int) Math.round(twiceCx - x);
        int v = data[row + x];
        int w = mx >= 0 && mx < width ? data[row + mx] : 0;
        inter += v & w;
        union += v | w;
      }
    }
    return union == 0 ? 0 : inter / (double) union;
  }

  @Override
  public boolean equals(Object o) {
    return o instanceof Mask m && m.width == width && m.height == height && Arrays.equals(m.data, data);
  }

  @Override
  public int hashCode() {
    return 31 * (31 * width + height) + Arrays.hashCode(data);
  }

  @Override
  public String toString() {
    return "Mask[" + width + "x" + height + ", area=" + area() + "]";
  }
}
