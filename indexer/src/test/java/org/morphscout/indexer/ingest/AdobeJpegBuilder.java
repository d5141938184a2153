package org.morphscout.indexer.ingest;

import java.awt.image.BufferedImage;
import java.awt.image.DataBuffer;
import java.awt.image.Raster;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Iterator;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes 4-component Adobe JPEGs (CMYK or YCCK) with the JDK's JPEG writer, which stores a {@link Raster}'s samples
 * as they are and takes the frame layout and the APP14 "Adobe" marker from the metadata we give it.
 *
 * <p>Conventions (Adobe Technical Note 5116, "Supporting the DCT Filters in PostScript Level 2", section 18, and
 * libjpeg's jccolor.c, from memory): Adobe applications store CMYK inverted (sample = 255 - ink). APP14 transform 0
 * means the four samples are stored as is; transform 2 (YCCK) means the first three inverted samples, taken as
 * R = 255 - C', G = 255 - M', B = 255 - Y' (i.e. the ink amounts), were converted to YCbCr with the JFIF equations
 * (JFIF 1.02 / ITU-R BT.601 full range), and K' is stored as is.
 */
final class AdobeJpegBuilder {
  private static final String FORMAT = "javax_imageio_jpeg_image_1.0";

  private AdobeJpegBuilder() {}

  /**
   * @param inks row-major {C, M, Y, K} ink amounts 0..255 per pixel
   * @param ycck whether to store YCCK (transform 2) instead of plain CMYK (transform 0)
   */
  static byte[] build(int width, int height, int[][] inks, boolean ycck) throws IOException {
    WritableRaster r = Raster.createInterleavedRaster(DataBuffer.TYPE_BYTE, width, height, 4, null);
    for (int i = 0; i < width * height; i++) {
      int[] k = inks[i];
      int[] stored;
      if (ycck) {
        double c = k[0];
        double m = k[1];
        double y = k[2];
        stored = new int[] {
          clamp(0.299 * c + 0.587 * m + 0.114 * y),
          clamp(-0.168736 * c - 0.331264 * m + 0.5 * y + 128),
          clamp(0.5 * c - 0.418688 * m - 0.081312 * y + 128),
          255 - k[3]
        };
      } else {
        stored = new int[] {255 - k[0], 255 - k[1], 255 - k[2], 255 - k[3]};
      }
      r.setPixel(i % width, i / width, stored);
    }
    ImageWriter writer = jdkWriter();
    ImageWriteParam param = writer.getDefaultWriteParam();
    param.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
    param.setCompressionQuality(0.95f);
    IIOMetadata meta = writer.getDefaultImageMetadata(
        ImageTypeSpecifier.createFromBufferedImageType(BufferedImage.TYPE_3BYTE_BGR), param);
    IIOMetadataNode root = (IIOMetadataNode) meta.getAsTree(FORMAT);
    IIOMetadataNode variety = (IIOMetadataNode) root.getElementsByTagName("JPEGvariety").item(0);
    while (variety.hasChildNodes()) {
      variety.removeChild(variety.getFirstChild()); // no JFIF APP0: JFIF allows only 1 or 3 components
    }
    IIOMetadataNode seq = (IIOMetadataNode) root.getElementsByTagName("markerSequence").item(0);
    IIOMetadataNode adobe = new IIOMetadataNode("app14Adobe");
    adobe.setAttribute("version", "101");
    adobe.setAttribute("flags0", "0");
    adobe.setAttribute("flags1", "0");
    adobe.setAttribute("transform", ycck ? "2" : "0");
    seq.insertBefore(adobe, seq.getFirstChild());
    IIOMetadataNode sof = (IIOMetadataNode) root.getElementsByTagName("sof").item(0);
    sof.setAttribute("numFrameComponents", "4");
    for (int i = 0; i < 3; i++) {
      IIOMetadataNode c = (IIOMetadataNode) sof.getElementsByTagName("componentSpec").item(i);
      c.setAttribute("HsamplingFactor", "1");
      c.setAttribute("VsamplingFactor", "1");
    }
    IIOMetadataNode fourth = new IIOMetadataNode("componentSpec"); // IIOMetadataNode.cloneNode drops attributes
    fourth.setAttribute("componentId", "4");
    fourth.setAttribute("HsamplingFactor", "1");
    fourth.setAttribute("VsamplingFactor", "1");
    fourth.setAttribute("QtableSelector", "0");
    sof.appendChild(fourth);
    IIOMetadataNode sos = (IIOMetadataNode) root.getElementsByTagName("sos").item(0);
    sos.setAttribute("numScanComponents", "4");
    IIOMetadataNode scan4 = new IIOMetadataNode("scanComponentSpec");
    scan4.setAttribute("componentSelector", "4");
    scan4.setAttribute("dcHuffTable", "0");
    scan4.setAttribute("acHuffTable", "0");
    sos.appendChild(scan4);
    meta.setFromTree(FORMAT, root);

    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      writer.write(null, new IIOImage(r, null, meta), param);
    } finally {
      writer.dispose();
    }
    return out.toByteArray();
  }

  /** The JDK's own writer (class com.sun.imageio.plugins.jpeg.JPEGImageWriter), found by name, not linked. */
  private static ImageWriter jdkWriter() throws IOException {
    for (Iterator<ImageWriter> it = ImageIO.getImageWritersByFormatName("jpeg"); it.hasNext(); ) {
      ImageWriter w = it.next();
      if (w.getClass().getName().equals("com.sun.imageio.plugins.jpeg.JPEGImageWriter")) {
        return w;
      }
    }
    throw new IOException("the JDK JPEG writer is not available");
  }

  private static int clamp(double v) {
    return (int) Math.max(0, Math.min(255, Math.round(v)));
  }
}
