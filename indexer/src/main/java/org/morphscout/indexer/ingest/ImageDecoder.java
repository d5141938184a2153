package org.morphscout.indexer.ingest;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Turns one image file into a {@link DecodedImage}: small sRGB analysis picture, orientation applied.
 *
 * <p>Implementations must be safe to call from several threads at once.
 */
public interface ImageDecoder {

  /**
   * Decodes {@code file}.
   *
   * @throws ImageReadException when this file cannot be decoded (empty, not an image, unsupported, truncated, too
   *     large, vanished, decoder error); its {@link ImageReadException#reason()} says why
   * @throws IOException when the machine fails (disk error) rather than the file
   */
  DecodedImage decode(Path file) throws IOException;
}
