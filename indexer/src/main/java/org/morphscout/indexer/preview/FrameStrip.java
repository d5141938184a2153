package org.morphscout.indexer.preview;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;

/** Lays frames side by side in one image (a strip) and writes it as PNG, for reports and quick looks. Stateless. */
public final class FrameStrip {
  private FrameStrip() {}

  /**
   * The frames left to right, top-aligned, separated by {@code gap} pixels of {@code background}.
   *
   * @param gap pixels between frames, 0..1000
   */
  public static BufferedImage compose(List<BufferedImage> frames, int gap, Color background) {
    if (frames.isEmpty()) {
      throw new IllegalArgumentException("a frame strip needs at least one frame");
    }
    if (gap < 0 || gap > 1000) {
      throw new IllegalArgumentException("strip gap must be 0..1000 pixels, got " + gap);
    }
    long width = (long) gap * (frames.size() - 1);
    int height = 0;
    for (BufferedImage f : frames) {
      width += f.getWidth();
      height = Math.max(height, f.getHeight());
    }
    if (width > 65_535) {
      throw new IllegalArgumentException("strip would be " + width + " pixels wide; use fewer or smaller frames");
    }
    BufferedImage out = new BufferedImage((int) width, height, BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = out.createGraphics();
    g.setColor(background);
    g.fillRect(0, 0, out.getWidth(), height);
    int x = 0;
    for (BufferedImage f : frames) {
      g.drawImage(f, x, 0, null);
      x += f.getWidth() + gap;
    }
    g.dispose();
    return out;
  }

  /** Height of the legend band above the frames, in pixels. */
  static final int LEGEND_BAND = 28;

  /** Writes the strip (4-pixel white gaps) as a PNG file. */
  public static void write(List<BufferedImage> frames, Path file) throws IOException {
    write(frames, null, file);
  }

  /**
   * Writes the strip (4-pixel white gaps) as a PNG file, under a band of {@link #LEGEND_BAND} pixels holding
   * {@code legend} (one line saying what the frames are), as contact sheets carry one; none when it is null or blank.
   */
  public static void write(List<BufferedImage> frames, String legend, Path file) throws IOException {
    BufferedImage strip = withLegend(compose(frames, 4, Color.WHITE), legend);
    if (!ImageIO.write(strip, "png", file.toFile())) {
      throw new IOException("no PNG writer available for " + file);
    }
  }

  /** {@code strip} below a white band with {@code legend} in it, or {@code strip} itself without a legend. */
  static BufferedImage withLegend(BufferedImage strip, String legend) {
    if (legend == null || legend.isBlank()) {
      return strip;
    }
    BufferedImage out = new BufferedImage(strip.getWidth(), strip.getHeight() + LEGEND_BAND,
        BufferedImage.TYPE_INT_ARGB);
    Graphics2D g = out.createGraphics();
    try {
      g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
      g.setColor(Color.WHITE);
      g.fillRect(0, 0, out.getWidth(), LEGEND_BAND);
      g.setColor(new Color(0x55, 0x55, 0x55));
      g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 13));
      g.drawString(legend, 6, LEGEND_BAND - 9);
      g.drawImage(strip, 0, LEGEND_BAND, null);
    } finally {
      g.dispose();
    }
    return out;
  }
}
