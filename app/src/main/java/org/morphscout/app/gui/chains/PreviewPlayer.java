package org.morphscout.app.gui.chains;

import java.awt.image.BufferedImage;
import java.util.List;
import javafx.animation.Animation;
import javafx.animation.KeyFrame;
import javafx.animation.Timeline;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.Slider;
import javafx.scene.image.Image;
import javafx.scene.image.ImageView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.util.Duration;

/** Plays preview frames at 24 frames a second, with a scrubber to look at any frame. */
final class PreviewPlayer extends HBox {
  /** Playback rate, frames per second (the usual film rate). */
  static final double FPS = 24;

  private final ImageView view = new ImageView();
  private final Slider scrub = new Slider(0, 1, 0);
  private final Timeline timeline = new Timeline();
  private List<Image> frames = List.of();

  PreviewPlayer(String hint) {
    super(16);
    view.setFitWidth(192);
    view.setFitHeight(192);
    view.setPreserveRatio(true);
    Button play = new Button("Play");
    play.setId("play-preview");
    // the button says what a press will do: Pause while playing, Play otherwise
    play.textProperty().bind(javafx.beans.binding.Bindings.when(timeline.statusProperty().isEqualTo(
        Animation.Status.RUNNING)).then("Pause").otherwise("Play"));
    play.setOnAction(e -> {
      if (timeline.getStatus() == Animation.Status.RUNNING) {
        timeline.pause();
      } else if (timeline.getStatus() == Animation.Status.PAUSED) {
        timeline.play();
      } else if (!frames.isEmpty()) {
        timeline.playFromStart();
      }
    });
    scrub.setPrefWidth(260);
    scrub.valueProperty().addListener((o, a, v) -> {
      if (!frames.isEmpty()) {
        view.setImage(frames.get((int) Math.round(v.doubleValue() * (frames.size() - 1))));
      }
    });
    Label text = new Label(hint);
    text.getStyleClass().add("summary");
    getChildren().addAll(view, new VBox(8, text, new HBox(8, play, scrub)));
    getStyleClass().add("preview-bar");
    setPadding(new Insets(8, 12, 8, 12));
  }

  /** Whether the preview is playing (the button then reads Pause). */
  boolean playing() {
    return timeline.getStatus() == Animation.Status.RUNNING;
  }

  /** Shows {@code raw} (or nothing when null or empty) and plays it once. */
  void play(List<BufferedImage> raw) {
    timeline.stop();
    timeline.getKeyFrames().clear();
    if (raw == null || raw.isEmpty()) {
      frames = List.of();
      view.setImage(null);
      return;
    }
    frames = raw.stream().map(b -> (Image) SwingFXUtils.toFXImage(b, null)).toList();
    view.setImage(frames.get(0));
    int n = frames.size();
    for (int i = 0; i < n; i++) {
      double t = n == 1 ? 0 : i / (double) (n - 1);
      timeline.getKeyFrames().add(new KeyFrame(Duration.millis(1000.0 / FPS * i), e -> scrub.setValue(t)));
    }
    timeline.setCycleCount(1);
    timeline.playFromStart();
  }
}
