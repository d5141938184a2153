package org.morphscout.app.gui.common;

import java.io.File;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalLong;
import javafx.scene.input.ClipboardContent;
import javafx.scene.input.DataFormat;
import javafx.scene.input.Dragboard;

/** Drag and drop of catalog images between panes (by id) and of image files from the desktop. */
public final class ImageDrag {
  /** Our own clipboard format: the catalog id as text. */
  public static final DataFormat IMAGE_ID = new DataFormat("application/x-morphscout-image-id");

  private ImageDrag() {}

  public static ClipboardContent content(long id, String path) {
    ClipboardContent c = new ClipboardContent();
    c.put(IMAGE_ID, Long.toString(id));
    c.putString(path);
    return c;
  }

  public static boolean accepts(Dragboard db) {
    return db.hasContent(IMAGE_ID) || db.hasFiles();
  }

  public static OptionalLong id(Dragboard db) {
    Object v = db.getContent(IMAGE_ID);
    if (v instanceof String s) {
      try {
        return OptionalLong.of(Long.parseLong(s));
      } catch (NumberFormatException e) {
        return OptionalLong.empty();
      }
    }
    return OptionalLong.empty();
  }

  public static Optional<Path> file(Dragboard db) {
    if (db.hasFiles() && !db.getFiles().isEmpty()) {
      File f = db.getFiles().get(0);
      return Optional.of(f.toPath());
    }
    return Optional.empty();
  }
}
