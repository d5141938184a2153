package org.morphscout.indexer.ingest;

/**
 * What a file's first bytes say it is.
 *
 * <p>{@link #label()} is the short upper-case name used in messages ({@code "unsupported format (HEIC)"});
 * {@link #formatName()} is the lower-case name stored in {@link DecodedImage#format()} and understood by ImageIO.
 */
public enum FileFormat {
  JPEG("jpeg", "JPEG", true),
  PNG("png", "PNG", true),
  GIF("gif", "GIF", true),
  BMP("bmp", "BMP", true),
  TIFF("tiff", "TIFF", true),
  WEBP("webp", "WebP", true),
  HEIC("heic", "HEIC", false),
  HEIF("heif", "HEIF", false),
  AVIF("avif", "AVIF", false),
  JPEG_XL("jxl", "JPEG XL", false),
  /** Camera raw formats; the file extension or magic names the maker's variant in messages. */
  CAMERA_RAW("raw", "camera raw", false),
  UNKNOWN("unknown", "unknown", false);

  private final String formatName;
  private final String label;
  private final boolean decodable;

  FileFormat(String formatName, String label, boolean decodable) {
    this.formatName = formatName;
    this.label = label;
    this.decodable = decodable;
  }

  /** Lower-case name, also the ImageIO format name for decodable formats. */
  public String formatName() {
    return formatName;
  }

  /** Short name for messages. */
  public String label() {
    return label;
  }

  /** Whether {@link ImageIoDecoder} decodes this format. */
  public boolean decodable() {
    return decodable;
  }
}
