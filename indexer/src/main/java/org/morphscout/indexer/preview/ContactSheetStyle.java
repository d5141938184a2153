package org.morphscout.indexer.preview;

/**
 * Layout of a {@link ContactSheet}. All sizes in pixels.
 *
 * @param thumbSize side of the square box each thumbnail is fitted into (aspect kept), 16..1024. Default 160.
 * @param perLine most thumbnails on one line before a sequence wraps, &gt;= 1. Default 6.
 * @param gap horizontal space between thumbnails, where the step score is written, &gt;= 24. Default 56.
 * @param margin outer margin and the space between sequences, &gt;= 0. Default 16.
 * @param fontSize text size in points (system sans-serif), 6..48. Default 13. Every text line takes
 *     {@link #lineHeight()} = ceil(1.6 x fontSize) pixels.
 */
public record ContactSheetStyle(int thumbSize, int perLine, int gap, int margin, int fontSize) {

  public static final ContactSheetStyle DEFAULT = new ContactSheetStyle(160, 6, 56, 16, 13);

  public ContactSheetStyle {
    if (thumbSize < 16 || thumbSize > 1024) {
      throw new IllegalArgumentException("thumbSize must be in 16..1024, got " + thumbSize);
    }
    if (perLine < 1) {
      throw new IllegalArgumentException("perLine must be >= 1, got " + perLine);
    }
    if (gap < 24) {
      throw new IllegalArgumentException("gap must be >= 24 (room for the step score), got " + gap);
    }
    if (margin < 0) {
      throw new IllegalArgumentException("margin must be >= 0, got " + margin);
    }
    if (fontSize < 6 || fontSize > 48) {
      throw new IllegalArgumentException("fontSize must be in 6..48, got " + fontSize);
    }
  }

  /** Height of one line of text: ceil(1.6 x fontSize). */
  public int lineHeight() {
    return (int) Math.ceil(fontSize * 1.6);
  }
}
