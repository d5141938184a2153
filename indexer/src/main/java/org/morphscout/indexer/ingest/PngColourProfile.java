package org.morphscout.indexer.ingest;

import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_ColorSpace;
import java.awt.color.ICC_Profile;
import java.awt.image.BufferedImage;
import java.awt.image.ColorConvertOp;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.WritableRaster;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Optional;
import java.util.zip.DataFormatException;
import java.util.zip.Inflater;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.w3c.dom.Node;

/**
 * Honours a PNG's embedded ICC profile (iCCP chunk, ISO/IEC 15948 section 11.3.3.3), which the JDK's PNG reader
 * reads into its metadata but does not apply. Only RGB profiles are applied; grey profiles are left to the
 * sRGB-like treatment of {@link SrgbConverter}. Thread-safe (no state).
 */
final class PngColourProfile {
  private static final Logger LOG = LoggerFactory.getLogger(PngColourProfile.class);
  /** Largest inflated profile accepted; real profiles are a few kB to ~1 MB (guards against zip bombs). */
  private static final int MAX_PROFILE_BYTES = 16 << 20;
  private static final String NATIVE_FORMAT = "javax_imageio_png_1.0";

  private PngColourProfile() {}

  /** The RGB profile embedded in the PNG the reader is positioned on, when there is a usable one. */
  static Optional<ICC_Profile> embeddedRgbProfile(ImageReader reader) {
    try {
      IIOMetadata meta = reader.getImageMetadata(0);
      if (meta == null || !java.util.Arrays.asList(meta.getMetadataFormatNames()).contains(NATIVE_FORMAT)) {
        return Optional.empty();
      }
      Node root = meta.getAsTree(NATIVE_FORMAT);
      for (Node n = root.getFirstChild(); n != null; n = n.getNextSibling()) {
        if (n.getNodeName().equals("sRGB")) {
          return Optional.empty(); // section 11.3.3.5: sRGB chunk present, the data already is sRGB
        }
      }
      for (Node n = root.getFirstChild(); n != null; n = n.getNextSibling()) {
        if (n.getNodeName().equals("iCCP") && n instanceof IIOMetadataNode node
            && node.getUserObject() instanceof byte[] bytes) {
          ICC_Profile profile = ICC_Profile.getInstance(looksLikeIcc(bytes) ? bytes : inflate(bytes));
          if (profile.getColorSpaceType() != ColorSpace.TYPE_RGB) {
            return Optional.empty();
          }
          return Optional.of(profile);
        }
      }
    } catch (IOException | IllegalArgumentException | DataFormatException e) {
      LOG.warn("Ignoring an unreadable embedded ICC profile ({}); assuming sRGB", e.toString());
    }
    return Optional.empty();
  }

  /**
   * Reinterprets the RGB samples of {@code argb} (which were copied unchanged from the file) in {@code profile}'s
   * colour space and converts them to sRGB; alpha is kept.
   */
  static BufferedImage toSrgb(BufferedImage argb, ICC_Profile profile) {
    int w = argb.getWidth();
    int h = argb.getHeight();
    ComponentColorModel cm = new ComponentColorModel(
        new ICC_ColorSpace(profile), true, false, Transparency.TRANSLUCENT, DataBuffer.TYPE_BYTE);
    WritableRaster raster = cm.createCompatibleWritableRaster(w, h);
    int[] row = new int[w];
    int[] px = new int[4];
    for (int y = 0; y < h; y++) {
      argb.getRGB(0, y, w, 1, row, 0, w);
      for (int x = 0; x < w; x++) {
        int p = row[x];
        px[0] = (p >> 16) & 0xFF;
        px[1] = (p >> 8) & 0xFF;
        px[2] = p & 0xFF;
        px[3] = p >>> 24;
        raster.setPixel(x, y, px);
      }
    }
    BufferedImage tagged = new BufferedImage(cm, raster, false, null);
    BufferedImage out = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
    new ColorConvertOp(null).filter(tagged, out);
    return out;
  }

  /** ICC.1:2010 section 7.2.9: the profile file signature "acsp" at byte offset 36. */
  private static boolean looksLikeIcc(byte[] b) {
    return b.length > 40 && b[36] == 'a' && b[37] == 'c' && b[38] == 's' && b[39] == 'p';
  }

  private static byte[] inflate(byte[] compressed) throws DataFormatException {
    Inflater inflater = new Inflater();
    try {
      inflater.setInput(compressed);
      ByteArrayOutputStream out = new ByteArrayOutputStream();
      byte[] buf = new byte[8192];
      while (!inflater.finished()) {
        int n = inflater.inflate(buf);
        if (n == 0 && (inflater.needsInput() || inflater.needsDictionary())) {
          throw new DataFormatException("incomplete compressed ICC profile");
        }
        out.write(buf, 0, n);
        if (out.size() > MAX_PROFILE_BYTES) {
          throw new DataFormatException("ICC profile larger than " + MAX_PROFILE_BYTES + " bytes");
        }
      }
      return out.toByteArray();
    } finally {
      inflater.end();
    }
  }
}
