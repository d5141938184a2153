package org.morphscout.indexer.library;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javax.imageio.ImageIO;
import org.morphscout.indexer.library.ChainService.ChainAnswer;
import org.morphscout.indexer.library.ChainService.ChainDetail;
import org.morphscout.indexer.library.ChainService.StepDetail;
import org.morphscout.indexer.preview.ContactSheet;
import org.morphscout.indexer.preview.ContactSheetRow;
import org.morphscout.indexer.values.ImageRow;

/** Contact sheets of chains and walks, from the catalog's thumbnails, each with a legend for its arrows' numbers. */
public final class Sheets {
  /** The legend of a chain sheet. */
  public static final String CHAIN_LEGEND = "Number on each arrow: the pair score of that step (0 to 100, higher is "
      + "better)";
  /** The legend of a walk sheet. */
  public static final String WALK_LEGEND = "Number on each arrow: the step cost from one image to the next (lower is "
      + "smoother)";

  private Sheets() {}

  /** One row per chain; between thumbnails, each step's pair score (0-100). */
  public static void chains(Library library, ChainAnswer answer, Path file) throws IOException {
    List<ContactSheetRow> rows = new ArrayList<>();
    int n = 0;
    for (ChainDetail d : answer.chains()) {
      List<ContactSheetRow.Tile> tiles = new ArrayList<>();
      for (long id : d.chain().images()) {
        tiles.add(tile(library, id));
      }
      List<Double> scores = d.steps().stream().map(StepDetail::score).map(s -> s.score()).toList();
      rows.add(new ContactSheetRow(String.format(Locale.ROOT,
          "chain %d · %d steps · largest step %.4f · unevenness %.2f", ++n, d.steps().size(), d.chain().maxStep(),
          d.chain().evenness()), tiles, scores));
    }
    String title = "Chains from " + name(answer.from().path()) + " to " + name(answer.to().path())
        + String.format(Locale.ROOT, " (direct pair score %.0f)", answer.direct().score());
    List<Path> inputs = new ArrayList<>();
    answer.chains().forEach(d -> d.chain().images().forEach(id -> inputs.add(inputPath(library, id))));
    OutputFile.write(file, inputs, temp -> new ContactSheet().writePng(title, CHAIN_LEGEND, rows, temp));
  }

  /** One sequence (a walk); between thumbnails, each step's cost. */
  public static void sequence(Library library, String title, String caption, List<Long> ids, List<Double> steps,
      Path file) throws IOException {
    List<ContactSheetRow.Tile> tiles = new ArrayList<>();
    for (long id : ids) {
      tiles.add(tile(library, id));
    }
    List<Path> inputs = ids.stream().map(id -> inputPath(library, id)).toList();
    OutputFile.write(file, inputs,
        temp -> new ContactSheet().writePng(title, WALK_LEGEND, List.of(new ContactSheetRow(caption, tiles, steps)),
            temp));
  }

  private static Path inputPath(Library library, long id) {
    return library.images().byId(id).map(r -> Path.of(r.path())).orElse(Path.of("/"));
  }

  private static ContactSheetRow.Tile tile(Library library, long id) throws IOException {
    Optional<ImageRow> row = library.images().byId(id);
    String caption = row.map(r -> name(r.path())).orElse("#" + id);
    Optional<Path> thumb = library.catalog().thumbnail(id);
    BufferedImage image = thumb.isPresent() ? ImageIO.read(thumb.get().toFile()) : null;
    if (image == null) {
      image = new BufferedImage(8, 8, BufferedImage.TYPE_INT_RGB);
    }
    return new ContactSheetRow.Tile(image, caption);
  }

  private static String name(String path) {
    return Path.of(path).getFileName().toString();
  }
}
