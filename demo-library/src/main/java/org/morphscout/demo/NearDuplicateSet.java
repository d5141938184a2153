package org.morphscout.demo;

import java.util.List;

/**
 * An original picture, copies of it that a duplicate finder should match (resized, recompressed, lightly cropped
 * and brightened, re-saved as PNG), and unrelated pictures of similar subjects that it should not match.
 *
 * @param original the original, JPEG quality 0.92
 * @param copies near-duplicates of the original
 * @param unrelated different vessels on the same kind of backdrop
 */
public record NearDuplicateSet(EncodedImage original, List<EncodedImage> copies, List<EncodedImage> unrelated) {
  public NearDuplicateSet {
    copies = List.copyOf(copies);
    unrelated = List.copyOf(unrelated);
  }
}
