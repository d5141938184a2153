package org.morphscout.indexer.preview;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;

/**
 * Renders sequences (chains, walks) as a PNG contact sheet: a title line, an optional legend line saying what the
 * numbers on the arrows are, then per sequence a caption line and its thumbnails left to right with the step's number
 * written between consecutive ones (three significant digits, {@link #stepLabel}, so small step costs still differ);
 * long sequences wrap onto further lines (the number of a step that crosses a line break is written after the line's
 * last thumbnail, with an arrow). Plain look: white background, dark text, system sans-serif font. Pure Java2D, works
 * headless.
 *
 * <p>Layout ({@link #size}): width = 2·margin + c·thumb + (c-1)·gap, plus one more gap when any sequence wraps,
 * where c = min(perLine, longest sequence); height = 2·margin + line (title) + line (legend, when there is one) + Σ
 * over sequences of [margin + line (caption) + lines·(thumb + line (tile captions))]. Thread-safe (no shared state).
 */
public final class ContactSheet {
  private static final Color INK = new Color(0x20, 0x20, 0x20);
  private static final Color FAINT = new Color(0x70, 0x70, 0x70);
  private static final Color FRAME = new Color(0xD0, 0xD0, 0xD0);

  private final ContactSheetStyle style;

  public ContactSheet(ContactSheetStyle style) {
    if (style == null) {
      throw new IllegalArgumentException("style must not be null");
    }
    this.style = style;
  }

  public ContactSheet() {
    this(ContactSheetStyle.DEFAULT);
  }

  /**
   * A step's number as written on its arrow: three significant digits (0.0213, 0.156, 40.5), so the small step costs
   * of a smooth walk do not all print as the same two decimals.
   */
  public static String stepLabel(double value) {
    return org.morphscout.indexer.text.Figures.threeDigits(value);
  }

  /** The pixel size {@link #render} will produce for these rows, without a legend. */
  public Dimension size(List<ContactSheetRow> rows) {
    return size(null, rows);
  }

  /** The pixel size {@link #render(String, String, List)} will produce. */
  public Dimension size(String legend, List<ContactSheetRow> rows) {
    int longest = rows.stream().mapToInt(r -> r.tiles().size()).max().orElse(1);
    int cols = Math.min(style.perLine(), longest);
    boolean wraps = longest > style.perLine();
    int width = 2 * style.margin() + cols * style.thumbSize() + (cols - 1) * style.gap() + (wraps ? style.gap() : 0);
    int line = style.lineHeight();
    int height = 2 * style.margin() + line + (hasLegend(legend) ? line : 0);
    for (ContactSheetRow r : rows) {
      height += style.margin() + line + lines(r) * (style.thumbSize() + line);
    }
    return new Dimension(width, height);
  }

  private static boolean hasLegend(String legend) {
    return legend != null && !legend.isBlank();
  }

  /** Draws the sheet without a legend. */
  public BufferedImage render(String title, List<ContactSheetRow> rows) {
    return render(title, null, rows);
  }

  /** Draws the sheet; {@code legend} (one line under the title, or null) says what the arrows' numbers are. */
  public BufferedImage render(String title, String legend, List<ContactSheetRow> rows) {
    Dimension size = size(legend, rows);
    BufferedImage out = new BufferedImage(size.width, size.height, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = out.createGraphics();
    try {
      g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
      g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
      g.setColor(Color.WHITE);
      g.fillRect(0, 0, size.width, size.height);
      Font plain = new Font(Font.SANS_SERIF, Font.PLAIN, style.fontSize());
      Font bold = plain.deriveFont(Font.BOLD);
      int line = style.lineHeight();
      int contentWidth = size.width - 2 * style.margin();
      int y = style.margin();
      text(g, bold, INK, title, style.margin(), y, contentWidth, false);
      y += line;
      if (hasLegend(legend)) {
        text(g, plain, FAINT, legend, style.margin(), y, contentWidth, false);
        y += line;
      }
      for (ContactSheetRow row : rows) {
        y += style.margin();
        text(g, bold, INK, row.caption(), style.margin(), y, contentWidth, false);
        y += line;
        y = drawTiles(g, plain, row, y);
      }
    } finally {
      g.dispose();
    }
    return out;
  }

  /** Renders and writes a PNG file (no legend). */
  public void writePng(String title, List<ContactSheetRow> rows, Path file) throws IOException {
    writePng(title, null, rows, file);
  }

  /** Renders and writes a PNG file with a legend line under the title. */
  public void writePng(String title, String legend, List<ContactSheetRow> rows, Path file) throws IOException {
    BufferedImage img = render(title, legend, rows);
    Path parent = file.toAbsolutePath().getParent();
    if (parent != null) {
      Files.createDirectories(parent);
    }
    if (!ImageIO.write(img, "png", file.toFile())) {
      throw new IOException("no PNG writer available to write " + file);
    }
  }

  private int drawTiles(Graphics2D g, Font font, ContactSheetRow row, int top) {
    int thumb = style.thumbSize();
    int line = style.lineHeight();
    List<ContactSheetRow.Tile> tiles = row.tiles();
    int y = top;
    for (int i = 0; i < tiles.size(); i++) {
      int col = i % style.perLine();
      if (i > 0 && col == 0) {
        y += thumb + line;
      }
      int x = style.margin() + col * (thumb + style.gap());
      drawThumb(g, tiles.get(i).thumbnail(), x, y);
      text(g, font, FAINT, tiles.get(i).caption(), x, y + thumb, thumb, true);
      if (i + 1 < tiles.size()) {
        boolean breaks = col == style.perLine() - 1;
        String score = stepLabel(row.stepScores().get(i));
        drawStep(g, font, score, x + thumb, y + thumb / 2, breaks);
      }
    }
    return y + thumb + line;
  }

  private void drawThumb(Graphics2D g, BufferedImage img, int x, int y) {
    int box = style.thumbSize();
    double scale = Math.min((double) box / img.getWidth(), (double) box / img.getHeight());
    int w = Math.max(1, (int) Math.round(img.getWidth() * scale));
    int h = Math.max(1, (int) Math.round(img.getHeight() * scale));
    g.drawImage(img, x + (box - w) / 2, y + (box - h) / 2, w, h, null);
    g.setColor(FRAME);
    g.setStroke(new BasicStroke(1f));
    g.drawRect(x, y, box - 1, box - 1);
  }

  /** A small arrow across the gap with the score above it; {@code wraps} marks a step continuing on the next line. */
  private void drawStep(Graphics2D g, Font font, String score, int left, int middleY, boolean wraps) {
    int gap = style.gap();
    int x0 = left + 4;
    int x1 = left + gap - 4;
    g.setColor(FAINT);
    g.setStroke(new BasicStroke(1.2f));
    g.drawLine(x0, middleY, x1, middleY);
    g.drawLine(x1, middleY, x1 - 5, middleY - 4);
    g.drawLine(x1, middleY, x1 - 5, middleY + 4);
    if (wraps) {
      g.drawLine(x1, middleY, x1, middleY + 10); // hint that the sequence continues below
    }
    text(g, font, INK, score, left, middleY - style.lineHeight(), gap, true);
  }

  /** One line of text, shortened with an ellipsis to fit {@code width}; {@code top} is the line's top edge. */
  private void text(Graphics2D g, Font font, Color colour, String s, int left, int top, int width, boolean centre) {
    g.setFont(font);
    g.setColor(colour);
    FontMetrics fm = g.getFontMetrics();
    String fitted = s;
    if (fm.stringWidth(fitted) > width) {
      int keep = fitted.length();
      while (keep > 0 && fm.stringWidth(fitted.substring(0, keep) + "…") > width) {
        keep--;
      }
      fitted = fitted.substring(0, keep) + "…";
    }
    int x = centre ? left + (width - fm.stringWidth(fitted)) / 2 : left;
    int baseline = top + (style.lineHeight() + fm.getAscent() - fm.getDescent()) / 2;
    g.drawString(fitted, x, baseline);
  }

  private int lines(ContactSheetRow r) {
    return (r.tiles().size() + style.perLine() - 1) / style.perLine();
  }
}
