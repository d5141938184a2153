package org.morphscout.indexer.hostile;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import javax.imageio.ImageIO;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;
import org.morphscout.demo.Archetype;
import org.morphscout.demo.TestFamilies;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.ingest.DecodeOptions;
import org.morphscout.indexer.ingest.ImageIoDecoder;
import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.pairing.ScoreConfig;
import org.morphscout.indexer.screen.PairListReader;

/**
 * Mutated and generated input for the three readers of outside files: every input gives a result or a classified
 * reason ({@link MorphscoutException} with a message, {@link ImageReadException} with a failure kind), never another
 * exception. Mutations: truncation, bit flips, byte insertions and deletions, random bytes; for text also BOMs, quotes,
 * Latin-1 and UTF-16 bytes, NULs and huge fields. Seeds are fixed (jqwik prints the seed on failure).
 */
class HostileInputProperties {
  private static Path dir;
  private static byte[] png;
  private static byte[] jpeg;

  @BeforeContainer
  static void makeFiles() throws IOException {
    dir = Files.createTempDirectory("morphscout-properties");
    BufferedImage image = TestFamilies.silhouetteFamily(18, 2, Archetype.VASE, Archetype.JUG).get(0).image();
    png = encode(image, "png");
    BufferedImage rgb = new BufferedImage(image.getWidth(), image.getHeight(), BufferedImage.TYPE_INT_RGB);
    rgb.createGraphics().drawImage(image, 0, 0, null);
    jpeg = encode(rgb, "jpg");
  }

  @AfterContainer
  static void removeFiles() throws IOException {
    try (var files = Files.walk(dir)) {
      for (Path p : files.sorted(java.util.Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }

  private static byte[] encode(BufferedImage image, String format) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    ImageIO.write(image, format, out);
    return out.toByteArray();
  }

  /** Applies one seeded mutation: truncate, flip bits, insert or delete bytes, or append garbage. */
  static byte[] mutate(byte[] original, long seed) {
    Random rnd = new Random(seed);
    byte[] b = original.clone();
    switch (rnd.nextInt(5)) {
      case 0 -> b = java.util.Arrays.copyOf(b, rnd.nextInt(b.length + 1));
      case 1 -> {
        for (int i = 0, n = 1 + rnd.nextInt(16); i < n && b.length > 0; i++) {
          b[rnd.nextInt(b.length)] ^= (byte) (1 << rnd.nextInt(8));
        }
      }
      case 2 -> {
        int at = rnd.nextInt(b.length + 1);
        byte[] junk = new byte[1 + rnd.nextInt(64)];
        rnd.nextBytes(junk);
        byte[] out = new byte[b.length + junk.length];
        System.arraycopy(b, 0, out, 0, at);
        System.arraycopy(junk, 0, out, at, junk.length);
        System.arraycopy(b, at, out, at + junk.length, b.length - at);
        b = out;
      }
      case 3 -> {
        if (b.length > 1) {
          int at = rnd.nextInt(b.length - 1);
          int n = 1 + rnd.nextInt(Math.min(256, b.length - at - 1) + 1);
          byte[] out = new byte[b.length - n];
          System.arraycopy(b, 0, out, 0, at);
          System.arraycopy(b, at + n, out, at, b.length - at - n);
          b = out;
        }
      }
      default -> {
        byte[] junk = new byte[rnd.nextInt(512)];
        rnd.nextBytes(junk);
        b = junk;
      }
    }
    return b;
  }

  @Property(tries = 150, seed = "1801")
  void mutatedImagesDecodeOrFailWithAClassifiedReason(@ForAll boolean asPng, @ForAll long seed) throws IOException {
    Path file = Files.write(dir.resolve(asPng ? "m.png" : "m.jpg"), mutate(asPng ? png : jpeg, seed));
    ImageIoDecoder decoder = new ImageIoDecoder(DecodeOptions.defaults().withMaxPixels(4_000_000));
    try {
      assertThat(decoder.decode(file).analysis().getWidth()).isPositive();
    } catch (ImageReadException e) {
      assertThat(e.failure()).isNotNull();
      assertThat(e.reason()).isNotBlank();
    }
  }

  @Provide
  Arbitrary<String> csvText() {
    Arbitrary<String> cells = Arbitraries.oneOf(
        Arbitraries.of("/p/a.jpg", "b.png", "x y.tif", "\"q,uoted\".jpg", "\"", "\"\"", "=SUM(A1)", "", " ",
            "caf\u00e9.jpg", "\u0000", "\r", "\t", "\uFEFF", "shot"),
        Arbitraries.strings().ofMaxLength(40),
        Arbitraries.strings().withChars('x').ofMinLength(1000).ofMaxLength(5000));
    Arbitrary<String> row = cells.list().ofMinSize(0).ofMaxSize(5).map(l -> String.join(",", l));
    return row.list().ofMaxSize(12).map(l -> String.join(Arbitraries.of("\n", "\r\n").sample(), l));
  }

  @Property(tries = 300, seed = "1802")
  void pairListsGiveRowsOrLineNumberedReasons(@ForAll("csvText") String text, @ForAll int encoding,
      @ForAll boolean bom) throws IOException {
    byte[] bytes = switch (Math.floorMod(encoding, 4)) {
      case 0 -> text.getBytes(StandardCharsets.UTF_8);
      case 1 -> text.getBytes(StandardCharsets.ISO_8859_1);
      case 2 -> text.getBytes(StandardCharsets.UTF_16);
      default -> mutate(text.getBytes(StandardCharsets.UTF_8), encoding);
    };
    if (bom) {
      byte[] withBom = new byte[bytes.length + 3];
      withBom[0] = (byte) 0xEF;
      withBom[1] = (byte) 0xBB;
      withBom[2] = (byte) 0xBF;
      System.arraycopy(bytes, 0, withBom, 3, bytes.length);
      bytes = withBom;
    }
    Path file = Files.write(dir.resolve("pairs.csv"), bytes);
    List<PairListReader.Entry> entries = new ArrayList<>();
    try (PairListReader reader = new PairListReader(file)) {
      reader.forEachRemaining(entries::add);
    } catch (MorphscoutException e) {
      assertThat(e.getMessage()).contains(file.getFileName().toString());
      return;
    } catch (UncheckedIOException e) {
      throw new AssertionError("unexpected I/O failure", e);
    }
    for (PairListReader.Entry e : entries) {
      assertThat(e.line()).isPositive();
      if (e.row() == null) {
        assertThat(e.problem()).startsWith("line " + e.line() + ":");
      } else {
        assertThat(e.row().pathA()).doesNotStartWith("\uFEFF");
      }
    }
  }

  @Provide
  Arbitrary<String> settingsText() {
    Arbitrary<String> keys = Arbitraries.of("passScore", "warnScore", "overlapWeight", "nope", "", "passScore.x",
        "\u0000", "warnScore", "silhouetteMatch", "silhouetteMatch.weight", "colour.scale", "iouZero");
    Arbitrary<String> values = Arbitraries.of("70", "-1", "NaN", "1e400", "abc", "", "{", "\"", "Infinity", "50.5",
        "{\"weight\": 2}", "{\"weight\": {\"x\": 1}}", "{\"zero\": 0.99}", "[1]", "null", "{}");
    Arbitrary<String> json = Combinators.combine(keys, values).as((k, v) -> "\"" + k + "\": " + v).list()
        .ofMaxSize(5).map(l -> "{" + String.join(", ", l) + "}");
    Arbitrary<String> props = Combinators.combine(keys, values).as((k, v) -> k + "=" + v).list().ofMaxSize(5)
        .map(l -> String.join("\n", l));
    return Arbitraries.oneOf(json, props, Arbitraries.strings().ofMaxLength(200));
  }

  @Property(tries = 200, seed = "1803")
  void settingsFilesLoadOrFailWithAReason(@ForAll("settingsText") String text, @ForAll boolean asJson,
      @ForAll long seed) throws IOException {
    byte[] bytes = seed % 3 == 0 ? mutate(text.getBytes(StandardCharsets.UTF_8), seed)
        : text.getBytes(StandardCharsets.UTF_8);
    Path file = Files.write(dir.resolve(asJson ? "scores.json" : "scores.properties"), bytes);
    try {
      assertThat(ScoreConfig.load(file)).isNotNull();
    } catch (MorphscoutException e) {
      assertThat(e.getMessage()).isNotBlank();
    }
  }
}
