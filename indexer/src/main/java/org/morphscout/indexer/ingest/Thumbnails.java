package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Iterator;
import java.util.Objects;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes small previews of analysis images: PNG when any pixel is not fully opaque (JPEG has no alpha), JPEG
 * otherwise (smaller for photographs). Files are written to a temporary name in the target folder and then moved
 * into place, so a reader never sees a half-written thumbnail, even after a crash. Thread-safe.
 */
public final class Thumbnails {

  /** JPEG quality 0..1; 0.85 is a common practice trade-off for previews (artefacts invisible at 256 px). */
  public static final float JPEG_QUALITY = 0.85f;

  private final int longSide;

  /** Thumbnails with the long side of {@link DecodeOptions#thumbnailLongSide()}. */
  public Thumbnails(DecodeOptions options) {
    this.longSide = options.thumbnailLongSide();
  }

  /** The file extension {@link #write} uses for this picture: {@code "png"} or {@code "jpg"}. */
  public static String extensionFor(BufferedImage analysis) {
    return hasTransparency(analysis) ? "png" : "jpg";
  }

  /**
   * Makes the thumbnail of {@code analysis} and writes it as {@code directory/baseName.jpg} or {@code .png},
   * replacing any existing file of that name atomically.
   *
   * @return the written file
   */
  public Path write(BufferedImage analysis, Path directory, String baseName) throws IOException {
    Objects.requireNonNull(analysis, "analysis");
    if (baseName.isEmpty() || baseName.contains("/") || baseName.contains("\\")) {
      throw new IllegalArgumentException("baseName must be a plain file name, got '" + baseName + "'");
    }
    Path target = directory.resolve(baseName + "." + extensionFor(analysis));
    writeTo(analysis, target);
    return target;
  }

  /**
   * Makes the thumbnail of {@code analysis} and writes it to {@code target}, in the format its extension names
   * ({@code .png}, or {@code .jpg}/{@code .jpeg}); transparent pixels written as JPEG are flattened onto white.
   * Replaces an existing file atomically where the file system allows (temporary file, then move).
   */
  public void writeTo(BufferedImage analysis, Path target) throws IOException {
    Objects.requireNonNull(analysis, "analysis");
    String ext = FormatSniffer.extension(String.valueOf(target.getFileName()));
    if (!ext.equals("png") && !ext.equals("jpg") && !ext.equals("jpeg")) {
      throw new IllegalArgumentException("thumbnail must end in .png, .jpg or .jpeg: " + target);
    }
    Path directory = target.toAbsolutePath().getParent();
    Files.createDirectories(directory);
    BufferedImage thumb = scaled(analysis);
    Path tmp = Files.createTempFile(directory, ".thumb-", ".tmp");
    try {
      try (OutputStream out = Files.newOutputStream(tmp)) {
        if (ext.equals("png")) {
          if (!ImageIO.write(thumb, "png", out)) {
            throw new IOException("no PNG writer available");
          }
        } else {
          writeJpeg(onWhite(thumb), out);
        }
      }
      try {
        Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
      }
    } finally {
      Files.deleteIfExists(tmp);
    }
  }

  /** The thumbnail picture itself (long side at most the configured size), {@code TYPE_INT_ARGB}. */
  public BufferedImage scaled(BufferedImage analysis) {
    int[] size = AreaDownscaler.fitWithin(analysis.getWidth(), analysis.getHeight(), longSide);
    return AreaDownscaler.resize(analysis, size[0], size[1]);
  }

  private static boolean hasTransparency(BufferedImage img) {
    if (!img.getColorModel().hasAlpha()) {
      return false;
    }
    int w = img.getWidth();
    int[] row = new int[w];
    for (int y = 0; y < img.getHeight(); y++) {
      img.getRGB(0, y, w, 1, row, 0, w);
      for (int p : row) {
        if (p >>> 24 != 0xFF) {
          return true;
        }
      }
    }
    return false;
  }

  /**
   * JPEG writers misread 4-channel ARGB as CMYK; hand them 3-channel RGB, with any translucent pixel composited
   * over white ("over" operator, Porter and Duff 1984, SIGGRAPH).
   */
  private static BufferedImage onWhite(BufferedImage img) {
    BufferedImage rgb = new BufferedImage(img.getWidth(), img.getHeight(), BufferedImage.TYPE_INT_RGB);
    int w = img.getWidth();
    int[] row = new int[w];
    for (int y = 0; y < img.getHeight(); y++) {
      img.getRGB(0, y, w, 1, row, 0, w);
      for (int x = 0; x < w; x++) {
        int p = row[x];
        int a = p >>> 24;
        if (a != 255) {
          int r = (((p >> 16) & 0xFF) * a + 255 * (255 - a) + 127) / 255;
          int g = (((p >> 8) & 0xFF) * a + 255 * (255 - a) + 127) / 255;
          int b = ((p & 0xFF) * a + 255 * (255 - a) + 127) / 255;
          row[x] = r << 16 | g << 8 | b;
        }
      }
      rgb.setRGB(0, y, w, 1, row, 0, w);
    }
    return rgb;
  }

  private static void writeJpeg(BufferedImage rgb, OutputStream out) throws IOException {
    Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("jpeg");
    if (!writers.hasNext()) {
      throw new IOException("no JPEG writer available");
    }
    ImageWriter writer = writers.next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      ImageWriteParam param = writer.getDefaultWriteParam();
      param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
      param.setCompressionQuality(JPEG_QUALITY);
      writer.write(null, new IIOImage(rgb, null, null), param);
    } finally {
      writer.dispose();
    }
  }
}
