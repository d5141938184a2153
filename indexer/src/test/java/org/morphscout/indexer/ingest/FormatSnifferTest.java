package org.morphscout.indexer.ingest;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** Magic numbers, each from the format's specification cited in {@link FormatSniffer}. */
class FormatSnifferTest {

  private static FileFormat sniff(byte[] head, String name) {
    return FormatSniffer.sniff(head, name).format();
  }

  private static byte[] ascii(String s) {
    return s.getBytes(StandardCharsets.ISO_8859_1);
  }

  private static byte[] ftyp(String major, String... compatible) {
    ByteArrayOutputStream b = new ByteArrayOutputStream();
    int size = 16 + 4 * compatible.length;
    b.writeBytes(new byte[] {0, 0, 0, (byte) size});
    b.writeBytes(ascii("ftyp" + major));
    b.writeBytes(new byte[4]);
    for (String c : compatible) {
      b.writeBytes(ascii(c));
    }
    return b.toByteArray();
  }

  @Test
  void decodableFormats() {
    assertThat(sniff(new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, (byte) 0xE1}, "a.jpg"))
        .isEqualTo(FileFormat.JPEG);
    assertThat(sniff(TestImages.PNG_SIGNATURE, "a.png")).isEqualTo(FileFormat.PNG);
    assertThat(sniff(ascii("GIF89a\1\0\1\0"), "a.gif")).isEqualTo(FileFormat.GIF);
    assertThat(sniff(ascii("GIF87a\1\0\1\0"), "a.gif")).isEqualTo(FileFormat.GIF);
    assertThat(sniff(ascii("RIFF\0\0\0\0WEBPVP8 "), "a.webp")).isEqualTo(FileFormat.WEBP);
    assertThat(sniff(new byte[] {'I', 'I', 42, 0, 8, 0, 0, 0}, "a.tif")).isEqualTo(FileFormat.TIFF);
    assertThat(sniff(new byte[] {'M', 'M', 0, 42, 0, 0, 0, 8}, "a.tiff")).isEqualTo(FileFormat.TIFF);
    byte[] bmp = new byte[54];
    bmp[0] = 'B';
    bmp[1] = 'M';
    bmp[14] = 40; // BITMAPINFOHEADER
    assertThat(sniff(bmp, "a.bmp")).isEqualTo(FileFormat.BMP);
  }

  @Test
  void nameDoesNotMatterForRealFormats() {
    assertThat(sniff(TestImages.PNG_SIGNATURE, "photo.jpg")).isEqualTo(FileFormat.PNG);
  }

  @Test
  void heifFamily() {
    assertThat(sniff(ftyp("heic", "mif1", "heic"), "a.heic")).isEqualTo(FileFormat.HEIC);
    assertThat(sniff(ftyp("mif1", "mif1", "heic"), "a.heic")).isEqualTo(FileFormat.HEIC);
    assertThat(sniff(ftyp("mif1", "mif1"), "a.heif")).isEqualTo(FileFormat.HEIF);
    assertThat(sniff(ftyp("avif", "mif1", "avif"), "a.avif")).isEqualTo(FileFormat.AVIF);
    assertThat(sniff(ftyp("mif1", "mif1", "avif"), "a.avif")).isEqualTo(FileFormat.AVIF);
    FormatSniffer.Sniffed cr3 = FormatSniffer.sniff(ftyp("crx ", "crx "), "a.cr3");
    assertThat(cr3.format()).isEqualTo(FileFormat.CAMERA_RAW);
    assertThat(cr3.label()).isEqualTo("camera raw CR3");
    // An MP4 video is not an image.
    assertThat(sniff(ftyp("isom", "isom", "mp41"), "clip.jpg")).isEqualTo(FileFormat.UNKNOWN);
  }

  @Test
  void cameraRaw() {
    byte[] cr2 = {'I', 'I', 42, 0, 16, 0, 0, 0, 'C', 'R', 2, 0};
    assertThat(FormatSniffer.sniff(cr2, "IMG_1.CR2").label()).isEqualTo("camera raw CR2");
    assertThat(FormatSniffer.sniff(ascii("FUJIFILMCCD-RAW 0201"), "x.raf").label()).isEqualTo("camera raw RAF");
    assertThat(FormatSniffer.sniff(ascii("IIRO\10\0\0\0"), "x.orf").label()).isEqualTo("camera raw ORF");
    assertThat(FormatSniffer.sniff(new byte[] {'I', 'I', 'U', 0, 8, 0, 0, 0}, "x.rw2").label())
        .isEqualTo("camera raw RW2");
    byte[] tiffHeader = {'I', 'I', 42, 0, 8, 0, 0, 0};
    assertThat(FormatSniffer.sniff(tiffHeader, "x.NEF").label()).isEqualTo("camera raw NEF");
    assertThat(FormatSniffer.sniff(tiffHeader, "x.dng").label()).isEqualTo("camera raw DNG");
    assertThat(FormatSniffer.sniff(tiffHeader, "x.arw").label()).isEqualTo("camera raw ARW");
  }

  @Test
  void notImages() {
    assertThat(sniff(new byte[0], "a.jpg")).isEqualTo(FileFormat.UNKNOWN);
    assertThat(sniff(ascii("BMW owners club newsletter, issue 12"), "a.bmp")).isEqualTo(FileFormat.UNKNOWN);
    assertThat(sniff(ascii("%PDF-1.7"), "a.jpg")).isEqualTo(FileFormat.UNKNOWN);
    assertThat(sniff(new byte[] {(byte) 0xFF, (byte) 0xD8}, "a.jpg")).isEqualTo(FileFormat.UNKNOWN);
  }
}
