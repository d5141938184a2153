package org.morphscout.app.gui.common;

import javafx.scene.image.PixelWriter;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import org.morphscout.app.gui.service.AlignedMasks;
import org.morphscout.indexer.silhouette.Mask;

/** Paints masks as images: one silhouette as a tinted overlay, or two aligned ones in two colours. */
public final class MaskImages {
  /** Colours of the first and second silhouette and of their overlap (chosen to stay apart for common colour blindness). */
  public static final Color FIRST = Color.web("#d9822b", 0.85);
  public static final Color SECOND = Color.web("#2f7fb8", 0.85);
  public static final Color BOTH = Color.web("#3d3b38", 0.9);

  private MaskImages() {}

  /**
   * The object in a translucent {@code tint} with its outline (object pixels with a background 4-neighbour, or on
   * the border) opaque, the rest transparent: the outline stays visible on any image.
   */
  public static WritableImage overlay(Mask m, Color tint) {
    WritableImage img = new WritableImage(m.width(), m.height());
    PixelWriter w = img.getPixelWriter();
    Color fill = Color.color(tint.getRed(), tint.getGreen(), tint.getBlue(), 0.35);
    Color edge = Color.color(tint.getRed(), tint.getGreen(), tint.getBlue(), 1.0);
    for (int y = 0; y < m.height(); y++) {
      for (int x = 0; x < m.width(); x++) {
        if (!m.get(x, y)) {
          w.setColor(x, y, Color.TRANSPARENT);
          continue;
        }
        boolean outline = x == 0 || y == 0 || x == m.width() - 1 || y == m.height() - 1 || !m.get(x - 1, y)
            || !m.get(x + 1, y) || !m.get(x, y - 1) || !m.get(x, y + 1);
        w.setColor(x, y, outline ? edge : fill);
      }
    }
    return img;
  }

  /** Both silhouettes: first only, second only, and overlap each in its own colour, on a light background. */
  public static WritableImage pair(AlignedMasks a) {
    Mask p = a.a();
    Mask q = a.b();
    WritableImage img = new WritableImage(p.width(), p.height());
    PixelWriter w = img.getPixelWriter();
    Color bg = Color.web("#f4f2ee");
    for (int y = 0; y < p.height(); y++) {
      for (int x = 0; x < p.width(); x++) {
        boolean inP = p.get(x, y);
        boolean inQ = q.get(x, y);
        w.setColor(x, y, inP && inQ ? BOTH : inP ? FIRST : inQ ? SECOND : bg);
      }
    }
    return img;
  }
}
