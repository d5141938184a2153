package org.morphscout.app.gui.common;

import javafx.beans.value.ObservableStringValue;
import javafx.scene.control.Label;

/** A pane's message line: shows a problem in plain words where it happened, hidden while there is none. */
public final class MessageLine extends Label {
  public MessageLine(ObservableStringValue text, String styleClass) {
    getStyleClass().addAll("message-line", styleClass);
    textProperty().bind(text);
    setWrapText(true);
    setMaxWidth(Double.MAX_VALUE);
    visibleProperty().bind(textProperty().isNotEmpty());
    managedProperty().bind(visibleProperty());
  }

  /** A red-tinted line for errors. */
  public static MessageLine error(ObservableStringValue text) {
    return new MessageLine(text, "message-error");
  }

  /** A quiet line for information. */
  public static MessageLine info(ObservableStringValue text) {
    return new MessageLine(text, "message-info");
  }
}
