package org.morphscout.indexer.ingest;

import java.io.ByteArrayOutputStream;
import java.util.Arrays;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The few facts of a JPEG's header the fast decoder needs, read from its markers up to the first scan (ITU-T T.81,
 * annex B): frame size and components from the start-of-frame marker, the embedded ICC profile (APP2
 * {@code ICC_PROFILE}, ICC.1 annex B.4) and whether an Adobe colour-transform marker (APP14 {@code Adobe}) is present.
 *
 * @param width samples per line
 * @param height lines
 * @param components colour components (1 grey, 3 YCbCr or RGB, 4 CMYK or YCCK)
 * @param profileChunks how many APP2 {@code ICC_PROFILE} markers the file has (0: no embedded profile)
 * @param profile the embedded profile's bytes, its chunks joined in sequence order; empty when there is none or when
 *     the chunks do not make one whole profile (a chunk missing, repeated or numbered beyond the count they give)
 * @param adobeTransform the colour transform of the Adobe APP14 marker (0 none: RGB or CMYK as stored, 1 YCbCr, 2 YCCK),
 *     or -1 when the file has no such marker (Adobe's technical note 5116, as libjpeg reads it; from memory)
 */
record JpegHeader(int width, int height, int components, int profileChunks, Optional<byte[]> profile,
    int adobeTransform) {
  private static final String ICC_SIGNATURE = "ICC_PROFILE\0";

  /** Whether the file has an Adobe APP14 marker (common with CMYK and YCCK, and in files Adobe's tools save). */
  boolean adobe() {
    return adobeTransform >= 0;
  }

  /** Whether the file embeds an ICC profile (readable or not). */
  boolean iccProfile() {
    return profileChunks > 0;
  }

  /** The header of a JPEG file's bytes; empty when the markers before the first scan cannot be read. */
  static Optional<JpegHeader> read(byte[] b) {
    if (b.length < 4 || (b[0] & 0xff) != 0xFF || (b[1] & 0xff) != 0xD8) {
      return Optional.empty();
    }
    int i = 2;
    Chunks icc = new Chunks();
    int adobe = -1;
    int width = -1;
    int height = -1;
    int components = -1;
    while (i + 3 < b.length) {
      if ((b[i] & 0xff) != 0xFF) {
        return Optional.empty();
      }
      int marker = b[i + 1] & 0xff;
      if (marker == 0xFF) { // fill byte
        i++;
        continue;
      }
      if (marker == 0x01 || (marker >= 0xD0 && marker <= 0xD7)) { // no length
        i += 2;
        continue;
      }
      if (marker == 0xD9) {
        break;
      }
      int length = ((b[i + 2] & 0xff) << 8) | (b[i + 3] & 0xff);
      int body = i + 4;
      if (length < 2 || body + length - 2 > b.length) {
        return Optional.empty();
      }
      if (marker == 0xE2 && startsWith(b, body, ICC_SIGNATURE)) {
        icc.add(b, body + ICC_SIGNATURE.length(), body + length - 2);
      } else if (marker == 0xEE && startsWith(b, body, "Adobe")) {
        // "Adobe", version (2 bytes), flags0 (2), flags1 (2), transform (1)
        adobe = length >= 2 + 12 ? b[body + 11] & 0xff : 0;
      } else if (marker >= 0xC0 && marker <= 0xCF && marker != 0xC4 && marker != 0xC8 && marker != 0xCC
          && length >= 8) {
        height = ((b[body + 1] & 0xff) << 8) | (b[body + 2] & 0xff);
        width = ((b[body + 3] & 0xff) << 8) | (b[body + 4] & 0xff);
        components = b[body + 5] & 0xff;
      } else if (marker == 0xDA) { // start of scan: the header is over
        break;
      }
      i += 2 + length;
    }
    if (width <= 0 || height <= 0 || components <= 0) {
      return Optional.empty();
    }
    return Optional.of(new JpegHeader(width, height, components, icc.markers, icc.joined(), adobe));
  }

  /**
   * The APP2 profile chunks as they come: each starts with its sequence number (from 1) and the number of chunks, then
   * its share of the profile (ICC.1 annex B.4). Writers may put them in any order.
   */
  private static final class Chunks {
    private final TreeMap<Integer, byte[]> bySequence = new TreeMap<>();
    private int markers;
    private int count = -1;
    private boolean broken;

    void add(byte[] b, int from, int end) {
      markers++;
      if (end - from < 2) {
        broken = true;
        return;
      }
      int sequence = b[from] & 0xff;
      int total = b[from + 1] & 0xff;
      if (sequence < 1 || sequence > total || (count >= 0 && total != count) || bySequence.containsKey(sequence)) {
        broken = true;
        return;
      }
      count = total;
      bySequence.put(sequence, Arrays.copyOfRange(b, from + 2, end));
    }

    Optional<byte[]> joined() {
      if (markers == 0 || broken || bySequence.size() != count) {
        return Optional.empty();
      }
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      bySequence.values().forEach(out::writeBytes);
      return Optional.of(out.toByteArray());
    }
  }

  private static boolean startsWith(byte[] b, int at, String ascii) {
    if (at + ascii.length() > b.length) {
      return false;
    }
    for (int k = 0; k < ascii.length(); k++) {
      if (b[at + k] != (byte) ascii.charAt(k)) {
        return false;
      }
    }
    return true;
  }
}
