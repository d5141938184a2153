package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

@ExtendWith(ApplicationExtension.class)
class SmokeFxTest {
  static {
    HeadlessFx.configure();
  }

  private Button button;

  @Start
  void start(Stage stage) {
    button = new Button("go");
    button.setOnAction(e -> button.setText("done"));
    stage.setScene(new Scene(button, 200, 100));
    stage.show();
  }

  @Test
  void clicks(FxRobot robot) {
    robot.clickOn(button);
    assertThat(button.getText()).isEqualTo("done");
  }
}
