package org.morphscout.app.gui.service;

import java.awt.AlphaComposite;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.catalog.ImageRow;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Interim preview until the preview-morph service lands: a plain cross-dissolve of the two thumbnails, each fitted
 * into the same square (letterboxed on a neutral grey). No warping, so it shows colour and framing, not shape change.
 */
public final class CrossDissolvePreview implements PreviewBackend {
  /** Side of the preview frames, in pixels. */
  static final int SIZE = 256;

  private final Library library;

  public CrossDissolvePreview(Library library) {
    this.library = library;
  }

  @Override
  public List<BufferedImage> morph(long a, long b, int frames, CancellationToken token) {
    if (frames < 2) {
      throw new IllegalArgumentException("a preview needs at least 2 frames, got " + frames);
    }
    BufferedImage from = fitted(read(a));
    BufferedImage to = fitted(read(b));
    List<BufferedImage> result = new ArrayList<>(frames);
    for (int i = 0; i < frames; i++) {
      token.throwIfCancelled();
      float t = i / (float) (frames - 1);
      BufferedImage f = new BufferedImage(SIZE, SIZE, BufferedImage.TYPE_INT_RGB);
      Graphics2D g = f.createGraphics();
      g.drawImage(from, 0, 0, null);
      g.setComposite(AlphaComposite.getInstance(AlphaComposite.SRC_OVER, t));
      g.drawImage(to, 0, 0, null);
      g.dispose();
      result.add(f);
    }
    return result;
  }

  private BufferedImage read(long id) {
    ImageRow row = library.images().byId(id)
        .orElseThrow(() -> new MorphscoutException("image " + id + " is no longer in the catalog"));
    Path file = library.catalog().thumbnail(id).orElse(Path.of(row.path()));
    try {
      BufferedImage img = ImageIO.read(file.toFile());
      if (img == null) {
        throw new MorphscoutException("cannot read " + file + " for the preview: unsupported or damaged image");
      }
      return img;
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read " + file + " for the preview", e);
    }
  }

  static BufferedImage fitted(BufferedImage src) {
    BufferedImage out = new BufferedImage(SIZE, SIZE, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = out.createGraphics();
    g.setColor(new Color(0xE6E4DF));
    g.fillRect(0, 0, SIZE, SIZE);
    g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
    double s = Math.min(SIZE / (double) src.getWidth(), SIZE / (double) src.getHeight());
    int w = (int) Math.round(src.getWidth() * s);
    int h = (int) Math.round(src.getHeight() * s);
    g.drawImage(src, (SIZE - w) / 2, (SIZE - h) / 2, w, h, null);
    g.dispose();
    return out;
  }
}
