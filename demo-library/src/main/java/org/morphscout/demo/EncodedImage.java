package org.morphscout.demo;

import java.awt.image.BufferedImage;
import java.util.Objects;

/**
 * A picture as a file would hold it: the encoded bytes and the pixels decoded back from them.
 *
 * @param label readable id, e.g. {@code original} or {@code resized-0.75}
 * @param image pixels decoded from {@code bytes}
 * @param bytes the encoded file content (JPEG or PNG)
 * @param format {@code jpeg} or {@code png}
 * @param edit what was done to the original, e.g. {@code resize 0.75, jpeg q0.80}; {@code none} for the original
 */
public record EncodedImage(String label, BufferedImage image, byte[] bytes, String format, String edit) {
  public EncodedImage {
    Objects.requireNonNull(label, "label");
    Objects.requireNonNull(image, "image");
    Objects.requireNonNull(bytes, "bytes");
    Objects.requireNonNull(format, "format");
    Objects.requireNonNull(edit, "edit");
  }

  /** The encoded bytes (a copy). */
  @Override
  public byte[] bytes() {
    return bytes.clone();
  }
}
