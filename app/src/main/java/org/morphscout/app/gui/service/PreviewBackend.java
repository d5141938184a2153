package org.morphscout.app.gui.service;

import java.awt.image.BufferedImage;
import java.util.List;
import org.morphscout.indexer.progress.CancellationToken;

/** Quick preview frames of a morph between two catalog images (not a final render). */
public interface PreviewBackend {
  /** {@code frames} images (at least 2) from {@code a} to {@code b}, all the same size. */
  List<BufferedImage> morph(long a, long b, int frames, CancellationToken token);
}
