package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferByte;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Arrays;
import java.util.Iterator;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;
import javax.imageio.stream.MemoryCacheImageOutputStream;

/**
 * Encoding and simple edits for the demo pictures, all deterministic: JPEG and PNG through the JDK's own ImageIO
 * writers (preferred by class name, so a plug-in on the classpath cannot change the bytes), no metadata with times,
 * and a plain-Java area/bilinear resampler instead of Java2D scaling.
 */
public final class ImageCodec {
  private static final String JDK_JPEG_WRITER = "com.sun.imageio.plugins.jpeg.JPEGImageWriter";
  private static final String JDK_PNG_WRITER = "com.sun.imageio.plugins.png.PNGImageWriter";

  private ImageCodec() {}

  /**
   * Baseline JPEG bytes of an opaque picture.
   *
   * @param quality JPEG quality in (0, 1]; 0.9 is the library's default
   */
  public static byte[] jpeg(BufferedImage image, float quality) throws IOException {
    if (!(quality > 0 && quality <= 1)) {
      throw new IllegalArgumentException("JPEG quality must be in (0, 1]: " + quality);
    }
    BufferedImage rgb = toBgrBytes(image);
    ImageWriter writer = writer("jpeg", JDK_JPEG_WRITER);
    try {
      ImageWriteParam param = writer.getDefaultWriteParam();
      param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
      param.setCompressionQuality(quality);
      return write(writer, rgb, param);
    } finally {
      writer.dispose();
    }
  }

  /** PNG bytes; keeps the alpha channel when the picture has one. */
  public static byte[] png(BufferedImage image) throws IOException {
    ImageWriter writer = writer("png", JDK_PNG_WRITER);
    try {
      return write(writer, image, writer.getDefaultWriteParam());
    } finally {
      writer.dispose();
    }
  }

  /** Decodes bytes with ImageIO; IOException when no reader understands them. */
  public static BufferedImage decode(byte[] bytes) throws IOException {
    BufferedImage img = ImageIO.read(new ByteArrayInputStream(bytes));
    if (img == null) {
      throw new IOException("no ImageIO reader recognises these " + bytes.length + " bytes");
    }
    return img;
  }

  /** The first {@code fraction} of the bytes, in (0, 1): a file cut short, as by an interrupted copy. */
  public static byte[] truncated(byte[] bytes, double fraction) {
    if (!(fraction > 0 && fraction < 1)) {
      throw new IllegalArgumentException("fraction must be in (0, 1): " + fraction);
    }
    return Arrays.copyOf(bytes, Math.max(1, (int) (bytes.length * fraction)));
  }

  /**
   * Resamples to {@code w x h}: exact area averaging when shrinking, bilinear when enlarging (per axis).
   * Output is TYPE_INT_RGB, or TYPE_INT_ARGB when the input has alpha.
   */
  public static BufferedImage resize(BufferedImage src, int w, int h) {
    if (w <= 0 || h <= 0) {
      throw new IllegalArgumentException("target size must be positive: " + w + "x" + h);
    }
    boolean alpha = src.getColorModel().hasAlpha();
    int sw = src.getWidth();
    int sh = src.getHeight();
    int[] in = pixels(src);
    double[][] wx = weights(sw, w);
    double[][] wy = weights(sh, h);
    // Horizontal pass into double planes, then vertical pass.
    double[] tmp = new double[4 * w * sh];
    for (int y = 0; y < sh; y++) {
      for (int x = 0; x < w; x++) {
        double[] row = wx[x];
        int start = (int) row[0];
        double a = 0;
        double r = 0;
        double g = 0;
        double b = 0;
        for (int k = 1; k < row.length; k++) {
          int p = in[y * sw + start + k - 1];
          double wt = row[k];
          a += wt * ((p >>> 24) & 0xFF);
          r += wt * ((p >> 16) & 0xFF);
          g += wt * ((p >> 8) & 0xFF);
          b += wt * (p & 0xFF);
        }
        int o = 4 * (y * w + x);
        tmp[o] = a;
        tmp[o + 1] = r;
        tmp[o + 2] = g;
        tmp[o + 3] = b;
      }
    }
    int[] out = new int[w * h];
    for (int y = 0; y < h; y++) {
      double[] col = wy[y];
      int start = (int) col[0];
      for (int x = 0; x < w; x++) {
        double a = 0;
        double r = 0;
        double g = 0;
        double b = 0;
        for (int k = 1; k < col.length; k++) {
          int o = 4 * ((start + k - 1) * w + x);
          double wt = col[k];
          a += wt * tmp[o];
          r += wt * tmp[o + 1];
          g += wt * tmp[o + 2];
          b += wt * tmp[o + 3];
        }
        int ai = alpha ? Colours.clamp8((int) Math.round(a)) : 255;
        out[y * w + x] = (ai << 24) | Colours.pack8((int) Math.round(r), (int) Math.round(g), (int) Math.round(b));
      }
    }
    return image(out, w, h, alpha ? BufferedImage.TYPE_INT_ARGB : BufferedImage.TYPE_INT_RGB);
  }

  /** The picture with every channel multiplied by {@code gain} (a light exposure edit), opaque RGB. */
  public static BufferedImage brightened(BufferedImage src, double gain) {
    int w = src.getWidth();
    int h = src.getHeight();
    int[] px = pixels(src);
    for (int i = 0; i < px.length; i++) {
      int p = px[i];
      px[i] = Colours.pack8((int) Math.round(((p >> 16) & 0xFF) * gain),
          (int) Math.round(((p >> 8) & 0xFF) * gain), (int) Math.round((p & 0xFF) * gain));
    }
    return image(px, w, h, BufferedImage.TYPE_INT_RGB);
  }

  /** A copy of the region (x, y, w, h), opaque RGB. */
  public static BufferedImage cropped(BufferedImage src, int x, int y, int w, int h) {
    return toRgb(src.getSubimage(x, y, w, h));
  }

  /**
   * For each output index: {start, w0, w1, ...} source weights summing to 1. Shrinking: overlap of the output
   * pixel's footprint with each source pixel (area averaging). Enlarging: bilinear between pixel centres.
   */
  private static double[][] weights(int srcLen, int dstLen) {
    double[][] table = new double[dstLen][];
    double ratio = (double) srcLen / dstLen;
    for (int i = 0; i < dstLen; i++) {
      if (ratio >= 1) {
        double lo = i * ratio;
        double hi = lo + ratio;
        int s = (int) Math.floor(lo);
        int e = Math.min(srcLen - 1, (int) Math.ceil(hi) - 1);
        double[] row = new double[e - s + 2];
        row[0] = s;
        for (int k = s; k <= e; k++) {
          row[k - s + 1] = (Math.min(hi, k + 1) - Math.max(lo, k)) / ratio;
        }
        table[i] = row;
      } else {
        double c = (i + 0.5) * ratio - 0.5;
        int s = (int) Math.floor(c);
        double f = c - s;
        int a = Math.max(0, Math.min(srcLen - 1, s));
        int b = Math.max(0, Math.min(srcLen - 1, s + 1));
        if (a == b) {
          table[i] = new double[] {a, 1};
        } else {
          table[i] = new double[] {a, 1 - f, f};
        }
      }
    }
    return table;
  }

  private static BufferedImage toRgb(BufferedImage image) {
    if (image.getType() == BufferedImage.TYPE_INT_RGB) {
      return image;
    }
    return image(pixels(image), image.getWidth(), image.getHeight(), BufferedImage.TYPE_INT_RGB);
  }

  /** TYPE_3BYTE_BGR copy: the JDK JPEG writer's fast path (about twice as fast as from TYPE_INT_RGB). */
  private static BufferedImage toBgrBytes(BufferedImage image) {
    int w = image.getWidth();
    int h = image.getHeight();
    int[] px = pixels(image);
    BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_3BYTE_BGR);
    // Memory order of TYPE_3BYTE_BGR is blue, green, red.
    byte[] bgr = ((DataBufferByte) out.getRaster().getDataBuffer()).getData();
    for (int i = 0; i < px.length; i++) {
      int p = px[i];
      bgr[3 * i] = (byte) p;
      bgr[3 * i + 1] = (byte) (p >> 8);
      bgr[3 * i + 2] = (byte) (p >> 16);
    }
    return out;
  }

  /**
   * Packed pixels, row-major: straight from the raster for the int-packed types (fast; the top byte is 0 for
   * TYPE_INT_RGB), through getRGB (sRGB conversion) otherwise.
   */
  static int[] pixels(BufferedImage img) {
    int w = img.getWidth();
    int h = img.getHeight();
    int type = img.getType();
    if (type == BufferedImage.TYPE_INT_RGB || type == BufferedImage.TYPE_INT_ARGB) {
      return (int[]) img.getRaster().getDataElements(0, 0, w, h, null);
    }
    return img.getRGB(0, 0, w, h, null, 0, w);
  }

  /** A new TYPE_INT_RGB or TYPE_INT_ARGB picture holding the packed pixels. */
  static BufferedImage image(int[] px, int w, int h, int type) {
    BufferedImage out = new BufferedImage(w, h, type);
    out.getRaster().setDataElements(0, 0, w, h, px);
    return out;
  }

  private static ImageWriter writer(String format, String preferredClass) throws IOException {
    Iterator<ImageWriter> it = ImageIO.getImageWritersByFormatName(format);
    ImageWriter first = null;
    while (it.hasNext()) {
      ImageWriter w = it.next();
      if (w.getClass().getName().equals(preferredClass)) {
        if (first != null) {
          first.dispose();
        }
        return w;
      }
      if (first == null) {
        first = w;
      } else {
        w.dispose();
      }
    }
    if (first == null) {
      throw new IOException("no ImageIO writer for " + format + " in this JDK");
    }
    return first;
  }

  private static byte[] write(ImageWriter writer, BufferedImage image, ImageWriteParam param) throws IOException {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream();
    try (ImageOutputStream out = new MemoryCacheImageOutputStream(bytes)) {
      writer.setOutput(out);
      writer.write(null, new IIOImage(image, null, null), param);
    }
    return bytes.toByteArray();
  }
}
