package org.morphscout.app.gui.service;

import java.util.List;
import org.morphscout.indexer.progress.CancellationToken;

/** Orders a set of images into a smooth walk and measures the steps of any order. */
public interface WalkBackend {
  /** The same images in a smooth order. */
  List<Long> order(List<Long> ids, CancellationToken token);

  /** The size of each step of {@code ordered} ({@code ordered.size() - 1} values, each in [0, 2]). */
  List<Double> steps(List<Long> ordered, CancellationToken token);
}
