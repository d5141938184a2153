package org.morphscout.indexer.ingest;

import com.drew.imaging.ImageMetadataReader;
import com.drew.metadata.Metadata;
import com.drew.metadata.exif.ExifIFD0Directory;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Reads the EXIF Orientation tag (0x0112, CIPA DC-008-2019 Exif 2.32; also TIFF 6.0 tag 274) with
 * metadata-extractor. Broken or missing metadata is tolerated: the problem is logged and 1 (normal) returned,
 * because a picture shown sideways is better than no picture. Thread-safe.
 */
final class ExifOrientationReader {
  private static final Logger LOG = LoggerFactory.getLogger(ExifOrientationReader.class);

  private ExifOrientationReader() {}

  /** The orientation tag of {@code file}, 1..8; 1 when absent, unreadable or out of range. */
  static int read(Path file) throws NoSuchFileException {
    try {
      Metadata metadata = ImageMetadataReader.readMetadata(file.toFile());
      for (ExifIFD0Directory dir : metadata.getDirectoriesOfType(ExifIFD0Directory.class)) {
        if (dir.containsTag(ExifIFD0Directory.TAG_ORIENTATION)) {
          Integer value = dir.getInteger(ExifIFD0Directory.TAG_ORIENTATION);
          if (value != null && value >= 1 && value <= 8) {
            return value;
          }
          LOG.warn("{}: EXIF orientation {} is outside 1..8; using 1 (normal)", file, value);
          return 1;
        }
      }
      return 1;
    } catch (java.io.FileNotFoundException e) {
      throw new NoSuchFileException(file.toString());
    } catch (Exception | StackOverflowError e) {
      // metadata-extractor may throw anything on hostile data (deep IFD chains included); the pixels may still be
      // fine, so carry on upright.
      LOG.warn("{}: unreadable EXIF metadata ({}); using orientation 1 (normal)", file, e.toString());
      return 1;
    }
  }
}
