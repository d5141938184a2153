package org.morphscout.app.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Writes the vectors and queries of one {@link VectorSearchBenchmark} configuration, and our own figures on them, for
 * the script that runs other HNSW and exact-search libraries on exactly the same data ({@code scripts/vector-peers}).
 * Files in {@code dir}: {@code base-N-D.f32} and {@code queries-N-D.f32} (row-major little-endian float32, N x D and
 * Q x D) and {@code ours-N-D.json} (recall@k, single-thread latency and the querying thread's CPU time per candidate
 * count).
 */
public final class PeerVectors {
  private PeerVectors() {}

  public static void export(Path dir, VectorSearchBenchmark.Config config, VectorSearchBenchmark.Result result)
      throws IOException {
    Files.createDirectories(dir);
    String tag = config.size() + "-" + config.dimension();
    SyntheticVectors gen = new SyntheticVectors(config.dimension(), Math.max(10, config.size() / 100), config.seed());
    write(dir.resolve("base-" + tag + ".f32"), gen, 0, config.size());
    // The timed queries of the benchmark are the first config.queries() of stream 1.
    write(dir.resolve("queries-" + tag + ".f32"), gen, 1, config.queries());
    StringBuilder json = new StringBuilder();
    json.append(String.format(Locale.ROOT, "{\"size\": %d, \"dimension\": %d, \"k\": %d, \"buildSeconds\": %.2f, "
        + "\"probes\": [", config.size(), config.dimension(), config.k(), result.buildSeconds()));
    for (int i = 0; i < result.probes().size(); i++) {
      VectorSearchBenchmark.Probe p = result.probes().get(i);
      json.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT,
          "{\"candidates\": %d, \"recall\": %.4f, \"p50Ms\": %.4f, \"p99Ms\": %.4f, \"cpuP50Ms\": %.4f}",
          p.candidates(), p.recall(), p.knn().p50Ms(), p.knn().p99Ms(), p.knnCpu().p50Ms()));
    }
    json.append(String.format(Locale.ROOT, "], \"scanP50Ms\": %.4f}%n", result.scan().p50Ms()));
    Files.writeString(dir.resolve("ours-" + tag + ".json"), json);
  }

  private static void write(Path file, SyntheticVectors gen, int stream, int count) throws IOException {
    ByteBuffer row = ByteBuffer.allocate(4 * gen.dimension()).order(ByteOrder.LITTLE_ENDIAN);
    try (OutputStream out = new java.io.BufferedOutputStream(Files.newOutputStream(file), 1 << 20)) {
      for (int i = 0; i < count; i++) {
        row.clear();
        for (float v : gen.vector(stream, i)) {
          row.putFloat(v);
        }
        out.write(row.array());
      }
    }
  }
}
