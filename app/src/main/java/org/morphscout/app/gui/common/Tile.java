package org.morphscout.app.gui.common;

import java.nio.file.Path;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.image.ImageView;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.morphscout.indexer.values.ImageRow;
import org.morphscout.indexer.values.ImageStatus;

/**
 * One thumbnail with a caption, reused by the grid, filmstrips and the walk strip. It remembers which image it shows
 * so a late-arriving thumbnail for an image it no longer shows is ignored. A note (what was found in the image) is a
 * text strip across the foot of the thumbnail; an image whose file is missing is also shown dimmed.
 */
public class Tile extends VBox {
  private final ImageView view = new ImageView();
  private final StackPane frame = new StackPane(view);
  private final Label caption = new Label();
  private final Label note = new Label();
  private volatile long shown = -1;

  public Tile(double size) {
    getStyleClass().add("tile");
    frame.getStyleClass().add("tile-frame");
    frame.setMinSize(size, size);
    frame.setPrefSize(size, size);
    frame.setMaxSize(size, size);
    view.setFitWidth(size - 8);
    view.setFitHeight(size - 8);
    view.setPreserveRatio(true);
    note.getStyleClass().add("tile-note");
    note.setVisible(false);
    note.setMaxWidth(Double.MAX_VALUE);
    note.setAlignment(Pos.CENTER);
    StackPane.setAlignment(note, Pos.BOTTOM_CENTER);
    frame.getChildren().add(note);
    caption.getStyleClass().add("tile-caption");
    caption.setMaxWidth(size);
    setAlignment(Pos.TOP_CENTER);
    getChildren().addAll(frame, caption);
  }

  /**
   * What a tile says about its image, in a strip over the foot of the thumbnail.
   *
   * @param text a word or two ("missing", "uncertain")
   * @param kind the strip's look: {@code missing}, {@code failed}, {@code uncertain} or {@code other} (style class
   *     {@code tile-note-KIND})
   * @param detail the tooltip: everything found, in words
   */
  public record Note(String text, String kind, String detail) {}

  /** Shows {@code row} (or nothing when null), loading its thumbnail through {@code cache}. */
  public void show(ImageRow row, String text, Note shownNote, ThumbnailCache cache) {
    if (row == null) {
      shown = -1;
      view.setImage(null);
      caption.setText("");
      showNote(null);
      setVisible(false);
      return;
    }
    setVisible(true);
    caption.setText(text == null ? Path.of(row.path()).getFileName().toString() : text);
    showNote(shownNote);
    // a file that is gone: its stored thumbnail is all we have, so show it faded
    view.setOpacity(row.status() == ImageStatus.MISSING ? 0.35 : 1.0);
    if (shown == row.id() && view.getImage() != null) {
      return;
    }
    long id = row.id();
    shown = id;
    view.setImage(cache.cached(id).orElse(null));
    if (view.getImage() == null) {
      cache.load(id, () -> shown == id, img -> {
        if (shown == id) {
          view.setImage(img);
        }
      });
    }
  }

  private void showNote(Note n) {
    note.getStyleClass().removeIf(c -> c.startsWith("tile-note-"));
    if (n == null) {
      note.setText("");
      note.setTooltip(null);
      note.setVisible(false);
      return;
    }
    note.setText(n.text());
    note.getStyleClass().add("tile-note-" + n.kind());
    note.setTooltip(new javafx.scene.control.Tooltip(n.detail()));
    note.setVisible(true);
  }

  /** The note's label (for tests). */
  public Label note() {
    return note;
  }

  /** The id shown, or -1. */
  public long shownId() {
    return shown;
  }

  public void setSelected(boolean selected) {
    pseudoClassStateChanged(javafx.css.PseudoClass.getPseudoClass("selected"), selected);
  }

  public Label caption() {
    return caption;
  }
}
