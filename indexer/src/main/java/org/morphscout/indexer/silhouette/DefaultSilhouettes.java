package org.morphscout.indexer.silhouette;

import java.awt.image.BufferedImage;
import java.util.Objects;

/**
 * The default composite: the alpha channel when it holds a real cut-out ({@link AlphaSilhouettes#hasUsableAlpha}),
 * else the border background model. The silhouette's {@code source} says which one answered. Immutable and
 * thread-safe.
 */
public final class DefaultSilhouettes implements SilhouetteExtractor {
  private final AlphaSilhouettes alpha;
  private final SilhouetteExtractor fallback;

  public DefaultSilhouettes(AlphaSilhouettes alpha, SilhouetteExtractor fallback) {
    this.alpha = Objects.requireNonNull(alpha, "alpha");
    this.fallback = Objects.requireNonNull(fallback, "fallback");
  }

  /** Alpha with default settings, then {@link BorderModelSilhouettes} with {@link BorderModelOptions#DEFAULTS}. */
  public DefaultSilhouettes() {
    this(new AlphaSilhouettes(), new BorderModelSilhouettes());
  }

  @Override
  public Silhouette extract(BufferedImage image) {
    return AlphaSilhouettes.hasUsableAlpha(image) ? alpha.extract(image) : fallback.extract(image);
  }

  @Override
  public String name() {
    return "alpha-or-" + fallback.name();
  }
}
