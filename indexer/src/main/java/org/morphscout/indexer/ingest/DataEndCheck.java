package org.morphscout.indexer.ingest;

import java.io.BufferedInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Walks a file's container structure (without decoding pixels) to tell whether the data reaches its end marker.
 * Decoders are lenient with truncated files (they fill the missing part with grey and at most warn), which would
 * feed a half-grey picture to analysis; this check makes truncation a clear failure. Thread-safe (no state).
 */
final class DataEndCheck {

  /** What the walk found. */
  enum Completeness {
    COMPLETE,
    TRUNCATED,
    /** The structure could not be followed; leave the judgement to the decoder. */
    UNKNOWN
  }

  private DataEndCheck() {}

  static Completeness check(Path file, FileFormat format) throws IOException {
    return switch (format) {
      case JPEG -> jpeg(file);
      case PNG -> png(file);
      case WEBP -> riff(file);
      default -> Completeness.UNKNOWN;
    };
  }

  /**
   * ITU-T T.81 Annex B: SOI, then marker segments (FF xx + 2-byte length including itself); after each SOS
   * the entropy-coded data runs until the next marker, where a data byte FF is stuffed as FF 00 (B.1.1.5) and
   * RST0..RST7 (FFD0..FFD7) may occur; FF fill bytes may precede any marker (B.1.1.2). The image is complete when
   * EOI (FFD9) is reached. Data appended after EOI (for example a phone's embedded video) is not looked at, and
   * an embedded EXIF thumbnail's EOI is skipped as part of its APP1 segment.
   */
  static Completeness jpeg(Path file) throws IOException {
    try (FastReader in = new FastReader(Files.newInputStream(file))) {
      if (in.read() != 0xFF || in.read() != 0xD8) {
        return Completeness.UNKNOWN;
      }
      int marker = nextMarker(in);
      while (true) {
        if (marker < 0) {
          return Completeness.TRUNCATED;
        }
        if (marker == 0xD9) {
          return Completeness.COMPLETE;
        }
        if ((marker >= 0xD0 && marker <= 0xD7) || marker == 0x01) {
          marker = nextMarker(in); // standalone markers: no length
          continue;
        }
        int hi = in.read();
        int lo = in.read();
        if (lo < 0) {
          return Completeness.TRUNCATED;
        }
        int length = hi << 8 | lo;
        if (length < 2) {
          return Completeness.UNKNOWN;
        }
        in.skipNBytes(length - 2);
        marker = marker == 0xDA ? afterEntropyData(in) : nextMarker(in);
      }
    } catch (NotAMarker e) {
      return Completeness.UNKNOWN;
    } catch (EOFException e) {
      return Completeness.TRUNCATED;
    }
  }

  /** Reads FF (fill FFs) xx; returns xx, or -1 at end of file; throws {@link NotAMarker} on other bytes. */
  private static int nextMarker(FastReader in) throws IOException {
    int b = in.read();
    if (b < 0) {
      return -1;
    }
    if (b != 0xFF) {
      throw new NotAMarker();
    }
    do {
      b = in.read();
    } while (b == 0xFF);
    return b;
  }

  /** The structure is malformed where a marker was expected. */
  private static final class NotAMarker extends IOException {
    private static final long serialVersionUID = 1L;
  }

  /** Skips entropy-coded bytes; returns the marker that ends them, or -1 at end of file. */
  private static int afterEntropyData(FastReader in) throws IOException {
    int b;
    while ((b = in.skipToFF()) >= 0) {
      do {
        b = in.read();
      } while (b == 0xFF);
      if (b < 0) {
        return -1;
      }
      if (b == 0x00 || (b >= 0xD0 && b <= 0xD7)) {
        continue; // stuffed FF or restart marker: still entropy-coded data
      }
      return b;
    }
    return -1;
  }

  /**
   * Unsynchronised buffered byte reader: {@link BufferedInputStream#read()} takes a lock per byte, which made this
   * walk run at about 20 MB/s; scanning a plain array is an order of magnitude faster.
   */
  private static final class FastReader implements AutoCloseable {
    private final InputStream in;
    private final byte[] buf = new byte[1 << 16];
    private int pos;
    private int end;

    FastReader(InputStream in) {
      this.in = in;
    }

    private boolean fill() throws IOException {
      end = in.read(buf);
      pos = 0;
      return end > 0;
    }

    int read() throws IOException {
      if (pos >= end && !fill()) {
        return -1;
      }
      return buf[pos++] & 0xFF;
    }

    /** Skips bytes up to and including the next 0xFF; returns 0xFF, or -1 at end of data. */
    int skipToFF() throws IOException {
      while (true) {
        for (int i = pos; i < end; i++) {
          if (buf[i] == (byte) 0xFF) {
            pos = i + 1;
            return 0xFF;
          }
        }
        if (!fill()) {
          return -1;
        }
      }
    }

    void skipNBytes(long n) throws IOException {
      long left = n;
      int inBuffer = Math.min(end - pos, (int) Math.min(Integer.MAX_VALUE, left));
      pos += inBuffer;
      left -= inBuffer;
      if (left > 0) {
        in.skipNBytes(left); // throws EOFException when the data ends first
      }
    }

    @Override
    public void close() throws IOException {
      in.close();
    }
  }

  /**
   * ISO/IEC 15948 section 5: signature, then chunks of 4-byte length, 4-byte type, data and 4-byte CRC; the
   * datastream ends with IEND.
   */
  static Completeness png(Path file) throws IOException {
    try (InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16)) {
      in.skipNBytes(8);
      byte[] hdr = new byte[8];
      while (true) {
        if (in.readNBytes(hdr, 0, 8) < 8) {
          return Completeness.TRUNCATED;
        }
        long length = ((hdr[0] & 0xFFL) << 24) | ((hdr[1] & 0xFF) << 16) | ((hdr[2] & 0xFF) << 8) | (hdr[3] & 0xFF);
        if (length > Integer.MAX_VALUE) {
          return Completeness.UNKNOWN; // section 5.3: length is at most 2^31 - 1
        }
        if (hdr[4] == 'I' && hdr[5] == 'E' && hdr[6] == 'N' && hdr[7] == 'D') {
          return Completeness.COMPLETE;
        }
        in.skipNBytes(length + 4);
      }
    } catch (EOFException e) {
      return Completeness.TRUNCATED;
    }
  }

  /**
   * GIF89a specification section 27: the data stream ends with the Trailer byte 0x3B. Only consulted after the
   * decoder failed (a valid GIF may be followed by junk, so a missing trailer alone does not condemn a file).
   */
  static boolean gifHasTrailer(Path file) throws IOException {
    try (java.nio.channels.SeekableByteChannel ch = Files.newByteChannel(file)) {
      long size = ch.size();
      if (size == 0) {
        return false;
      }
      java.nio.ByteBuffer last = java.nio.ByteBuffer.allocate(1);
      ch.position(size - 1);
      ch.read(last);
      return last.get(0) == 0x3B;
    }
  }

  /** RFC 9649 section 2.5: the RIFF header's size field counts the bytes after it; a shorter file is truncated. */
  static Completeness riff(Path file) throws IOException {
    long size = Files.size(file);
    try (InputStream in = Files.newInputStream(file)) {
      byte[] h = in.readNBytes(8);
      if (h.length < 8) {
        return Completeness.TRUNCATED;
      }
      long declared = (h[4] & 0xFFL) | (h[5] & 0xFFL) << 8 | (h[6] & 0xFFL) << 16 | (h[7] & 0xFFL) << 24;
      return size < declared + 8 ? Completeness.TRUNCATED : Completeness.COMPLETE;
    }
  }
}
