package org.morphscout.app.gui.service;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.progress.CancellationToken;

/** Quick preview frames of a morph between catalog images (not a final render). */
public interface PreviewBackend {
  /** {@code frames} images (at least 2) from {@code a} to {@code b}, all the same size. */
  List<BufferedImage> morph(long a, long b, int frames, CancellationToken token);

  /**
   * Frames along a chain of images, {@code framesPerStep} per step (ends included, the shared frame between steps
   * shown once). By default the steps' morphs one after the other.
   */
  default List<BufferedImage> chain(List<Long> ids, int framesPerStep, CancellationToken token) {
    List<BufferedImage> frames = new ArrayList<>();
    for (int i = 0; i + 1 < ids.size(); i++) {
      List<BufferedImage> step = morph(ids.get(i), ids.get(i + 1), framesPerStep, token);
      frames.addAll(i == 0 ? step : step.subList(1, step.size()));
    }
    return frames;
  }
}
