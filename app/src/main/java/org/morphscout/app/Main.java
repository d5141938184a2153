package org.morphscout.app;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.morphscout.app.cli.MorphscoutCommand;

/** Entry point of the {@code morphscout} command. */
public final class Main {
  /** Held so the setting is not lost when the logging framework lets go of an unreferenced logger. */
  private static final java.util.logging.Logger LUCENE_VECTORS =
      java.util.logging.Logger.getLogger("org.apache.lucene.internal.vectorization");

  private Main() {}

  public static void main(String[] args) {
    System.exit(execute(args, new PrintWriter(System.out, true, StandardCharsets.UTF_8),
        new PrintWriter(System.err, true, StandardCharsets.UTF_8)));
  }

  /** Runs one command line with the given writers and returns its exit code (for tests). */
  public static int execute(String[] args, PrintWriter out, PrintWriter err) {
    configureLogging(args);
    return MorphscoutCommand.commandLine(out, err).execute(args);
  }

  /**
   * Logging goes to stderr at WARN; {@code -v} raises it to INFO and {@code -vv} to DEBUG. Done before any logger
   * exists, because slf4j-simple reads its level once.
   */
  private static void configureLogging(String[] args) {
    String level = "warn";
    for (String a : args) {
      if (a.equals("-vv") || a.equals("--debug")) {
        level = "debug";
      } else if ((a.equals("-v") || a.equals("--verbose")) && !level.equals("debug")) {
        level = "info";
      }
    }
    // Lucene reports through java.util.logging that SIMD is on, at every start; that is a diagnostic (-v).
    LUCENE_VECTORS.setLevel(level.equals("warn") ? java.util.logging.Level.WARNING : java.util.logging.Level.INFO);
    if (System.getProperty("org.slf4j.simpleLogger.defaultLogLevel") == null) {
      System.setProperty("org.slf4j.simpleLogger.defaultLogLevel", level);
    }
    System.setProperty("org.slf4j.simpleLogger.logFile", "System.err");
    System.setProperty("org.slf4j.simpleLogger.showThreadName", "false");
    System.setProperty("org.slf4j.simpleLogger.showShortLogName", "true");
    System.setProperty("org.slf4j.simpleLogger.levelInBrackets", "true");
    // ONNX Runtime's Java package ships CPU and GPU providers; on a machine without CUDA, DJL warns at every start
    // that the GPU provider is missing. Morphscout runs on the CPU by design, so that warning is noise.
    System.setProperty("org.slf4j.simpleLogger.log.ai.djl.onnxruntime.engine.OrtEngine", "error");
    // DJL notes that a model was loaded from a plain .onnx file rather than an archive: that is how we load them.
    System.setProperty("org.slf4j.simpleLogger.log.ai.djl.repository.SimpleRepository", "error");
  }
}
