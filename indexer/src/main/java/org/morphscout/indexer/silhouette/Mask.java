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
    for (int i = 0; i < data.length; i++) {
      this.data[i] = data[i] != 0 ? (byte) 1 : 0;
    }
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
    int n = 0;
    for (byte b : data) {
      n += b;
    }
    return n;
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
