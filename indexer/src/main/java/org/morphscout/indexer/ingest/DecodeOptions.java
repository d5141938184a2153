package org.morphscout.indexer.ingest;

import java.time.Duration;
import java.util.Objects;

/**
 * Limits and sizes for decoding.
 *
 * @param maxPixels images whose header declares more pixels (width x height) than this are refused before any
 *     pixel is decoded; default 250 000 000 (250 MP, above today's largest medium-format sensors at ~150 MP).
 *     Range 1..{@value #MAX_PIXEL_CAP}.
 * @param analysisLongSide long side of the analysis image in pixels; default 768. Range 16..8192.
 * @param thumbnailLongSide long side of thumbnails in pixels; default 256. Range 16..analysisLongSide.
 * @param perFileTimeLimit wall-clock limit for decoding one file, used by {@link TimeLimitedDecoder}; default 60 s;
 *     {@link Duration#ZERO} means no limit. Must not be negative.
 */
public record DecodeOptions(
    long maxPixels, int analysisLongSide, int thumbnailLongSide, Duration perFileTimeLimit) {

  /** Upper bound for {@link #maxPixels}: 2^31 - 1 pixels, the most a Java raster can address anyway. */
  public static final long MAX_PIXEL_CAP = Integer.MAX_VALUE;

  public static final long DEFAULT_MAX_PIXELS = 250_000_000L;
  public static final int DEFAULT_ANALYSIS_LONG_SIDE = 768;
  public static final int DEFAULT_THUMBNAIL_LONG_SIDE = 256;
  public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(60);

  public DecodeOptions {
    Objects.requireNonNull(perFileTimeLimit, "perFileTimeLimit (use Duration.ZERO for no limit)");
    if (maxPixels < 1 || maxPixels > MAX_PIXEL_CAP) {
      throw new IllegalArgumentException("maxPixels must be 1.." + MAX_PIXEL_CAP + ", got " + maxPixels);
    }
    if (analysisLongSide < 16 || analysisLongSide > 8192) {
      throw new IllegalArgumentException("analysisLongSide must be 16..8192, got " + analysisLongSide);
    }
    if (thumbnailLongSide < 16 || thumbnailLongSide > analysisLongSide) {
      throw new IllegalArgumentException(
          "thumbnailLongSide must be 16.." + analysisLongSide + " (the analysis size), got " + thumbnailLongSide);
    }
    if (perFileTimeLimit.isNegative()) {
      throw new IllegalArgumentException("perFileTimeLimit must not be negative, got " + perFileTimeLimit);
    }
  }

  /** The documented defaults: 250 MP cap, 768 px analysis, 256 px thumbnails, 60 s per file. */
  public static DecodeOptions defaults() {
    return new DecodeOptions(
        DEFAULT_MAX_PIXELS, DEFAULT_ANALYSIS_LONG_SIDE, DEFAULT_THUMBNAIL_LONG_SIDE, DEFAULT_TIME_LIMIT);
  }

  /** A copy with another pixel cap. */
  public DecodeOptions withMaxPixels(long newMaxPixels) {
    return new DecodeOptions(newMaxPixels, analysisLongSide, thumbnailLongSide, perFileTimeLimit);
  }

  /** A copy with another analysis size (the thumbnail size is clamped to it). */
  public DecodeOptions withAnalysisLongSide(int newLongSide) {
    return new DecodeOptions(
        maxPixels, newLongSide, Math.min(thumbnailLongSide, newLongSide), perFileTimeLimit);
  }

  /** A copy with another per-file time limit. */
  public DecodeOptions withPerFileTimeLimit(Duration limit) {
    return new DecodeOptions(maxPixels, analysisLongSide, thumbnailLongSide, limit);
  }

  /** Whether a per-file time limit is set. */
  public boolean hasTimeLimit() {
    return !perFileTimeLimit.isZero();
  }
}
