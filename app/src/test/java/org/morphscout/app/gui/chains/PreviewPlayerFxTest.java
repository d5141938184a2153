package org.morphscout.app.gui.chains;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.morphscout.app.gui.HeadlessFx;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The preview's button says what a press will do: Pause while the preview plays, Play otherwise. */
@ExtendWith(ApplicationExtension.class)
class PreviewPlayerFxTest {
  static {
    HeadlessFx.configure();
  }

  private PreviewPlayer player;

  @Start
  void start(Stage stage) {
    player = new PreviewPlayer("preview");
    stage.setScene(new Scene(player, 600, 260));
    stage.show();
  }

  @Test
  void playTurnsIntoPauseWhilePlaying(FxRobot robot) throws Exception {
    Button button = robot.lookup("#play-preview").queryButton();
    assertThat(button.getText()).isEqualTo("Play");
    List<BufferedImage> frames = new ArrayList<>();
    for (int i = 0; i < 2400; i++) { // 100 s at 24 frames a second: still playing while the test looks
      frames.add(new BufferedImage(4, 4, BufferedImage.TYPE_INT_RGB));
    }
    WaitForAsyncUtils.asyncFx(() -> player.play(frames)).get();
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(player.playing()).isTrue();
    assertThat(button.getText()).isEqualTo("Pause");
    robot.clickOn(button);
    assertThat(player.playing()).isFalse();
    assertThat(button.getText()).isEqualTo("Play");
    robot.clickOn(button); // resumes
    assertThat(button.getText()).isEqualTo("Pause");
  }
}
