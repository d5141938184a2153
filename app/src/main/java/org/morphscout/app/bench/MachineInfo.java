package org.morphscout.app.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * The machine a benchmark ran on.
 *
 * @param cores logical processors available to the JVM
 * @param maxHeapBytes the JVM's heap limit (-Xmx)
 * @param jdk Java runtime version and vendor
 * @param vectorModule whether {@code jdk.incubator.vector} is loaded (Lucene's SIMD distance functions need it)
 * @param os operating system name, version and architecture
 * @param cpuModel CPU model name from /proc/cpuinfo, or "unknown"
 * @param loadAverage the 1, 5 and 15 minute load averages from /proc/loadavg, or "unknown"
 */
public record MachineInfo(int cores, long maxHeapBytes, String jdk, boolean vectorModule, String os, String cpuModel,
    String loadAverage) {

  /** Describes the running machine. */
  public static MachineInfo current() {
    return new MachineInfo(
        Runtime.getRuntime().availableProcessors(),
        Runtime.getRuntime().maxMemory(),
        System.getProperty("java.runtime.version") + " (" + System.getProperty("java.vendor") + ")",
        ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent(),
        System.getProperty("os.name") + " " + System.getProperty("os.version") + " " + System.getProperty("os.arch"),
        readCpuModel(),
        currentLoadAverage());
  }

  /** The load averages now, from /proc/loadavg ("unknown" elsewhere). */
  public static String currentLoadAverage() {
    try {
      String[] parts = Files.readString(Path.of("/proc/loadavg")).trim().split("\\s+");
      return parts.length >= 3 ? parts[0] + " " + parts[1] + " " + parts[2] : "unknown";
    } catch (IOException | RuntimeException e) {
      return "unknown";
    }
  }

  private static String readCpuModel() {
    try {
      List<String> lines = Files.readAllLines(Path.of("/proc/cpuinfo"));
      for (String line : lines) {
        if (line.startsWith("model name")) {
          int colon = line.indexOf(':');
          return colon >= 0 ? line.substring(colon + 1).trim() : line;
        }
      }
      return "unknown";
    } catch (IOException | RuntimeException e) {
      return "unknown";
    }
  }
}
