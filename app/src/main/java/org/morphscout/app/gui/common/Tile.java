package org.morphscout.app.gui.common;

import java.nio.file.Path;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.image.ImageView;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.morphscout.indexer.catalog.ImageRow;

/**
 * One thumbnail with a caption, reused by the grid, filmstrips and the walkthrough strip. It remembers which image it
 * shows so a late-arriving thumbnail for an image it no longer shows is ignored.
 */
public class Tile extends VBox {
  private final ImageView view = new ImageView();
  private final StackPane frame = new StackPane(view);
  private final Label caption = new Label();
  private final Label badge = new Label();
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
    badge.getStyleClass().add("tile-badge");
    badge.setVisible(false);
    StackPane.setAlignment(badge, Pos.TOP_RIGHT);
    frame.getChildren().add(badge);
    caption.getStyleClass().add("tile-caption");
    caption.setMaxWidth(size);
    setAlignment(Pos.TOP_CENTER);
    getChildren().addAll(frame, caption);
  }

  /** Shows {@code row} (or nothing when null), loading its thumbnail through {@code cache}. */
  public void show(ImageRow row, String text, String badgeText, ThumbnailCache cache) {
    if (row == null) {
      shown = -1;
      view.setImage(null);
      caption.setText("");
      badge.setVisible(false);
      setVisible(false);
      return;
    }
    setVisible(true);
    caption.setText(text == null ? Path.of(row.path()).getFileName().toString() : text);
    badge.setText(badgeText == null ? "" : badgeText);
    badge.setVisible(badgeText != null && !badgeText.isEmpty());
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
