package org.morphscout.indexer.library;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.morphscout.indexer.MorphscoutException;
import org.morphscout.indexer.analysis.ImageAnalysis;
import org.morphscout.indexer.ingest.ImageReadException;
import org.morphscout.indexer.preview.AnimatedGifWriter;
import org.morphscout.indexer.preview.FrameStrip;
import org.morphscout.indexer.preview.PreviewMorph;
import org.morphscout.indexer.warp.WarpEstimator;
import org.morphscout.indexer.warp.WarpResult;

/**
 * Cheap preview morphs along a sequence of images, for judging pairs before a real render: each step warps both
 * images with the estimated field and cross-dissolves them.
 */
public final class PreviewService {
  /** Long side of preview frames, in pixels. */
  public static final int FRAME_LONG_SIDE = 320;

  private final QueryContext context;
  private final WarpEstimator warps = new WarpEstimator();

  public PreviewService(QueryContext context) {
    this.context = context;
  }

  /** The frames from the first to the last image, {@code framesPerStep} per step (at least 2). */
  public List<BufferedImage> frames(List<ImageAnalysis> stops, int framesPerStep) throws IOException {
    if (stops.size() < 2) {
      throw new MorphscoutException("a preview needs at least two images");
    }
    if (framesPerStep < 2 || framesPerStep > 120) {
      throw new MorphscoutException("frames per step must be 2..120, got " + framesPerStep);
    }
    List<PreviewMorph.Stop> decoded = new ArrayList<>();
    for (ImageAnalysis a : stops) {
      if (a.silhouette().isEmpty()) {
        throw new MorphscoutException("no object found in " + a.path() + ": a warp needs a silhouette");
      }
      try {
        BufferedImage image = context.decoder().decode(Path.of(a.path())).analysis();
        decoded.add(new PreviewMorph.Stop(image, a.silhouette()));
      } catch (ImageReadException e) {
        throw new MorphscoutException(a.path() + ": " + e.reason(), e);
      }
    }
    List<WarpResult> legs = new ArrayList<>();
    for (int i = 0; i + 1 < stops.size(); i++) {
      legs.add(warps.estimate(stops.get(i).silhouette().mask(), stops.get(i + 1).silhouette().mask()));
    }
    return new PreviewMorph(FRAME_LONG_SIDE).chain(decoded, legs, framesPerStep);
  }

  /**
   * Checks, before the frames are made, that {@code out} names a .gif or .png file that may be written and is none of
   * the {@code inputs} (see {@link OutputFile#check}).
   */
  public static void checkOutput(Path out, List<Path> inputs) {
    String name = out.getFileName() == null ? "" : out.getFileName().toString().toLowerCase(Locale.ROOT);
    if (!name.endsWith(".gif") && !name.endsWith(".png")) {
      throw new MorphscoutException("preview output must end in .gif (animation) or .png (strip): " + out);
    }
    OutputFile.check(out, inputs);
  }

  /** The strip's legend: what the frames are, from which picture to which. */
  static String legend(int frames, List<Path> inputs) {
    String route = inputs.size() < 2 ? "" : " from " + inputs.get(0).getFileName() + " to "
        + inputs.get(inputs.size() - 1).getFileName();
    return frames + " preview frames" + route + ", left to right: a quick warp and cross-fade, not a final render";
  }

  /** Writes frames as an animated GIF ({@code .gif}) or a PNG strip ({@code .png}), never over one of the inputs. */
  public static void write(List<BufferedImage> frames, Path out, int frameDelayMs, List<Path> inputs)
      throws IOException {
    checkOutput(out, inputs);
    boolean gif = out.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".gif");
    OutputFile.write(out, inputs, temp -> {
      if (gif) {
        AnimatedGifWriter.write(frames, frameDelayMs, temp);
      } else {
        FrameStrip.write(frames, legend(frames.size(), inputs), temp);
      }
    });
  }
}
