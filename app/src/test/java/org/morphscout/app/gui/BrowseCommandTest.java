package org.morphscout.app.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.morphscout.app.Main;

class BrowseCommandTest {
  @Test
  void headlessRunFailsWithAClearMessage() {
    // surefire runs with java.awt.headless=true (parent pom), as servers and CI do
    assertThat(System.getProperty("java.awt.headless")).isEqualTo("true");
    StringWriter err = new StringWriter();
    int code = Main.execute(new String[] {"browse"}, new PrintWriter(new StringWriter()), new PrintWriter(err));
    assertThat(code).isEqualTo(3);
    assertThat(err.toString()).startsWith("browse: cannot open a window: no display");
  }

  @Test
  void helpListsTheCommand() {
    StringWriter out = new StringWriter();
    Main.execute(new String[] {"--help"}, new PrintWriter(out), new PrintWriter(new StringWriter()));
    assertThat(out.toString()).contains("browse").contains("Open the desktop browser on the catalog.");
  }

  @Test
  void displayIsNeededOnlyWhereX11OrWaylandIs() {
    assertThat(DisplayCheck.problem(Map.of(), "Linux", null)).get().asString().contains("DISPLAY");
    assertThat(DisplayCheck.problem(Map.of("DISPLAY", ":0"), "Linux", null)).isEmpty();
    assertThat(DisplayCheck.problem(Map.of("WAYLAND_DISPLAY", "wayland-0"), "Linux", "false")).isEmpty();
    assertThat(DisplayCheck.problem(Map.of(), "Windows 11", null)).isEmpty();
    assertThat(DisplayCheck.problem(Map.of("DISPLAY", ":0"), "Linux", "true")).get().asString()
        .contains("headless");
  }
}
