package org.morphscout.app.gui.service;

import java.util.List;

/**
 * A chain of real images from start to end.
 *
 * @param images the images in order, start first, end last
 * @param steps one step per consecutive pair ({@code images.size() - 1})
 * @param maxStep the largest step's cost (the chain is only as smooth as its worst jump)
 * @param evenness coefficient of variation of the step costs (population standard deviation / mean), &gt;= 0;
 *     0 = all steps the same size (as the command line reports it)
 */
public record ChainCandidate(List<Long> images, List<ChainStep> steps, double maxStep, double evenness) {
  public ChainCandidate {
    images = List.copyOf(images);
    steps = List.copyOf(steps);
    if (images.size() < 2 || steps.size() != images.size() - 1) {
      throw new IllegalArgumentException("a chain needs n >= 2 images and n - 1 steps");
    }
  }

  /** Builds a candidate from its steps, computing the largest step and the evenness. */
  public static ChainCandidate of(List<Long> images, List<ChainStep> steps) {
    double max = 0;
    double sum = 0;
    for (ChainStep s : steps) {
      max = Math.max(max, s.cost());
      sum += s.cost();
    }
    double mean = sum / steps.size();
    double var = 0;
    for (ChainStep s : steps) {
      var += (s.cost() - mean) * (s.cost() - mean);
    }
    double cv = mean == 0 ? 0 : Math.sqrt(var / steps.size()) / mean;
    return new ChainCandidate(images, steps, max, cv);
  }
}
