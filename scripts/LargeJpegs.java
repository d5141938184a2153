import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.GradientPaint;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.RoundRectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes N invented large JPEGs (a lit gradient backdrop with one rounded object and sensor-like noise) for the heap
 * check in heap-check.sh. Run as a single-file program (JDK 11+):
 * {@code java LargeJpegs.java <dir> <n> [w] [h] [unique]}.
 *
 * <p>Only {@code unique} pictures (default 200) are rendered and encoded, since that is slow at 6 MP; file i is a copy
 * of picture i mod unique with a few bytes naming i appended after the JPEG's end-of-image marker (ITU-T T.81 B.2.1
 * ends the image there; phones append data the same way), so every file has its own content hash and is analysed
 * like a new photograph. Files that already exist are kept, so a second run only fills gaps. Seeded: file i always
 * has the same bytes.
 */
public final class LargeJpegs {
  private static final long SEED = 20261201L;

  public static void main(String[] args) throws Exception {
    if (args.length < 2) {
      System.err.println("usage: java LargeJpegs.java <dir> <n> [width=3000] [height=2000]");
      System.exit(2);
    }
    Path dir = Files.createDirectories(Path.of(args[0]));
    int n = Integer.parseInt(args[1]);
    int w = args.length > 2 ? Integer.parseInt(args[2]) : 3000;
    int h = args.length > 3 ? Integer.parseInt(args[3]) : 2000;
    int unique = args.length > 4 ? Integer.parseInt(args[4]) : 200;
    Path originals = Files.createDirectories(dir.resolve(".originals"));
    ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors());
    AtomicReference<Exception> failure = new AtomicReference<>();
    for (int i = 0; i < n; i++) {
      int index = i;
      pool.execute(() -> {
        Path file = dir.resolve(String.format("large-%05d.jpg", index));
        if (Files.exists(file) || failure.get() != null) {
          return;
        }
        try {
          Path original = originals.resolve(String.format("picture-%05d.jpg", index % unique));
          synchronized (LargeJpegs.class.getName().concat(original.toString()).intern()) {
            if (!Files.exists(original)) {
              Path part = originals.resolve(original.getFileName() + ".part");
              write(picture(w, h, new SplittableRandom(SEED + index % unique)), part);
              Files.move(part, original);
            }
          }
          Path tmp = dir.resolve(file.getFileName() + ".part");
          byte[] tail = ("copy " + index).getBytes(java.nio.charset.StandardCharsets.US_ASCII);
          byte[] head = Files.readAllBytes(original);
          byte[] both = java.util.Arrays.copyOf(head, head.length + tail.length);
          System.arraycopy(tail, 0, both, head.length, tail.length);
          Files.write(tmp, both);
          Files.move(tmp, file);
        } catch (IOException e) {
          failure.compareAndSet(null, e);
        }
      });
    }
    pool.shutdown();
    pool.awaitTermination(7, TimeUnit.DAYS);
    if (failure.get() != null) {
      throw failure.get();
    }
  }

  static BufferedImage picture(int w, int h, SplittableRandom rnd) {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_3BYTE_BGR);
    Graphics2D g = img.createGraphics();
    g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
    g.setPaint(new GradientPaint(0, 0, hsb(rnd, 0.15f, 0.85f), 0, h, hsb(rnd, 0.25f, 0.55f)));
    g.fillRect(0, 0, w, h);
    double ow = w * (0.2 + 0.3 * rnd.nextDouble());
    double oh = h * (0.3 + 0.4 * rnd.nextDouble());
    double ox = (w - ow) * rnd.nextDouble();
    double oy = (h - oh) * (0.3 + 0.4 * rnd.nextDouble());
    Color body = hsb(rnd, 0.6f, 0.6f);
    g.setPaint(new GradientPaint((float) ox, 0, body.brighter(), (float) (ox + ow), 0, body.darker()));
    if (rnd.nextBoolean()) {
      g.fill(new Ellipse2D.Double(ox, oy, ow, oh));
    } else {
      g.fill(new RoundRectangle2D.Double(ox, oy, ow, oh, ow / 3, ow / 3));
    }
    g.setStroke(new BasicStroke(w / 300f));
    g.setColor(body.darker().darker());
    g.draw(new Ellipse2D.Double(ox + ow * 0.1, oy + oh * 0.05, ow * 0.8, oh * 0.1));
    g.dispose();
    // Sensor-like noise, so files have a photograph's size (a clean gradient compresses to almost nothing).
    byte[] px = ((java.awt.image.DataBufferByte) img.getRaster().getDataBuffer()).getData();
    for (int i = 0; i < px.length; i++) {
      int v = (px[i] & 0xFF) + rnd.nextInt(13) - 6;
      px[i] = (byte) Math.max(0, Math.min(255, v));
    }
    return img;
  }

  private static Color hsb(SplittableRandom rnd, float sat, float bright) {
    return Color.getHSBColor((float) rnd.nextDouble(), sat, bright);
  }

  static void write(BufferedImage img, Path file) throws IOException {
    ImageWriter writer = ImageIO.getImageWritersByFormatName("jpeg").next();
    try (ImageOutputStream out = ImageIO.createImageOutputStream(file.toFile())) {
      writer.setOutput(out);
      ImageWriteParam p = writer.getDefaultWriteParam();
      p.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
      p.setCompressionQuality(0.88f);
      writer.write(null, new IIOImage(img, null, null), p);
    } finally {
      writer.dispose();
    }
  }
}
