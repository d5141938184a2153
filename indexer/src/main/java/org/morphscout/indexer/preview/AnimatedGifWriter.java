package org.morphscout.indexer.preview;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes frames as an animated GIF with the JDK's ImageIO GIF writer. Per-frame delays go into each frame's Graphic
 * Control Extension (GIF89a specification, in hundredths of a second); looping uses the NETSCAPE2.0 application
 * extension (sub-block 1 followed by a 16-bit little-endian loop count, 0 meaning forever), written once with the
 * first frame. Frames are flattened onto a background colour first, since GIF has no partial transparency; the
 * writer reduces each frame to a 256-colour palette. Stateless.
 */
public final class AnimatedGifWriter {
  private static final String FORMAT = "javax_imageio_gif_image_1.0";

  private AnimatedGifWriter() {}

  /** Writes to a file with one delay for all frames, looping forever, on a white background. */
  public static void write(List<BufferedImage> frames, int delayMs, Path file) throws IOException {
    try (OutputStream out = Files.newOutputStream(file)) {
      write(frames, java.util.Collections.nCopies(frames.size(), delayMs), 0, Color.WHITE, out);
    }
  }

  /**
   * @param delaysMs one delay per frame in milliseconds (rounded to 10 ms; 0..655350)
   * @param loopCount how many times to repeat, 0 = forever (0..65535)
   * @param background colour that transparent parts of frames are flattened onto
   */
  public static void write(List<BufferedImage> frames, List<Integer> delaysMs, int loopCount, Color background,
      OutputStream out) throws IOException {
    if (frames.isEmpty()) {
      throw new IllegalArgumentException("an animated GIF needs at least one frame");
    }
    if (delaysMs.size() != frames.size()) {
      throw new IllegalArgumentException("one delay per frame expected: " + frames.size() + " frames, "
          + delaysMs.size() + " delays");
    }
    if (loopCount < 0 || loopCount > 0xffff) {
      throw new IllegalArgumentException("GIF loop count must be 0..65535, got " + loopCount);
    }
    Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("gif");
    if (!writers.hasNext()) {
      throw new IOException("this Java runtime has no GIF writer");
    }
    ImageWriter writer = writers.next();
    try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
      writer.setOutput(ios);
      ImageWriteParam param = writer.getDefaultWriteParam();
      writer.prepareWriteSequence(null);
      for (int i = 0; i < frames.size(); i++) {
        BufferedImage rgb = flatten(frames.get(i), background);
        IIOMetadata meta = frameMetadata(writer, param, rgb, delaysMs.get(i), i == 0 ? loopCount : -1);
        writer.writeToSequence(new IIOImage(rgb, null, meta), param);
      }
      writer.endWriteSequence();
    } finally {
      writer.dispose();
    }
  }

  private static IIOMetadata frameMetadata(ImageWriter writer, ImageWriteParam param, BufferedImage img,
      int delayMs, int loopCount) throws IOException {
    if (delayMs < 0 || delayMs > 655_350) {
      throw new IllegalArgumentException("GIF frame delay must be 0..655350 ms, got " + delayMs);
    }
    IIOMetadata meta = writer.getDefaultImageMetadata(new ImageTypeSpecifier(img), param);
    IIOMetadataNode root = (IIOMetadataNode) meta.getAsTree(FORMAT);
    IIOMetadataNode gce = child(root, "GraphicControlExtension");
    gce.setAttribute("disposalMethod", "none");
    gce.setAttribute("userInputFlag", "FALSE");
    gce.setAttribute("transparentColorFlag", "FALSE");
    gce.setAttribute("delayTime", Integer.toString(Math.round(delayMs / 10f)));
    gce.setAttribute("transparentColorIndex", "0");
    if (loopCount >= 0) {
      IIOMetadataNode apps = child(root, "ApplicationExtensions");
      IIOMetadataNode app = new IIOMetadataNode("ApplicationExtension");
      app.setAttribute("applicationID", "NETSCAPE");
      app.setAttribute("authenticationCode", "2.0");
      app.setUserObject(new byte[] {1, (byte) (loopCount & 0xff), (byte) ((loopCount >> 8) & 0xff)});
      apps.appendChild(app);
    }
    meta.setFromTree(FORMAT, root);
    return meta;
  }

  private static IIOMetadataNode child(IIOMetadataNode root, String name) {
    for (int i = 0; i < root.getLength(); i++) {
      if (root.item(i).getNodeName().equalsIgnoreCase(name)) {
        return (IIOMetadataNode) root.item(i);
      }
    }
    IIOMetadataNode node = new IIOMetadataNode(name);
    root.appendChild(node);
    return node;
  }

  private static BufferedImage flatten(BufferedImage src, Color background) {
    BufferedImage rgb = new BufferedImage(src.getWidth(), src.getHeight(), BufferedImage.TYPE_INT_RGB);
    Graphics2D g = rgb.createGraphics();
    g.setColor(background);
    g.fillRect(0, 0, src.getWidth(), src.getHeight());
    g.drawImage(src, 0, 0, null);
    g.dispose();
    return rgb;
  }
}
