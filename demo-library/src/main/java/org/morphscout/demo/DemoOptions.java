package org.morphscout.demo;

/**
 * How to generate the demo library. Immutable; validated on construction.
 *
 * @param seed master seed; the same seed gives the same bytes on the same JDK. Default {@link #DEFAULT_SEED}.
 * @param productCount number of product pictures, in [1, 5000]. Default 200.
 * @param duplicates how many products also get a near-duplicate copy (resized and recompressed), in
 *     [0, productCount]. Default 8.
 * @param includeProblems whether to write the six problem pictures in {@code problems/}. Default true.
 * @param shelfViews number of walkthrough views in {@code shelves/}: 0 (none) or in [4, 60]. Default 16.
 * @param threads worker threads, in [1, 16]. Output never depends on this. Default 2.
 * @param jpegQuality JPEG quality for product pictures, in [0.5, 1]. Default 0.9.
 */
public record DemoOptions(long seed, int productCount, int duplicates, boolean includeProblems, int shelfViews,
    int threads, float jpegQuality) {
  /** The seed the shipped demo library is generated with. */
  public static final long DEFAULT_SEED = 20_261_201L;

  public DemoOptions {
    if (productCount < 1 || productCount > 5000) {
      throw new IllegalArgumentException("productCount must be in [1, 5000]: " + productCount);
    }
    if (duplicates < 0 || duplicates > productCount) {
      throw new IllegalArgumentException("duplicates must be in [0, productCount]: " + duplicates);
    }
    if (shelfViews != 0 && (shelfViews < 4 || shelfViews > 60)) {
      throw new IllegalArgumentException("shelfViews must be 0 or in [4, 60]: " + shelfViews);
    }
    if (threads < 1 || threads > 16) {
      throw new IllegalArgumentException("threads must be in [1, 16]: " + threads);
    }
    if (!(jpegQuality >= 0.5f && jpegQuality <= 1f)) {
      throw new IllegalArgumentException("jpegQuality must be in [0.5, 1]: " + jpegQuality);
    }
  }

  /** 200 products, 8 near-duplicates, the problem set, 16 shelf views, 2 threads, JPEG quality 0.9. */
  public static DemoOptions defaults() {
    return new DemoOptions(DEFAULT_SEED, 200, 8, true, 16, 2, 0.9f);
  }

  /** Another product count; near-duplicates scale along (one per 25 products, at least one). */
  public DemoOptions withProductCount(int count) {
    return new DemoOptions(seed, count, Math.min(count, Math.max(1, count / 25)), includeProblems, shelfViews,
        threads, jpegQuality);
  }

  public DemoOptions withSeed(long newSeed) {
    return new DemoOptions(newSeed, productCount, duplicates, includeProblems, shelfViews, threads, jpegQuality);
  }

  public DemoOptions withThreads(int n) {
    return new DemoOptions(seed, productCount, duplicates, includeProblems, shelfViews, n, jpegQuality);
  }

  public DemoOptions withShelfViews(int n) {
    return new DemoOptions(seed, productCount, duplicates, includeProblems, n, threads, jpegQuality);
  }
}
