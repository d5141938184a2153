package org.morphscout.indexer.library;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Set;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.chain.StepCostModel;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;
import org.morphscout.indexer.walk.WalkPlanner;
import org.morphscout.indexer.walk.WalkResult;

/**
 * Orders a set of catalog images into a walkthrough: an open path with the smallest total step cost and few large
 * jumps. The step cost is the same mix of appearance and shape as the chain graph's.
 */
public final class WalkService {
  private final QueryContext context;

  public WalkService(QueryContext context) {
    this.context = context;
  }

  /**
   * A planned walk.
   *
   * @param images the analyses in walking order
   * @param steps the cost of each step (one fewer than images)
   */
  public record WalkAnswer(List<ImageAnalysis> images, List<Double> steps, WalkResult result) {}

  /**
   * The ready catalog images named by {@code arguments}: folders (every ready image below them) or image files; no
   * arguments means the whole library. Order follows the arguments, then path.
   */
  public List<ImageAnalysis> select(List<String> arguments) {
    Set<Long> ids = new LinkedHashSet<>();
    if (arguments.isEmpty()) {
      ids.addAll(context.library().features().readyIds(context.modelId()));
    }
    for (String arg : arguments) {
      Path p = Path.of(arg).toAbsolutePath().normalize();
      if (Files.isDirectory(p)) {
        String prefix = p + java.io.File.separator;
        int before = ids.size();
        for (ImageRow row : context.library().images().withStatus(ImageStatus.READY)) {
          if (row.path().startsWith(prefix)) {
            ids.add(row.id());
          }
        }
        if (ids.size() == before) {
          throw new MorphscoutException("no indexed images under " + p + " (index the folder first)");
        }
      } else {
        ImageRow row = context.library().require(arg);
        if (row.status() != ImageStatus.READY) {
          throw new MorphscoutException("image not analysed (" + row.status().word() + "): " + row.path());
        }
        ids.add(row.id());
      }
    }
    List<ImageAnalysis> result = new ArrayList<>();
    for (long id : ids) {
      context.cache().get(id).ifPresent(result::add);
    }
    return result;
  }

  /** Plans the walk; {@code start} and {@code end} are optional members of {@code images}. */
  public WalkAnswer plan(List<ImageAnalysis> images, ImageAnalysis start, ImageAnalysis end, StepCostModel model) {
    if (images.size() < 2) {
      throw new MorphscoutException("a walkthrough needs at least two images, got " + images.size());
    }
    if (images.size() > WalkPlanner.MAX_ITEMS) {
      throw new MorphscoutException("a walkthrough takes at most " + WalkPlanner.MAX_ITEMS + " images, got "
          + images.size() + ": choose a folder or a selection");
    }
    int n = images.size();
    double[] d = new double[n * n];
    for (int i = 0; i < n; i++) {
      for (int j = i + 1; j < n; j++) {
        double c = model.cost(StepFeatures.between(images.get(i), images.get(j)));
        d[i * n + j] = c;
        d[j * n + i] = c;
      }
    }
    WalkResult r = new WalkPlanner().planOpen(n, (i, j) -> d[i * n + j], indexOf(images, start),
        indexOf(images, end));
    List<ImageAnalysis> ordered = new ArrayList<>();
    List<Double> steps = new ArrayList<>();
    for (int k = 0; k < r.order().size(); k++) {
      ordered.add(images.get(r.order().get(k)));
      if (k > 0) {
        steps.add(d[r.order().get(k - 1) * n + r.order().get(k)]);
      }
    }
    return new WalkAnswer(ordered, steps, r);
  }

  private static OptionalInt indexOf(List<ImageAnalysis> images, ImageAnalysis a) {
    if (a == null) {
      return OptionalInt.empty();
    }
    for (int i = 0; i < images.size(); i++) {
      if (images.get(i).id() == a.id()) {
        return OptionalInt.of(i);
      }
    }
    throw new MorphscoutException("--start/--end image is not among the images to order: " + a.path());
  }
}
