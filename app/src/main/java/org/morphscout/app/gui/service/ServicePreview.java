package org.morphscout.app.gui.service;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.PreviewService;
import org.morphscout.indexer.library.QueryContext;
import org.morphscout.indexer.progress.CancellationToken;

/**
 * Preview morphs through the library's {@link PreviewService} (silhouette warp plus cross-dissolve, as
 * {@code morphscout preview}), frames {@link PreviewService#FRAME_LONG_SIDE} px on the long side.
 */
public final class ServicePreview implements PreviewBackend {
  private final QueryContext context;
  private final PreviewService service;

  public ServicePreview(QueryContext context, PreviewService service) {
    this.context = context;
    this.service = service;
  }

  @Override
  public List<BufferedImage> morph(long a, long b, int frames, CancellationToken token) {
    return chain(List.of(a, b), frames, token);
  }

  @Override
  public List<BufferedImage> chain(List<Long> ids, int framesPerStep, CancellationToken token) {
    List<ImageAnalysis> stops = new ArrayList<>();
    for (long id : ids) {
      stops.add(context.cache().get(id).orElseThrow(() -> new MorphscoutException(
          "image " + id + " has no stored analysis; index its folder again")));
    }
    token.throwIfCancelled();
    try {
      return service.frames(stops, framesPerStep);
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read the images for the preview", e);
    }
  }
}
