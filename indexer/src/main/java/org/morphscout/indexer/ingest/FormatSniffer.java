package org.morphscout.indexer.ingest;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Locale;
import java.util.Set;

/**
 * Recognises image formats from their first bytes ("magic numbers"), independent of the file name, so a PNG named
 * {@code .jpg} still decodes and random bytes named {@code .jpg} are reported as "not an image".
 *
 * <p>Pure and thread-safe. Sources for each signature are cited beside it.
 */
public final class FormatSniffer {

  /** How many leading bytes {@link #sniff} looks at; callers should pass at least this many when available. */
  public static final int HEAD_LENGTH = 64;

  /**
   * Raw formats that are TIFF-structured and therefore only told apart from a plain TIFF by the file extension
   * (Nikon NEF/NRW, Sony ARW/SR2/SRF, Adobe DNG, Pentax PEF, Epson ERF, Hasselblad 3FR, Phase One IIQ, Kodak
   * DCR/KDC, Leaf MOS). Common practice: raw converters also dispatch on the extension for these.
   */
  private static final Set<String> TIFF_BASED_RAW_EXTENSIONS =
      Set.of("nef", "nrw", "arw", "sr2", "srf", "dng", "pef", "erf", "3fr", "iiq", "dcr", "kdc", "mos", "cr2");

  private FormatSniffer() {}

  /**
   * The format and, for messages, its name with detail.
   *
   * @param label the phrase used in failure messages, e.g. {@code "HEIC"} or {@code "camera raw NEF"}
   */
  public record Sniffed(FileFormat format, String label) {}

  /**
   * Sniffs {@code head} (the first bytes of the file; shorter arrays are fine).
   *
   * @param fileName the file name, used only to name TIFF-based camera raw variants
   */
  public static Sniffed sniff(byte[] head, String fileName) {
    String ext = extension(fileName);
    // ITU-T T.81 Annex B.1.1.3: SOI marker FFD8 followed by the next marker's FF.
    if (startsWith(head, 0, 0xFF, 0xD8, 0xFF)) {
      return of(FileFormat.JPEG);
    }
    // ISO/IEC 15948 section 5.2: the 8-byte PNG signature.
    if (startsWith(head, 0, 0x89, 'P', 'N', 'G', 0x0D, 0x0A, 0x1A, 0x0A)) {
      return of(FileFormat.PNG);
    }
    // GIF89a specification (CompuServe 1990), section 17: "GIF87a" or "GIF89a".
    if (ascii(head, 0, 6).equals("GIF87a") || ascii(head, 0, 6).equals("GIF89a")) {
      return of(FileFormat.GIF);
    }
    // RFC 9649 section 2.5: "RIFF" <size> "WEBP".
    if (ascii(head, 0, 4).equals("RIFF") && ascii(head, 8, 4).equals("WEBP")) {
      return of(FileFormat.WEBP);
    }
    // Fujifilm RAF starts with this ASCII string (from memory; widely documented by raw decoders).
    if (ascii(head, 0, 15).equals("FUJIFILMCCD-RAW")) {
      return raw("RAF");
    }
    // Minolta MRW: 00 'M' 'R' 'M' (from memory).
    if (startsWith(head, 0, 0x00, 'M', 'R', 'M')) {
      return raw("MRW");
    }
    Sniffed tiffLike = sniffTiffFamily(head, ext);
    if (tiffLike != null) {
      return tiffLike;
    }
    Sniffed isoBmff = sniffIsoBmff(head);
    if (isoBmff != null) {
      return isoBmff;
    }
    // ISO/IEC 18181-2: JPEG XL bare codestream FF 0A, or the container's signature box "JXL ".
    if (startsWith(head, 0, 0xFF, 0x0A) || startsWith(head, 0, 0, 0, 0, 0x0C, 'J', 'X', 'L', ' ')) {
      return of(FileFormat.JPEG_XL);
    }
    // Microsoft BMP: "BM" then, at offset 14, the DIB header size, one of the published header versions
    // (BITMAPCOREHEADER 12, OS/2 16/64, BITMAPINFOHEADER 40, V2 52, V3 56, V4 108, V5 124). Checking the size
    // keeps text files starting with "BM" from passing.
    if (head.length >= 18 && head[0] == 'B' && head[1] == 'M') {
      int dib = le32(head, 14);
      if (dib == 12 || dib == 16 || dib == 40 || dib == 52 || dib == 56 || dib == 64 || dib == 108 || dib == 124) {
        return of(FileFormat.BMP);
      }
    }
    return of(FileFormat.UNKNOWN);
  }

  /** TIFF (TIFF 6.0 section 2: "II*\0" or "MM\0*"), BigTIFF, and the raw formats built on them. */
  private static Sniffed sniffTiffFamily(byte[] head, String ext) {
    // Olympus ORF ("IIRO"/"IIRS"/"MMOR") and Panasonic RW2 ("IIU\0") use TIFF-like headers with another magic
    // (from memory; as documented by dcraw/LibRaw).
    if (startsWith(head, 0, 'I', 'I', 'R', 'O') || startsWith(head, 0, 'I', 'I', 'R', 'S')
        || startsWith(head, 0, 'M', 'M', 'O', 'R')) {
      return raw("ORF");
    }
    if (startsWith(head, 0, 'I', 'I', 'U', 0)) {
      return raw("RW2");
    }
    boolean tiff = startsWith(head, 0, 'I', 'I', 0x2A, 0) || startsWith(head, 0, 'M', 'M', 0, 0x2A);
    boolean bigTiff = startsWith(head, 0, 'I', 'I', 0x2B, 0) || startsWith(head, 0, 'M', 'M', 0, 0x2B);
    if (!tiff && !bigTiff) {
      return null;
    }
    // Canon CR2: TIFF header followed by "CR" and major version 2 at offset 8 (from memory).
    if (startsWith(head, 8, 'C', 'R', 0x02)) {
      return raw("CR2");
    }
    if (TIFF_BASED_RAW_EXTENSIONS.contains(ext)) {
      return raw(ext.toUpperCase(Locale.ROOT));
    }
    return of(FileFormat.TIFF);
  }

  /**
   * ISO/IEC 14496-12 section 4.3: a file starting with an {@code ftyp} box lists a major brand and compatible
   * brands. HEIF brands per ISO/IEC 23008-12 Annex B ({@code mif1}, {@code msf1}, {@code heic}, {@code heix},
   * {@code heim}, {@code heis}, {@code hevc}, {@code hevx}); AVIF per the AV1 Image File Format specification
   * ({@code avif}, {@code avis}); Canon CR3 uses brand {@code crx} (from memory).
   */
  private static Sniffed sniffIsoBmff(byte[] head) {
    if (!ascii(head, 4, 4).equals("ftyp")) {
      return null;
    }
    long boxSize = be32(head, 0) & 0xFFFFFFFFL;
    int end = (int) Math.min(head.length, Math.max(16, boxSize));
    java.util.List<String> brands = new java.util.ArrayList<>();
    brands.add(ascii(head, 8, 4));
    for (int off = 16; off + 4 <= end; off += 4) {
      brands.add(ascii(head, off, 4));
    }
    if (brands.contains("crx ")) {
      return raw("CR3");
    }
    if (brands.contains("avif") || brands.contains("avis")) {
      return of(FileFormat.AVIF);
    }
    for (String b : Arrays.asList("heic", "heix", "heim", "heis", "hevc", "hevx")) {
      if (brands.contains(b)) {
        return of(FileFormat.HEIC);
      }
    }
    if (brands.contains("mif1") || brands.contains("msf1")) {
      return of(FileFormat.HEIF);
    }
    return null; // MP4, QuickTime, ... : not an image
  }

  private static Sniffed of(FileFormat f) {
    return new Sniffed(f, f.label());
  }

  private static Sniffed raw(String variant) {
    return new Sniffed(FileFormat.CAMERA_RAW, "camera raw " + variant);
  }

  static String extension(String fileName) {
    int dot = fileName.lastIndexOf('.');
    return dot < 0 ? "" : fileName.substring(dot + 1).toLowerCase(Locale.ROOT);
  }

  private static boolean startsWith(byte[] b, int off, int... expected) {
    if (b.length < off + expected.length) {
      return false;
    }
    for (int i = 0; i < expected.length; i++) {
      if ((b[off + i] & 0xFF) != expected[i]) {
        return false;
      }
    }
    return true;
  }

  private static String ascii(byte[] b, int off, int len) {
    if (b.length < off + len) {
      return "";
    }
    return new String(b, off, len, StandardCharsets.ISO_8859_1);
  }

  private static int le32(byte[] b, int off) {
    return (b[off] & 0xFF) | (b[off + 1] & 0xFF) << 8 | (b[off + 2] & 0xFF) << 16 | (b[off + 3] & 0xFF) << 24;
  }

  private static int be32(byte[] b, int off) {
    if (b.length < off + 4) {
      return 0;
    }
    return (b[off] & 0xFF) << 24 | (b[off + 1] & 0xFF) << 16 | (b[off + 2] & 0xFF) << 8 | (b[off + 3] & 0xFF);
  }
}
