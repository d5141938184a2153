package org.morphscout.indexer.library;

import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.ingest.ReadFailure;

/**
 * Why a file failed to index, as a value stored beside the reason people read (layout step 08). Whether a failed file
 * is tried again at the next run depends on its kind alone: see {@link #worthRetrying}.
 */
public enum FailureKind {
  EMPTY,
  NOT_AN_IMAGE,
  UNSUPPORTED_FORMAT,
  TRUNCATED,
  /** More pixels than the cap: tried again once the cap admits the declared pixel count. */
  TOO_LARGE,
  VANISHED,
  UNREADABLE,
  /** Reading or analysing took longer than the per-file limit: says more about the run than the file. */
  TIMED_OUT,
  DECODER_FAILED,
  /** The analysis ran out of memory: says more about the run than the file. */
  OUT_OF_MEMORY,
  /** The appearance model failed on the file's batch. */
  MODEL_FAILED,
  /** The analysis gave an unusable (NaN) vector. */
  INVALID_VECTOR,
  /** Anything else the analysis threw. */
  ANALYSIS_FAILED;

  /**
   * A failure as stored: its kind, the phrase people read, and for {@link #TOO_LARGE} the declared pixel count
   * (0 otherwise).
   */
  public record Failure(FailureKind kind, String reason, long declaredPixels) {
    public Failure(FailureKind kind, String reason) {
      this(kind, reason, 0);
    }
  }

  /** The failure a throwable from reading and analysing one file stands for. */
  public static Failure of(Throwable t) {
    if (t instanceof ImageReadException r) {
      return new Failure(of(r.failure()), r.reason(), r.declaredPixels());
    }
    if (t instanceof java.nio.file.NoSuchFileException) {
      return new Failure(VANISHED, "file disappeared before it could be read");
    }
    if (t instanceof OutOfMemoryError) {
      return new Failure(OUT_OF_MEMORY, "not enough memory to analyse this image");
    }
    String m = t.getMessage();
    return new Failure(ANALYSIS_FAILED, "analysis failed: " + (m == null ? t.getClass().getSimpleName() : m));
  }

  static FailureKind of(ReadFailure f) {
    return valueOf(f.name());
  }

  /** Whether a file that failed this way, unchanged since, is worth another try under a pixel cap of maxPixels. */
  public static boolean worthRetrying(FailureKind kind, long declaredPixels, long maxPixels) {
    return switch (kind) {
      case TIMED_OUT, OUT_OF_MEMORY -> true;
      case TOO_LARGE -> declaredPixels > 0 && declaredPixels <= maxPixels;
      default -> false;
    };
  }
}
