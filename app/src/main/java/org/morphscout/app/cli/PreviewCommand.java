package org.morphscout.app.cli;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.library.Library;
import org.morphscout.indexer.library.PreviewService;
import org.morphscout.indexer.library.QueryContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code morphscout preview FROM [VIA...] TO --out FILE}: a cheap preview morph. */
@Command(
    name = "preview",
    mixinStandardHelpOptions = true,
    header = "Write a cheap preview morph along two or more images: an animated GIF or a PNG strip.",
    description = "Each step warps both images with the displacement field estimated between their silhouettes and "
        + "cross-dissolves them. It is a preview for judging pairs and chains, not a renderer. Images may be catalog "
        + "images or any image files. A PNG strip carries a legend line above its frames.")
final class PreviewCommand implements Callable<Integer> {
  @ParentCommand MorphscoutCommand root;
  @Spec CommandSpec spec;
  @Mixin AnalysisOptions analysis;

  @Parameters(arity = "2..*", paramLabel = "<image>", description = "FROM, any VIA images, then TO.")
  List<String> images = new ArrayList<>();

  @Option(names = "--out", required = true, paramLabel = "<file.gif|file.png>", description = "Where to write it.")
  Path out;

  @Option(names = "--frames-per-step", paramLabel = "<n>", defaultValue = "12",
      description = "Frames per step, both ends included (default: ${DEFAULT-VALUE}).")
  int framesPerStep;

  @Option(names = "--frame-ms", paramLabel = "<ms>", defaultValue = "80",
      description = "How long each GIF frame shows, in milliseconds (default: ${DEFAULT-VALUE}).")
  int delay;

  /** The earlier spelling, kept hidden so existing scripts still run; its unit is milliseconds, as before. */
  @Option(names = "--delay", hidden = true, paramLabel = "<ms>")
  void oldDelay(int ms) {
    delay = ms;
  }

  @Override
  public Integer call() throws Exception {
    // A GIF stores delays in hundredths of a second, in 16 bits (GIF89a specification, Graphic Control Extension).
    OptionCheck.of(spec).between("--frames-per-step", framesPerStep, 2, 120).between("--frame-ms", delay, 0, 655_350);
    try (Library library = Library.openForReading(root.catalogDir());
        QueryContext context = new QueryContext(library, analysis.setup())) {
      List<ImageAnalysis> stops = new ArrayList<>();
      for (String image : images) {
        stops.add(context.resolve(image));
      }
      List<Path> inputs = stops.stream().map(s -> Path.of(s.path())).toList();
      PreviewService.checkOutput(out, inputs);
      List<BufferedImage> frames = new PreviewService(context).frames(stops, framesPerStep);
      PreviewService.write(frames, out, delay, inputs);
      spec.commandLine().getOut().printf("preview of %d frames written to %s%n", frames.size(),
          out.toAbsolutePath().normalize());
      return ExitCodes.OK;
    }
  }
}
