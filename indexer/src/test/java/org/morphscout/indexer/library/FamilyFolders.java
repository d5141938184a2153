package org.morphscout.indexer.library;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.morphscout.demo.FamilyItem;

/** Writes a rendered family into a library folder, as {@code <prefix><index>.png}. */
final class FamilyFolders {
  private FamilyFolders() {}

  static void writePngs(List<FamilyItem> family, Path root, String prefix) throws IOException {
    for (int i = 0; i < family.size(); i++) {
      ImageIO.write(family.get(i).image(), "png", root.resolve(prefix + i + ".png").toFile());
    }
  }
}
