package org.morphscout.indexer.ingest;

import java.awt.Transparency;
import java.awt.color.ColorSpace;
import java.awt.color.ICC_ColorSpace;
import java.awt.color.ICC_Profile;
import java.awt.image.BufferedImage;
import java.awt.image.ColorModel;
import java.awt.image.ComponentColorModel;
import java.awt.image.DataBuffer;
import java.awt.image.DataBufferByte;
import java.awt.image.Raster;
import java.awt.image.WritableRaster;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;
import org.opencv.core.Mat;
import org.opencv.core.MatOfByte;
import org.opencv.imgcodecs.Imgcodecs;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Decodes JPEGs straight to about the analysis size in the DCT domain, through OpenCV's reduced-size reads (libjpeg
 * scaling by 1/2, 1/4 or 1/8, the largest that keeps the long side at least the analysis size), which costs a
 * fraction of a full decode of a camera photo. Everything else is exactly what {@link ImageIoDecoder} does: the same
 * checks first ({@link ImageIoDecoder#preflight}: format, completeness, EXIF orientation), the same pixel cap from the
 * header, the same conversion of an embedded RGB ICC profile to sRGB ({@link SrgbConverter}), and the same last steps
 * (area downscale, orientation). A file the fast path does not take (not a JPEG, an Adobe APP14 marker other than on a
 * YCbCr colour file, CMYK or other than 1 or 3 components, an embedded profile that is unreadable or not RGB, or
 * anything OpenCV cannot decode) goes to {@link ImageIoDecoder}, per file. Results differ from ImageIO's by the
 * resampling only (a DCT-domain reduction instead of subsampling then area averaging): see the tolerance in the tests.
 *
 * <p>OpenCV's native library comes inside the {@code org.openpnp:opencv} artifact (Linux x86-64 and ARM, macOS,
 * Windows) and is loaded once; where it cannot load, one warning says so and every file takes the ImageIO path.
 * Thread-safe.
 */
public final class OpenCvJpegDecoder implements ImageDecoder {
  private static final Logger LOG = LoggerFactory.getLogger(OpenCvJpegDecoder.class);
  /** OpenCV's native library as packaged in the {@code org.openpnp:opencv} jar; tried once per run. */
  private static final NativeLibrary OPENCV = new NativeLibrary(nu.pattern.OpenCV::loadLocally, LOG::warn);

  private final ImageIoDecoder fallback;

  private OpenCvJpegDecoder(ImageIoDecoder fallback) {
    this.fallback = fallback;
  }

  /** The fast decoder when OpenCV's native library loads here, else the ImageIO decoder (said once, in the log). */
  public static ImageDecoder create(DecodeOptions options) {
    return create(options, OPENCV);
  }

  /** As {@link #create(DecodeOptions)}, with the native library given (tests simulate a machine where it fails). */
  static ImageDecoder create(DecodeOptions options, NativeLibrary natives) {
    ImageIoDecoder fallback = new ImageIoDecoder(Objects.requireNonNull(options, "options"));
    return natives.available() ? new OpenCvJpegDecoder(fallback) : fallback;
  }

  /** Whether OpenCV's native library is loaded (tries once). */
  public static boolean available() {
    return OPENCV.available();
  }

  /**
   * A native library loaded at most once: the first {@link #available()} runs the loader; if it throws anything
   * ({@link UnsatisfiedLinkError} where no native build fits the platform, an I/O error unpacking it from the jar),
   * the library counts as absent and one warning says so; later calls answer from memory. Thread-safe.
   */
  static final class NativeLibrary {
    private final Runnable loader;
    private final Consumer<String> warning;
    private Boolean loaded;

    /**
     * @param loader loads the library, throwing when it cannot
     * @param warning receives the one message said when it cannot
     */
    NativeLibrary(Runnable loader, Consumer<String> warning) {
      this.loader = Objects.requireNonNull(loader, "loader");
      this.warning = Objects.requireNonNull(warning, "warning");
    }

    synchronized boolean available() {
      if (loaded == null) {
        try {
          loader.run();
          loaded = true;
        } catch (Throwable e) { // UnsatisfiedLinkError, or an unpacking failure: both mean "not here"
          loaded = false;
          warning.accept("the fast JPEG decoder is not available on this machine (" + e
              + "); JPEGs are decoded with ImageIO, about three times slower");
        }
      }
      return loaded;
    }
  }

  /** The options this decoder applies. */
  public DecodeOptions options() {
    return fallback.options();
  }

  @Override
  public DecodedImage decode(Path file) throws IOException {
    return ImageIoDecoder.asReadFailure(file, () -> decodeChecked(file));
  }

  private DecodedImage decodeChecked(Path file) throws IOException {
    ImageIoDecoder.Preflight preflight = ImageIoDecoder.preflight(file);
    if (preflight.format() != FileFormat.JPEG) {
      return fallback.decodeAfter(file, preflight);
    }
    byte[] bytes = Files.readAllBytes(file);
    Optional<JpegHeader> header = JpegHeader.read(bytes);
    if (header.isEmpty() || !takesLayout(header.get())) {
      return fallback.decodeAfter(file, preflight);
    }
    Optional<ColorSpace> space = Optional.empty();
    if (header.get().iccProfile()) {
      space = rgbSpace(header.get());
      if (space.isEmpty()) {
        LOG.debug("{}: an embedded profile the fast path does not take, decoding with ImageIO", file);
        return fallback.decodeAfter(file, preflight);
      }
    }
    int w = header.get().width();
    int h = header.get().height();
    fallback.checkPixelCap(file, w, h);
    int reduction = reduction(w, h, fallback.options().analysisLongSide());
    BufferedImage image = decode(bytes, reduction, space);
    if (Thread.currentThread().isInterrupted()) {
      throw ImageIoDecoder.interrupted(file);
    }
    if (image == null) {
      LOG.debug("{}: OpenCV could not decode it, trying ImageIO", file);
      return fallback.decodeAfter(file, preflight);
    }
    return fallback.finish(image, w, h, FileFormat.JPEG, preflight.orientation(), false);
  }

  /**
   * Whether the fast path takes a JPEG of this layout: grey or colour without an Adobe marker, or colour with the
   * marker as Adobe's tools write it (transform 1, YCbCr). RGB-stored, CMYK and YCCK files go to ImageIO.
   */
  static boolean takesLayout(JpegHeader header) {
    if (header.adobe()) {
      return header.components() == 3 && header.adobeTransform() == 1;
    }
    return header.components() == 1 || header.components() == 3;
  }

  /** The largest of 8, 4, 2 and 1 that keeps the long side at least {@code analysisLongSide}. */
  static int reduction(int w, int h, int analysisLongSide) {
    int longSide = Math.max(w, h);
    for (int r : new int[] {8, 4, 2}) {
      if (longSide / r >= analysisLongSide) {
        return r;
      }
    }
    return 1;
  }

  /**
   * The colour space of an embedded RGB profile on a three-component JPEG, as ImageIO applies it; empty when the
   * profile is unreadable or is not an RGB profile (the file then goes to ImageIO, which decides what to do with it).
   */
  static Optional<ColorSpace> rgbSpace(JpegHeader header) {
    if (header.components() != 3 || header.profile().isEmpty()) {
      return Optional.empty();
    }
    try {
      ICC_Profile profile = ICC_Profile.getInstance(header.profile().get());
      if (profile.getColorSpaceType() != ColorSpace.TYPE_RGB || profile.getNumComponents() != 3) {
        return Optional.empty();
      }
      return Optional.of(new ICC_ColorSpace(profile));
    } catch (IllegalArgumentException e) { // not a valid profile
      return Optional.empty();
    }
  }

  /**
   * Decodes to 8-bit sRGB, or null on failure. Without a profile the JPEG's samples are taken as sRGB, as ImageIO
   * reads such a file; with one ({@code space}), the samples are taken in the profile's space and converted to sRGB by
   * the same conversion the ImageIO path applies ({@link SrgbConverter}: ICC.1 colour management through the JDK).
   */
  private static BufferedImage decode(byte[] bytes, int reduction, Optional<ColorSpace> space) {
    int flags = Imgcodecs.IMREAD_IGNORE_ORIENTATION | switch (reduction) {
      case 8 -> Imgcodecs.IMREAD_REDUCED_COLOR_8;
      case 4 -> Imgcodecs.IMREAD_REDUCED_COLOR_4;
      case 2 -> Imgcodecs.IMREAD_REDUCED_COLOR_2;
      default -> Imgcodecs.IMREAD_COLOR;
    };
    MatOfByte in = new MatOfByte(bytes);
    Mat bgr = Imgcodecs.imdecode(in, flags);
    try {
      if (bgr.empty() || bgr.channels() != 3 || bgr.depth() != org.opencv.core.CvType.CV_8U) {
        return null;
      }
      int width = bgr.cols();
      int height = bgr.rows();
      byte[] px = new byte[width * height * 3];
      bgr.get(0, 0, px);
      if (space.isPresent()) {
        return SrgbConverter.toSrgbArgb(inSpace(px, width, height, space.get()));
      }
      int[] argb = new int[width * height];
      for (int i = 0, j = 0; i < argb.length; i++, j += 3) {
        argb[i] = 0xFF000000 | (px[j + 2] & 0xff) << 16 | (px[j + 1] & 0xff) << 8 | (px[j] & 0xff);
      }
      BufferedImage out = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
      out.setRGB(0, 0, width, height, argb, 0, width);
      return out;
    } finally {
      bgr.release();
      in.release();
    }
  }

  /** OpenCV's blue-green-red bytes as an image in {@code space}, without copying them. */
  private static BufferedImage inSpace(byte[] bgr, int width, int height, ColorSpace space) {
    WritableRaster raster = Raster.createInterleavedRaster(new DataBufferByte(bgr, bgr.length), width, height,
        width * 3, 3, new int[] {2, 1, 0}, null);
    ColorModel model = new ComponentColorModel(space, false, false, Transparency.OPAQUE, DataBuffer.TYPE_BYTE);
    return new BufferedImage(model, raster, false, null);
  }
}
