package org.morphscout.demo;

import java.awt.image.BufferedImage;

/**
 * The exact ground-truth mask of a rendered vessel: pixel (x, y) is object when its centre (x + 0.5, y + 0.5) lies
 * inside the vessel's outline. Row-major, one byte per pixel, 0 or 1: the same layout as the indexer's
 * {@code silhouette.Mask}, so {@code new Mask(m.width(), m.height(), m.data())} converts it. Immutable.
 */
public final class GroundTruthMask {
  private final int width;
  private final int height;
  private final byte[] data;

  public GroundTruthMask(int width, int height, byte[] data) {
    if (width <= 0 || height <= 0) {
      throw new IllegalArgumentException("mask size must be positive: " + width + "x" + height);
    }
    if (data.length != width * height) {
      throw new IllegalArgumentException("mask data has " + data.length + " bytes, expected " + width * height);
    }
    this.width = width;
    this.height = height;
    this.data = new byte[data.length];
    for (int i = 0; i < data.length; i++) {
      this.data[i] = data[i] != 0 ? (byte) 1 : 0;
    }
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

  /** Row-major 0/1 bytes (a copy). */
  public byte[] data() {
    return data.clone();
  }

  /** Number of object pixels. */
  public int area() {
    int n = 0;
    for (byte b : data) {
      n += b;
    }
    return n;
  }

  /** Object pixels as a fraction of all pixels, in [0, 1]. */
  public double coverage() {
    return (double) area() / data.length;
  }

  /** Width in pixels of the object's bounding box (0 when empty). */
  public int boxWidth() {
    int[] b = box();
    return b[2] < b[0] ? 0 : b[2] - b[0] + 1;
  }

  /** Height in pixels of the object's bounding box (0 when empty). */
  public int boxHeight() {
    int[] b = box();
    return b[3] < b[1] ? 0 : b[3] - b[1] + 1;
  }

  /** Whether any object pixel lies on the picture's border. */
  public boolean touchesFrame() {
    for (int x = 0; x < width; x++) {
      if (data[x] != 0 || data[(height - 1) * width + x] != 0) {
        return true;
      }
    }
    for (int y = 0; y < height; y++) {
      if (data[y * width] != 0 || data[y * width + width - 1] != 0) {
        return true;
      }
    }
    return false;
  }

  /** Intersection over union with a mask of the same size; 1 when both are empty. */
  public double iou(GroundTruthMask other) {
    if (other.width != width || other.height != height) {
      throw new IllegalArgumentException("masks differ in size: " + width + "x" + height + " vs "
          + other.width + "x" + other.height);
    }
    int inter = 0;
    int union = 0;
    for (int i = 0; i < data.length; i++) {
      inter += data[i] & other.data[i];
      union += data[i] | other.data[i];
    }
    return union == 0 ? 1.0 : (double) inter / union;
  }

  /** The union of this mask and another of the same size. */
  public GroundTruthMask union(GroundTruthMask other) {
    if (other.width != width || other.height != height) {
      throw new IllegalArgumentException("masks differ in size");
    }
    byte[] u = new byte[data.length];
    for (int i = 0; i < u.length; i++) {
      u[i] = (byte) (data[i] | other.data[i]);
    }
    return new GroundTruthMask(width, height, u);
  }

  /** A black-and-white picture of the mask (object white), for looking at. */
  public BufferedImage toImage() {
    BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_BYTE_GRAY);
    byte[] px = new byte[data.length];
    for (int i = 0; i < px.length; i++) {
      px[i] = data[i] != 0 ? (byte) 255 : 0;
    }
    img.getRaster().setDataElements(0, 0, width, height, px);
    return img;
  }

  /** {minX, minY, maxX, maxY}; max &lt; min when empty. */
  private int[] box() {
    int minX = width;
    int minY = height;
    int maxX = -1;
    int maxY = -1;
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        if (data[y * width + x] != 0) {
          minX = Math.min(minX, x);
          maxX = Math.max(maxX, x);
          minY = Math.min(minY, y);
          maxY = Math.max(maxY, y);
        }
      }
    }
    return new int[] {minX, minY, maxX, maxY};
  }
}
