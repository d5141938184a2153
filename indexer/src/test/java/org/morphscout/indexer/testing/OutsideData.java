package org.morphscout.indexer.testing;

import static org.assertj.core.api.Assertions.fail;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Assumptions;

/**
 * Data from outside the project that some tests check the main job against: Debian-packaged images and datasets
 * ({@code opencv-doc}, {@code python3-skimage}, {@code dataset-fashion-mnist}) and the learned silhouette model.
 * {@code .ci/run} installs all of them. On a developer's machine a test whose data is absent is skipped with a reason
 * naming what is missing and how to get it; under CI (the environment variable {@code CI} set, as {@code .ci/run} and
 * the usual CI services do) it fails instead, so a check never disappears silently from the CI run.
 */
public final class OutsideData {
  /** Where {@code opencv-doc} installs its sample images. */
  public static final Path OPENCV_SAMPLES = Path.of("/usr/share/doc/opencv-doc/examples/data");

  /** Where {@code python3-skimage} installs its data images (found with {@code dpkg -L python3-skimage}). */
  public static final Path SKIMAGE_DATA = Path.of("/usr/lib/python3/dist-packages/skimage/data");

  /** Where {@code dataset-fashion-mnist} installs the IDX files (found with {@code dpkg -L dataset-fashion-mnist}). */
  public static final Path FASHION_MNIST = Path.of("/usr/share/datasets/fashion-mnist");

  private OutsideData() {}

  /** True under CI: the variable {@code CI} is set to anything but empty, {@code false} or {@code 0}. */
  public static boolean underCi() {
    String ci = System.getenv("CI");
    return ci != null && !ci.isBlank() && !ci.equalsIgnoreCase("false") && !ci.equals("0");
  }

  /**
   * Returns {@code file} when it exists; otherwise skips the test (developer machine) or fails it (CI).
   *
   * @param debianPackage the Debian package that installs the file, named in the message
   */
  public static Path require(Path file, String debianPackage) {
    if (!Files.exists(file)) {
      unavailable(file + " is absent (Debian package " + debianPackage + "; .ci/run installs it: apt-get install "
          + debianPackage + ")");
    }
    return file;
  }

  /** Skips the running test with {@code reason}, or fails it under CI, where the data must be there. */
  public static void unavailable(String reason) {
    if (underCi()) {
      fail("outside test data missing under CI (CI=" + System.getenv("CI") + "): " + reason);
    }
    Assumptions.abort("skipped, outside test data missing: " + reason);
  }
}
