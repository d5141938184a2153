package org.morphscout.indexer.ingest;

import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.awt.image.BufferedImage;
import java.io.EOFException;
import java.io.IOException;
import java.math.BigDecimal;
import java.io.InputStream;
import java.nio.channels.ClosedByInterruptException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import javax.imageio.ImageIO;
import javax.imageio.ImageReadParam;
import javax.imageio.ImageReader;
import javax.imageio.event.IIOReadProgressListener;
import javax.imageio.event.IIOReadWarningListener;
import javax.imageio.stream.ImageInputStream;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Decodes JPEG (baseline, progressive, CMYK/YCCK), PNG, TIFF (first page), BMP, GIF (first frame) and WebP with
 * ImageIO and the TwelveMonkeys plugins.
 *
 * <p>Steps, cheapest first, so bad files fail fast: size (empty?), magic bytes ({@link FormatSniffer}), container
 * end marker ({@link DataEndCheck}), header dimensions against the pixel cap (no pixels decoded), EXIF
 * orientation, then a decode with source subsampling so that the decoded picture's long side stays about twice the
 * analysis size (memory per image is bounded even for 100 MP files; the factor of two leaves room for the area
 * average to remove the aliasing of point subsampling), conversion to sRGB ARGB ({@link SrgbConverter}; ICC
 * profiles embedded in JPEG and TIFF are applied by TwelveMonkeys, those in PNG by {@link PngColourProfile}), area
 * downscale to at most the analysis size ({@link AreaDownscaler}) and finally orientation ({@link Orientation}).
 *
 * <p>Thread-safe: every call uses its own reader. Decoding stops early (reported as {@link ReadFailure#TIMED_OUT})
 * when the calling thread is interrupted, which is how {@link TimeLimitedDecoder} enforces its limit.
 */
public final class ImageIoDecoder implements ImageDecoder {
  private static final Logger LOG = LoggerFactory.getLogger(ImageIoDecoder.class);

  private final DecodeOptions options;

  public ImageIoDecoder(DecodeOptions options) {
    this.options = Objects.requireNonNull(options, "options");
  }

  /** The options this decoder applies. */
  public DecodeOptions options() {
    return options;
  }

  @Override
  public DecodedImage decode(Path file) throws IOException {
    return asReadFailure(file, () -> decodeWithReaders(file, preflight(file)));
  }

  /** One step of decoding {@code file} that reads it. */
  interface FileWork<T> {
    T run() throws IOException;
  }

  /**
   * Runs {@code work}, reporting a file that vanished or may not be read as this file's {@link ImageReadException},
   * and a channel closed by an interrupt as a stop request; other I/O errors pass as they are.
   */
  static <T> T asReadFailure(Path file, FileWork<T> work) throws IOException {
    try {
      return work.run();
    } catch (NoSuchFileException e) {
      throw new ImageReadException(file, ReadFailure.VANISHED, "file disappeared before decoding", e);
    } catch (AccessDeniedException e) {
      throw new ImageReadException(file, ReadFailure.UNREADABLE, "file not readable (permission denied)", e);
    } catch (ClosedByInterruptException e) {
      // File channels close when their thread is interrupted: that is a stop request, not a disk failure.
      throw interrupted(file);
    }
  }

  /**
   * What every decoder of this package learns and checks before decoding, in this order: not a folder, not empty,
   * the format sniffed from the bytes and decodable, the data complete ({@link DataEndCheck}), the EXIF orientation.
   *
   * @param label the format's name as sniffed, for messages
   */
  record Preflight(FileFormat format, String label, int orientation) {}

  static Preflight preflight(Path file) throws IOException {
    if (Files.isDirectory(file)) {
      throw new ImageReadException(file, ReadFailure.NOT_AN_IMAGE, "not an image (a folder)");
    }
    long size = Files.size(file);
    if (size == 0) {
      throw new ImageReadException(file, ReadFailure.EMPTY, "empty file (0 bytes)");
    }
    byte[] head;
    try (InputStream in = Files.newInputStream(file)) {
      head = in.readNBytes(FormatSniffer.HEAD_LENGTH);
    }
    FormatSniffer.Sniffed sniffed = FormatSniffer.sniff(head, String.valueOf(file.getFileName()));
    FileFormat format = sniffed.format();
    if (format == FileFormat.UNKNOWN) {
      throw new ImageReadException(file, ReadFailure.NOT_AN_IMAGE, "not an image");
    }
    if (!format.decodable()) {
      throw new ImageReadException(
          file, ReadFailure.UNSUPPORTED_FORMAT, "unsupported format (" + sniffed.label() + ")");
    }
    if (DataEndCheck.check(file, format) == DataEndCheck.Completeness.TRUNCATED) {
      throw truncated(file, format, null);
    }
    int orientation =
        format == FileFormat.JPEG || format == FileFormat.TIFF || format == FileFormat.PNG
                || format == FileFormat.WEBP
            ? ExifOrientationReader.read(file)
            : 1;
    return new Preflight(format, sniffed.label(), orientation);
  }

  /** Decodes a file that passed {@link #preflight} with the ImageIO decoders installed for its format. */
  DecodedImage decodeAfter(Path file, Preflight preflight) throws IOException {
    return asReadFailure(file, () -> decodeWithReaders(file, preflight));
  }

  private DecodedImage decodeWithReaders(Path file, Preflight preflight) throws IOException {
    FileFormat format = preflight.format();
    int orientation = preflight.orientation();
    String sniffedLabel = preflight.label();
    Iterator<ImageReader> readers = ImageIO.getImageReadersByFormatName(format.formatName());
    if (!readers.hasNext()) {
      throw new ImageReadException(
          file, ReadFailure.UNSUPPORTED_FORMAT, "unsupported format (" + sniffedLabel + ", no decoder installed)");
    }
    ImageReadException firstFailure = null;
    while (readers.hasNext()) {
      ImageReader reader = readers.next();
      try {
        return decodeWith(reader, file, format, orientation);
      } catch (ImageReadException e) {
        if (e.failure() != ReadFailure.DECODER_FAILED) {
          throw e; // too large, truncated, interrupted: another decoder will not change that
        }
        LOG.debug("{}: {} failed ({}), trying the next decoder", file, reader.getClass().getName(), e.reason());
        if (firstFailure == null) {
          firstFailure = e;
        }
      } finally {
        reader.dispose();
      }
    }
    throw firstFailure;
  }

  private DecodedImage decodeWith(ImageReader reader, Path file, FileFormat format, int orientation)
      throws IOException {
    try (ImageInputStream in = ImageIO.createImageInputStream(file.toFile())) {
      if (in == null) {
        throw new NoSuchFileException(file.toString());
      }
      reader.setInput(in, true, false);
      List<String> warnings = new ArrayList<>();
      reader.addIIOReadWarningListener((IIOReadWarningListener) (r, message) -> warnings.add(message));
      InterruptWatch watch = new InterruptWatch();
      reader.addIIOReadProgressListener(watch);

      int w;
      int h;
      try {
        w = reader.getWidth(0);
        h = reader.getHeight(0);
      } catch (IOException | RuntimeException e) {
        throw decoderFailed(file, format, e);
      }
      if (w <= 0 || h <= 0) {
        throw new ImageReadException(file, ReadFailure.DECODER_FAILED, "decoder failed: header declares " + w + "x" + h);
      }
      checkPixelCap(file, w, h);

      ImageReadParam param = reader.getDefaultReadParam();
      int step = subsampling(w, h, options.analysisLongSide());
      if (step > 1) {
        param.setSourceSubsampling(step, step, 0, 0);
      }
      BufferedImage raw;
      try {
        raw = reader.read(0, param);
      } catch (IOException | RuntimeException e) {
        throw decoderFailed(file, format, e);
      } catch (OutOfMemoryError e) {
        // The pixel cap and subsampling should prevent this; if a decoder still allocates too much, the large
        // buffer is unreachable once we unwind, so report this file and let indexing go on.
        throw new ImageReadException(
            file, ReadFailure.DECODER_FAILED, "decoder failed: not enough memory to decode " + w + "x" + h, e);
      }
      if (watch.aborted) {
        throw interrupted(file);
      }
      for (String warning : warnings) {
        if (looksLikeTruncation(warning)) {
          throw truncated(file, format, null);
        }
        LOG.debug("{}: decoder warning: {}", file, warning);
      }
      boolean hasAlpha = raw.getColorModel().hasAlpha();
      boolean rgbSamples = raw.getColorModel().getColorSpace().getType() == ColorSpace.TYPE_RGB;
      BufferedImage srgb = SrgbConverter.toSrgbArgb(raw);
      if (format == FileFormat.PNG && rgbSamples) {
        Optional<ICC_Profile> profile = PngColourProfile.embeddedRgbProfile(reader);
        if (profile.isPresent()) {
          srgb = PngColourProfile.toSrgb(srgb, profile.get());
        }
      }
      raw = null; // let the decoded picture go before allocating the next one
      return finish(srgb, w, h, format, orientation, hasAlpha);
    }
  }

  /**
   * The last steps every decoder of this package takes: downscale the sRGB picture to at most the analysis size
   * ({@link AreaDownscaler}), then turn it upright ({@link Orientation}).
   *
   * @param w the stored picture's width as the file declares it (before orientation)
   * @param h its height
   */
  DecodedImage finish(BufferedImage srgb, int w, int h, FileFormat format, int orientation, boolean hasAlpha) {
    int[] target = AreaDownscaler.fitWithin(w, h, options.analysisLongSide());
    BufferedImage small =
        AreaDownscaler.resize(srgb, Math.min(target[0], srgb.getWidth()), Math.min(target[1], srgb.getHeight()));
    BufferedImage upright = orientation == 1 ? small : Orientation.apply(small, orientation);
    boolean swap = Orientation.swapsAxes(orientation);
    return new DecodedImage(upright, swap ? h : w, swap ? w : h, format.formatName(), orientation, hasAlpha);
  }

  /** Largest integer step that keeps the decoded long side at least twice {@code analysisLongSide}. */
  static int subsampling(int w, int h, int analysisLongSide) {
    return Math.max(1, Math.max(w, h) / (2 * analysisLongSide));
  }

  void checkPixelCap(Path file, int w, int h) {
    long pixels = (long) w * h;
    if (pixels > options.maxPixels()) {
      String size = pixels >= 100_000
          ? String.format(Locale.ROOT, "%.1f", pixels / 1e6)
          : megapixels(pixels);
      throw new ImageReadException(
          file,
          ReadFailure.TOO_LARGE,
          "image too large: " + w + "x" + h + " = " + size + " MP exceeds the " + megapixels(options.maxPixels())
              + " MP cap", pixels, null);
    }
  }

  /** Exact megapixels without trailing zeros: 250 000 000 -> "250", 1 500 000 -> "1.5", 5 000 -> "0.005". */
  private static String megapixels(long pixels) {
    return BigDecimal.valueOf(pixels).movePointLeft(6).stripTrailingZeros().toPlainString();
  }

  /**
   * Warning texts of the JDK/libjpeg JPEG decoder ("Premature end of JPEG file", libjpeg's JWRN_JPEG_EOF), the
   * JDK PNG reader and TwelveMonkeys that signal missing data.
   */
  private static boolean looksLikeTruncation(String warning) {
    String w = warning.toLowerCase(Locale.ROOT);
    return w.contains("premature end") || w.contains("truncated") || w.contains("unexpected end")
        || w.contains("eof");
  }

  private static ImageReadException truncated(Path file, FileFormat format, Throwable cause) {
    return new ImageReadException(
        file, ReadFailure.TRUNCATED, "truncated " + format.label() + " data", cause);
  }

  static ImageReadException interrupted(Path file) {
    return new ImageReadException(file, ReadFailure.TIMED_OUT, "decoding stopped (time limit or cancel)");
  }

  /**
   * Classifies what a reader threw. Readers declare plain {@link IOException} for bad data as well as for I/O
   * (an {@link EOFException} usually means truncation), so everything except a vanished or forbidden file is
   * reported as this file's failure rather than as a machine failure.
   */
  private static ImageReadException decoderFailed(Path file, FileFormat format, Exception e) throws IOException {
    if (e instanceof NoSuchFileException || e instanceof AccessDeniedException) {
      throw (IOException) e; // mapped to VANISHED / UNREADABLE in decode()
    }
    if (Thread.currentThread().isInterrupted() || e instanceof ClosedByInterruptException) {
      return interrupted(file); // the reader's stream was closed by the interrupt; the data may be fine
    }
    if (e instanceof EOFException || e.getCause() instanceof EOFException
        || (format == FileFormat.GIF && !DataEndCheck.gifHasTrailer(file))) {
      return truncated(file, format, e);
    }
    String cause = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    return new ImageReadException(file, ReadFailure.DECODER_FAILED, "decoder failed: " + cause, e);
  }

  /** Aborts the read when the decoding thread is interrupted (readers poll {@code abortRequested()}). */
  private static final class InterruptWatch implements IIOReadProgressListener {
    volatile boolean aborted;

    @Override
    public void imageProgress(ImageReader source, float percentageDone) {
      if (Thread.currentThread().isInterrupted()) {
        source.abort();
      }
    }

    @Override
    public void readAborted(ImageReader source) {
      aborted = true;
    }

    @Override
    public void sequenceStarted(ImageReader source, int minIndex) {}

    @Override
    public void sequenceComplete(ImageReader source) {}

    @Override
    public void imageStarted(ImageReader source, int imageIndex) {}

    @Override
    public void imageComplete(ImageReader source) {}

    @Override
    public void thumbnailStarted(ImageReader source, int imageIndex, int thumbnailIndex) {}

    @Override
    public void thumbnailProgress(ImageReader source, float percentageDone) {}

    @Override
    public void thumbnailComplete(ImageReader source) {}
  }
}
