package org.morphscout.indexer.silhouette;

import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.zip.GZIPInputStream;

/**
 * A minimal reader for gzip-compressed tar archives (npm package tarballs), enough to copy one regular file out.
 *
 * <p>Tar layout (POSIX.1-1988 ustar, common practice): each entry is a 512-byte header (name at bytes 0..100, size
 * as octal text at 124..136, type flag at 156, "ustar" magic at 257 and a name prefix at 345..500) followed by the
 * data padded to a multiple of 512 bytes; the archive ends with zero blocks. GNU base-256 sizes (high bit of byte
 * 124 set) are read too. PAX and GNU long-name records are skipped like any other entry, which is enough for the
 * short names in npm tarballs. Thread-safe (stateless).
 */
final class TarGzEntries {
  static final int BLOCK = 512;

  private TarGzEntries() {}

  /**
   * Copies the regular file named {@code entryName} (for example {@code package/dist/u2netp.onnx}) to {@code out}.
   *
   * @return true when the entry was found and copied, false when the archive has no such file
   * @throws IOException when the stream is not gzip, or the archive is truncated or malformed
   */
  static boolean copyEntry(InputStream gzipped, String entryName, OutputStream out) throws IOException {
    InputStream in = new GZIPInputStream(gzipped, 1 << 16);
    byte[] header = new byte[BLOCK];
    byte[] buf = new byte[1 << 16];
    while (true) {
      if (!readFully(in, header)) {
        return false; // end of stream without the end-of-archive blocks: tolerated, nothing more to find
      }
      if (isZero(header)) {
        return false;
      }
      String name = text(header, 0, 100);
      if (text(header, 257, 5).equals("ustar")) {
        String prefix = text(header, 345, 155);
        if (!prefix.isEmpty()) {
          name = prefix + "/" + name;
        }
      }
      long size = size(header);
      char type = (char) header[156];
      boolean regular = type == '0' || type == 0;
      long padded = (size + BLOCK - 1) / BLOCK * BLOCK;
      if (regular && name.equals(entryName)) {
        long left = size;
        while (left > 0) {
          int n = in.read(buf, 0, (int) Math.min(buf.length, left));
          if (n < 0) {
            throw new EOFException("tar entry " + entryName + " is truncated");
          }
          out.write(buf, 0, n);
          left -= n;
        }
        return true;
      }
      skipFully(in, padded);
    }
  }

  private static long size(byte[] h) throws IOException {
    if ((h[124] & 0x80) != 0) {
      long v = h[124] & 0x7f;
      for (int i = 125; i < 136; i++) {
        v = (v << 8) | (h[i] & 0xff);
      }
      return v;
    }
    String s = text(h, 124, 12).trim();
    if (s.isEmpty()) {
      return 0;
    }
    try {
      return Long.parseLong(s, 8);
    } catch (NumberFormatException e) {
      throw new IOException("malformed tar header: size field '" + s + "' is not octal", e);
    }
  }

  /** NUL-terminated ASCII text of a header field. */
  private static String text(byte[] h, int off, int len) {
    int end = off;
    while (end < off + len && h[end] != 0) {
      end++;
    }
    return new String(h, off, end - off, StandardCharsets.US_ASCII);
  }

  private static boolean isZero(byte[] b) {
    for (byte x : b) {
      if (x != 0) {
        return false;
      }
    }
    return true;
  }

  /** Reads a whole block; false at a clean end of stream, EOFException in the middle of one. */
  private static boolean readFully(InputStream in, byte[] b) throws IOException {
    int off = 0;
    while (off < b.length) {
      int n = in.read(b, off, b.length - off);
      if (n < 0) {
        if (off == 0) {
          return false;
        }
        throw new EOFException("tar archive ends inside a header");
      }
      off += n;
    }
    return true;
  }

  private static void skipFully(InputStream in, long n) throws IOException {
    long left = n;
    while (left > 0) {
      long s = in.skip(left);
      if (s <= 0) {
        if (in.read() < 0) {
          throw new EOFException("tar archive is truncated");
        }
        s = 1;
      }
      left -= s;
    }
  }
}
