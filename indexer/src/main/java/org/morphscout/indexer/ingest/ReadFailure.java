package org.morphscout.indexer.ingest;

/**
 * The small, stable vocabulary of reasons a file could not be read. The catalog may store {@link #name()} as a
 * machine-readable code and {@link ImageReadException#reason()} as the human phrase.
 */
public enum ReadFailure {
  /** The file has 0 bytes. */
  EMPTY,
  /** The bytes are not a known image format. */
  NOT_AN_IMAGE,
  /** A recognised format this tool does not decode (HEIC, AVIF, camera raw). */
  UNSUPPORTED_FORMAT,
  /** The data ends before the image does. */
  TRUNCATED,
  /** The header declares more pixels than the configured cap. */
  TOO_LARGE,
  /** The file was listed but is gone when decoding starts. */
  VANISHED,
  /** The file exists but may not be read (permissions). */
  UNREADABLE,
  /** Decoding took longer than the per-file time limit or was interrupted. */
  TIMED_OUT,
  /** The decoder refused the data for another reason (named in the phrase). */
  DECODER_FAILED
}
